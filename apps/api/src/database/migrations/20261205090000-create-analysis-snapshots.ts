import { DataTypes, type QueryInterface } from 'sequelize';

// Saved analyses: the choices, the hash of the data used, the engine version and the full result, frozen.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('analysis_snapshots', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    measure_name: { type: DataTypes.STRING(100), allowNull: false },
    round_label: { type: DataTypes.STRING(100), allowNull: false },
    scope_label: { type: DataTypes.STRING(200), allowNull: false },
    choices: { type: DataTypes.TEXT, allowNull: false },
    data_hash: { type: DataTypes.CHAR(64), allowNull: false },
    engine_version: { type: DataTypes.STRING(40), allowNull: false },
    result: { type: DataTypes.TEXT('long'), allowNull: false },
    created_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    signed_off_at: { type: DataTypes.DATE(3), allowNull: true },
    signed_off_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('analysis_snapshots', ['trial_id', 'id'], { name: 'analysis_snapshots_trial' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('analysis_snapshots');
}
