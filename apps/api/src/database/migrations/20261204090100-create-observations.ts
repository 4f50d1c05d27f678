import { DataTypes, type QueryInterface } from 'sequelize';

// One value per plot, round and measure. value_text keeps exactly what was typed (canonical
// decimal text); value_decimal is the same number for sorting and analysis; censored marks a
// right-censored bound (">600"). version counts saves, so a stale edit is refused.
// Rounds and measures with observations are refused deletion by the protocol services; RESTRICT
// keeps the rule in the database too.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('observations', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    plot_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'plots', key: 'id' }, onDelete: 'CASCADE' },
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'RESTRICT' },
    measure_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'measures', key: 'id' }, onDelete: 'RESTRICT' },
    value_text: { type: DataTypes.STRING(40), allowNull: true },
    value_decimal: { type: DataTypes.DECIMAL(30, 10), allowNull: true },
    censored: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    missing_reason: { type: DataTypes.STRING(200), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    source: { type: DataTypes.STRING(10), allowNull: false },
    recorded_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    recorded_at: { type: DataTypes.DATE(3), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('observations', ['trial_id', 'plot_id', 'round_id', 'measure_id'], { unique: true, name: 'observations_cell' });
  await queryInterface.addIndex('observations', ['trial_id', 'round_id', 'measure_id'], { name: 'observations_round' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('observations');
}
