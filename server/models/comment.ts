import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A comment on a sketch: pinned at (x, y) in section coordinates (mm), or on the sketch as a whole; a reply has a parent. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>
  declare sketchId: string
  declare parentId: string | null
  declare authorId: string | null
  /** Plain text, shown as text. */
  declare body: string
  declare x: number | null
  declare y: number | null
  declare resolved: CreationOptional<boolean>
  declare resolvedBy: CreationOptional<string | null>
  declare resolvedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
}

/** Binds the Comment model to the connection. */
export function initComment(sequelize: Sequelize): typeof Comment {
  Comment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      sketchId: { type: DataTypes.UUID, allowNull: false },
      parentId: { type: DataTypes.UUID, allowNull: true },
      authorId: { type: DataTypes.UUID, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      x: { type: DataTypes.DOUBLE, allowNull: true },
      y: { type: DataTypes.DOUBLE, allowNull: true },
      resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      resolvedBy: { type: DataTypes.UUID, allowNull: true },
      resolvedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'comments' },
  )
  return Comment
}
