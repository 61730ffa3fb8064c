import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A mail the local SMTP server received (parsed by mailparser); `outboxId` names the outbox row it came from. */
export class MailboxMail extends Model<InferAttributes<MailboxMail>, InferCreationAttributes<MailboxMail>> {
  declare id: CreationOptional<string>
  declare outboxId: string | null
  declare from: string
  declare to: string
  declare subject: string
  declare text: string
  declare html: string | null
  declare createdAt: CreationOptional<Date>
}

/** Binds the MailboxMail model to the connection. */
export function initMailboxMail(sequelize: Sequelize): typeof MailboxMail {
  MailboxMail.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      outboxId: { type: DataTypes.UUID, allowNull: true },
      from: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
      to: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
      subject: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      text: { type: DataTypes.TEXT, allowNull: false },
      html: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'mailbox', updatedAt: false },
  )
  return MailboxMail
}
