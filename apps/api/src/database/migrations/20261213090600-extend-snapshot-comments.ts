import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

// Comment threads: replies, edits and deletions kept in history, and resolving.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('snapshot_comments', 'parent_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'snapshot_comments', key: 'id' },
    onDelete: 'CASCADE',
  });
  await queryInterface.addColumn('snapshot_comments', 'edited_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('snapshot_comments', 'deleted_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('snapshot_comments', 'resolved_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('snapshot_comments', 'resolved_by', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await queryInterface.createTable('snapshot_comment_revisions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    comment_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'snapshot_comments', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    changed_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('snapshot_comment_revisions', ['comment_id', 'id'], { name: 'snapshot_comment_revisions_comment' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('snapshot_comment_revisions');
  // MariaDB names the foreign keys itself; drop the ones on the new columns before the columns.
  const keys = await queryInterface.sequelize.query<{ name: string }>(
    `SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE
     WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'snapshot_comments' AND COLUMN_NAME IN ('parent_id', 'resolved_by') AND REFERENCED_TABLE_NAME IS NOT NULL`,
    { type: QueryTypes.SELECT },
  );
  for (const key of keys) await queryInterface.sequelize.query(`ALTER TABLE snapshot_comments DROP FOREIGN KEY \`${key.name}\``, { type: QueryTypes.RAW });
  await queryInterface.sequelize.query(
    'ALTER TABLE snapshot_comments DROP COLUMN resolved_by, DROP COLUMN resolved_at, DROP COLUMN deleted_at, DROP COLUMN edited_at, DROP COLUMN parent_id',
    { type: QueryTypes.RAW },
  );
}
