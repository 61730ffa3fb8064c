import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare name: string
  /** SHA-256 of the token, hex. The token itself is shown once and never stored. */
  declare tokenHash: string
  /** The first characters of the token, so a user can tell tokens apart. */
  declare prefix: string
  declare lastUsedAt: Date | null
  /** After this the token answers 401; null: no expiry. */
  declare expiresAt: Date | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  toPublic() {
    return { id: this.id, name: this.name, prefix: this.prefix, lastUsedAt: this.lastUsedAt, expiresAt: this.expiresAt, createdAt: this.createdAt }
  }
}

export function initApiToken(sequelize: Sequelize): typeof ApiToken {
  ApiToken.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      prefix: { type: DataTypes.STRING(16), allowNull: false },
      lastUsedAt: { type: DataTypes.DATE, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'api_tokens' },
  )
  return ApiToken
}
