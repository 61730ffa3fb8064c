import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export type SketchStatus = 'draft' | 'submitted' | 'approved' | 'returned'

export class Sketch extends Model<InferAttributes<Sketch>, InferCreationAttributes<Sketch>> {
  declare id: CreationOptional<string>
  declare ownerId: string
  declare title: string
  declare project: CreationOptional<string>
  declare description: CreationOptional<string>
  declare status: CreationOptional<SketchStatus>
  /** The Kernwise document, JSON text (validated on every save). */
  declare document: string
  /** Incremented on every save; a PATCH must carry the version it edited. */
  declare version: CreationOptional<number>
  declare deletedAt: Date | null
  /** The checker named by the last submission (null before any). */
  declare checkerId: CreationOptional<string | null>
  /** The revision number the last submission named. */
  declare reviewRevision: CreationOptional<number | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
}

export function initSketch(sequelize: Sequelize): typeof Sketch {
  Sketch.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      ownerId: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.STRING(160), allowNull: false },
      project: { type: DataTypes.STRING(160), allowNull: false, defaultValue: '' },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'draft' },
      document: { type: DataTypes.TEXT, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      deletedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      checkerId: { type: DataTypes.UUID, allowNull: true, defaultValue: null },
      reviewRevision: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'sketches' },
  )
  return Sketch
}
