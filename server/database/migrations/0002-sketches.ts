import { DataTypes, type QueryInterface } from 'sequelize'

/** Sketches: a versioned Kernwise document per row, owned by one account. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('sketches', {
    id: { type: DataTypes.UUID, primaryKey: true },
    ownerId: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(160), allowNull: false },
    project: { type: DataTypes.STRING(160), allowNull: false, defaultValue: '' },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'draft' },
    document: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    deletedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('sketches', ['ownerId', 'updatedAt'])
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('sketches')
}
