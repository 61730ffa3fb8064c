import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A read-only link to one revision, for someone without an account (only the token's SHA-256 is kept). */
export class Link extends Model<InferAttributes<Link>, InferCreationAttributes<Link>> {
  declare id: CreationOptional<string>
  declare sketchId: string
  declare tokenHash: string
  /** The revision number the link shows. */
  declare revision: number
  declare expiresAt: Date | null
  declare revokedAt: CreationOptional<Date | null>
  declare createdBy: string | null
  declare createdAt: CreationOptional<Date>
}

/** Binds the Link model to the connection. */
export function initLink(sequelize: Sequelize): typeof Link {
  Link.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      sketchId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'links', updatedAt: false },
  )
  return Link
}
