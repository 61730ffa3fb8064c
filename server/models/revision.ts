import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { RevisionStatus } from '../../shared/team/review'

/** A numbered, frozen copy of a sketch's working state. Its document never changes. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<string>
  declare sketchId: string
  /** 1, 2, 3… per sketch. */
  declare number: number
  declare note: CreationOptional<string>
  declare title: string
  declare document: string
  declare status: CreationOptional<RevisionStatus>
  declare createdBy: string | null
  declare checkerId: CreationOptional<string | null>
  declare approvedBy: CreationOptional<string | null>
  declare approvedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>
}

/** Binds the Revision model to the connection. */
export function initRevision(sequelize: Sequelize): typeof Revision {
  Revision.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      sketchId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      title: { type: DataTypes.STRING(160), allowNull: false },
      document: { type: DataTypes.TEXT, allowNull: false },
      status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'frozen' },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      checkerId: { type: DataTypes.UUID, allowNull: true },
      approvedBy: { type: DataTypes.UUID, allowNull: true },
      approvedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'revisions', updatedAt: false },
  )
  return Revision
}
