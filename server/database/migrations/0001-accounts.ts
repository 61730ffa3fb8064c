import { DataTypes, type QueryInterface } from 'sequelize'

/** Accounts, API tokens and the sign-in failure log used for throttling. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    passwordHash: { type: DataTypes.STRING(255), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'engineer' },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.createTable('api_tokens', {
    id: { type: DataTypes.UUID, primaryKey: true },
    userId: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    prefix: { type: DataTypes.STRING(16), allowNull: false },
    lastUsedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('api_tokens', ['userId'])
  await qi.createTable('login_failures', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    ip: { type: DataTypes.STRING(64), allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('login_failures', ['email', 'createdAt'])
  await qi.addIndex('login_failures', ['ip', 'createdAt'])
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('login_failures')
  await qi.dropTable('api_tokens')
  await qi.dropTable('users')
}
