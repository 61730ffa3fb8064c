import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ShareAccess } from '../../shared/team/access'

/** A sketch shared with one e-mail address; it applies to whoever holds (or later registers) that address. */
export class Share extends Model<InferAttributes<Share>, InferCreationAttributes<Share>> {
  declare id: CreationOptional<string>
  declare sketchId: string
  /** Lower-cased, as accounts store it. */
  declare email: string
  declare access: ShareAccess
  declare createdBy: string | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
}

/** Binds the Share model to the connection. */
export function initShare(sequelize: Sequelize): typeof Share {
  Share.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      sketchId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      access: { type: DataTypes.STRING(16), allowNull: false },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'shares' },
  )
  return Share
}
