import { DataTypes, type QueryInterface } from 'sequelize';

// The investigator's requests for review of a saved analysis (each e-mailed to the trial's reviewers).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('review_requests', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    snapshot_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'analysis_snapshots', key: 'id' }, onDelete: 'CASCADE' },
    requested_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    message: { type: DataTypes.STRING(2000), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('review_requests', ['snapshot_id'], { name: 'review_requests_snapshot' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('review_requests');
}
