import { DataTypes, type QueryInterface } from 'sequelize'

/** The outbox (every mail the app sends is recorded here) and single-use password reset tokens. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('outbox', {
    id: { type: DataTypes.UUID, primaryKey: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    to: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(200), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    error: { type: DataTypes.STRING(500), allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('outbox', ['createdAt'])
  await qi.createTable('password_resets', {
    id: { type: DataTypes.UUID, primaryKey: true },
    userId: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('password_resets', ['userId', 'createdAt'])
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('password_resets')
  await qi.dropTable('outbox')
}
