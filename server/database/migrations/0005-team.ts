import { DataTypes, type QueryInterface } from 'sequelize'

/**
 * Team work: shares (by e-mail, so a share made before the account exists applies when that
 * address registers), invitations, read-only links, numbered revisions, comments, the activity
 * of each sketch, the review fields of a sketch, the HTML part of outbox mails, the mails the
 * local SMTP server received, and workspace settings.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const sketchRef = { type: DataTypes.UUID, allowNull: false, references: { model: 'sketches', key: 'id' }, onDelete: 'CASCADE' }
  await qi.createTable('shares', {
    id: { type: DataTypes.UUID, primaryKey: true },
    sketchId: sketchRef,
    email: { type: DataTypes.STRING(254), allowNull: false },
    access: { type: DataTypes.STRING(16), allowNull: false },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('shares', ['sketchId', 'email'], { unique: true })
  await qi.addIndex('shares', ['email'])
  await qi.createTable('invitations', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invitedBy: { type: DataTypes.UUID, allowNull: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    acceptedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('invitations', ['email'])
  await qi.createTable('revisions', {
    id: { type: DataTypes.UUID, primaryKey: true },
    sketchId: sketchRef,
    number: { type: DataTypes.INTEGER, allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    title: { type: DataTypes.STRING(160), allowNull: false },
    document: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'frozen' },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    checkerId: { type: DataTypes.UUID, allowNull: true },
    approvedBy: { type: DataTypes.UUID, allowNull: true },
    approvedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('revisions', ['sketchId', 'number'], { unique: true })
  await qi.createTable('links', {
    id: { type: DataTypes.UUID, primaryKey: true },
    sketchId: sketchRef,
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('links', ['sketchId'])
  await qi.createTable('comments', {
    id: { type: DataTypes.UUID, primaryKey: true },
    sketchId: sketchRef,
    parentId: { type: DataTypes.UUID, allowNull: true },
    authorId: { type: DataTypes.UUID, allowNull: true },
    body: { type: DataTypes.TEXT, allowNull: false },
    x: { type: DataTypes.DOUBLE, allowNull: true },
    y: { type: DataTypes.DOUBLE, allowNull: true },
    resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    resolvedBy: { type: DataTypes.UUID, allowNull: true },
    resolvedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('comments', ['sketchId', 'createdAt'])
  await qi.createTable('activities', {
    id: { type: DataTypes.UUID, primaryKey: true },
    sketchId: sketchRef,
    actorId: { type: DataTypes.UUID, allowNull: true },
    action: { type: DataTypes.STRING(32), allowNull: false },
    detail: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('activities', ['sketchId', 'createdAt'])
  await qi.createTable('mailbox', {
    id: { type: DataTypes.UUID, primaryKey: true },
    outboxId: { type: DataTypes.UUID, allowNull: true },
    from: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
    to: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
    subject: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('mailbox', ['outboxId'])
  await qi.createTable('settings', {
    key: { type: DataTypes.STRING(60), primaryKey: true },
    value: { type: DataTypes.TEXT, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addColumn('outbox', 'html', { type: DataTypes.TEXT, allowNull: true })
  await qi.addColumn('sketches', 'checkerId', { type: DataTypes.UUID, allowNull: true })
  await qi.addColumn('sketches', 'reviewRevision', { type: DataTypes.INTEGER, allowNull: true })
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('sketches', 'reviewRevision')
  await qi.removeColumn('sketches', 'checkerId')
  await qi.removeColumn('outbox', 'html')
  for (const table of ['settings', 'mailbox', 'activities', 'comments', 'links', 'revisions', 'invitations', 'shares']) await qi.dropTable(table)
}
