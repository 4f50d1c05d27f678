import { DataTypes, type QueryInterface } from 'sequelize';

// One row per committed upload: who sent which file (its SHA-256) for which site and round, and
// what it did. The last one per site and round tells a byte-identical re-upload apart.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('intake_uploads', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'sites', key: 'id' }, onDelete: 'CASCADE' },
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    rows_read: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    created_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    updated_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    unchanged_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    warnings_accepted: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('intake_uploads', ['site_id', 'round_id', 'id'], { name: 'intake_uploads_latest' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('intake_uploads');
}
