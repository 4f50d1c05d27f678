import { DataTypes, type QueryInterface } from 'sequelize';

// At most one photo per plot and round; the bytes live in the storage service under storage_key.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('plot_photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    plot_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'plots', key: 'id' }, onDelete: 'CASCADE' },
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'CASCADE' },
    storage_key: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(40), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    uploaded_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('plot_photos', ['plot_id', 'round_id'], { unique: true, name: 'plot_photos_cell' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('plot_photos');
}
