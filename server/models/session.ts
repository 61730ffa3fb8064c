import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One signed-in browser: the sealed cookie carries its id, and the row must exist for the cookie to count. */
export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: CreationOptional<string>
  declare userId: string
  /** The browser's User-Agent as sent at sign-in (cut to 200 characters), to tell sessions apart. */
  declare userAgent: string
  /** The address that signed in (behind a trusted proxy, the client's). */
  declare ip: string
  /** Last request seen, written at most once a minute. */
  declare lastSeenAt: Date
  declare expiresAt: Date
  declare createdAt: CreationOptional<Date>

  /** The API face of a session; `current` marks the one making the request. */
  toPublic(currentId?: string) {
    return { id: this.id, userAgent: this.userAgent, ip: this.ip, createdAt: this.createdAt, lastSeenAt: this.lastSeenAt, expiresAt: this.expiresAt, current: this.id === currentId }
  }
}

/** Binds the Session model to the connection. */
export function initSession(sequelize: Sequelize): typeof Session {
  Session.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      userAgent: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      ip: { type: DataTypes.STRING(64), allowNull: false, defaultValue: '' },
      lastSeenAt: { type: DataTypes.DATE, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'sessions', updatedAt: false },
  )
  return Session
}
