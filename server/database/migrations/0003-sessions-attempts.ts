import { DataTypes, type QueryInterface } from 'sequelize'

/**
 * Server-side session records (a sign-out, a password change or an admin's "sign out
 * everywhere" ends them), the sign-in attempt log that replaces the failure log (each attempt is
 * counted before its password is checked), and an optional expiry on API tokens.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('sessions', {
    id: { type: DataTypes.UUID, primaryKey: true },
    userId: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    userAgent: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    ip: { type: DataTypes.STRING(64), allowNull: false, defaultValue: '' },
    lastSeenAt: { type: DataTypes.DATE, allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('sessions', ['userId'])
  await qi.createTable('sign_in_attempts', {
    // An increasing id orders attempts that arrive in the same millisecond.
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    ip: { type: DataTypes.STRING(64), allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('sign_in_attempts', ['email', 'ip', 'createdAt'])
  await qi.addIndex('sign_in_attempts', ['ip', 'createdAt'])
  await qi.addColumn('api_tokens', 'expiresAt', { type: DataTypes.DATE, allowNull: true })
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('api_tokens', 'expiresAt')
  await qi.dropTable('sign_in_attempts')
  await qi.dropTable('sessions')
}
