import { DataTypes, type QueryInterface } from 'sequelize';

// What is measured on every plot: unit from @friable/field's MEASURE_UNITS, kind, limits.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  const limit = { type: DataTypes.DECIMAL(18, 6), allowNull: true };
  await queryInterface.createTable('measures', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    code: { type: DataTypes.STRING(12), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    unit: { type: DataTypes.STRING(16), allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    scale_min: limit,
    scale_max: limit,
    cutoff: limit,
    plausible_min: limit,
    plausible_max: limit,
    hard_min: limit,
    hard_max: limit,
    decimals: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 1 },
    higher_is_better: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('measures', ['trial_id', 'code'], { unique: true, name: 'measures_code' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('measures');
}
