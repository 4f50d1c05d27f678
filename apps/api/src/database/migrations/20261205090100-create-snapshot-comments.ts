import { DataTypes, type QueryInterface } from 'sequelize';

// Reviewers', collaborators' and investigators' comments on a saved analysis, oldest first.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('snapshot_comments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    snapshot_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'analysis_snapshots', key: 'id' }, onDelete: 'CASCADE' },
    body: { type: DataTypes.TEXT, allowNull: false },
    author_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('snapshot_comments', ['snapshot_id', 'id'], { name: 'snapshot_comments_snapshot' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('snapshot_comments');
}
