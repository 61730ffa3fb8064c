import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One mail the app sent (or tried to): recorded before it goes out, whatever the transport. */
export class OutboxMail extends Model<InferAttributes<OutboxMail>, InferCreationAttributes<OutboxMail>> {
  declare id: CreationOptional<string>
  /** What it is for: "password-reset", later "invitation", "review-request"... */
  declare kind: string
  declare to: string
  declare subject: string
  declare text: string
  /** The HTML part (null for mails recorded before it existed). */
  declare html: CreationOptional<string | null>
  /** When the SMTP server took it; null when only recorded (no SMTP configured) or it failed. */
  declare sentAt: Date | null
  declare error: string | null
  declare createdAt: CreationOptional<Date>
}

/** Binds the OutboxMail model to the connection. */
export function initOutboxMail(sequelize: Sequelize): typeof OutboxMail {
  OutboxMail.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      kind: { type: DataTypes.STRING(40), allowNull: false },
      to: { type: DataTypes.STRING(254), allowNull: false },
      subject: { type: DataTypes.STRING(200), allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      html: { type: DataTypes.TEXT, allowNull: true },
      sentAt: { type: DataTypes.DATE, allowNull: true },
      error: { type: DataTypes.STRING(500), allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'outbox', updatedAt: false },
  )
  return OutboxMail
}
