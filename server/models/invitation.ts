import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** An invitation to register with one e-mail address (only the token's SHA-256 is kept). */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>
  declare email: string
  declare tokenHash: string
  declare invitedBy: string | null
  declare expiresAt: Date
  declare acceptedAt: Date | null
  declare createdAt: CreationOptional<Date>
}

/** Binds the Invitation model to the connection. */
export function initInvitation(sequelize: Sequelize): typeof Invitation {
  Invitation.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      email: { type: DataTypes.STRING(254), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      invitedBy: { type: DataTypes.UUID, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'invitations', updatedAt: false },
  )
  return Invitation
}
