import { DataTypes, type QueryInterface } from 'sequelize';

// Treatments with their stated rate (DECIMAL: typed by people) and material notes.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('treatments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    code: { type: DataTypes.STRING(12), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: true },
    is_control: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    rate_value: { type: DataTypes.DECIMAL(14, 4), allowNull: true },
    rate_unit: { type: DataTypes.STRING(16), allowNull: true },
    rate_basis: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'area' },
    incorporation_depth_cm: { type: DataTypes.DECIMAL(8, 2), allowNull: true },
    product: { type: DataTypes.STRING(200), allowNull: true },
    purity: { type: DataTypes.DECIMAL(7, 6), allowNull: true },
    moisture_basis: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'as-is' },
    moisture_fraction: { type: DataTypes.DECIMAL(7, 6), allowNull: true },
    material_kind: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'other' },
    factor_level_a_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'factor_levels', key: 'id' }, onDelete: 'SET NULL' },
    factor_level_b_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'factor_levels', key: 'id' }, onDelete: 'SET NULL' },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('treatments', ['trial_id', 'code'], { unique: true, name: 'treatments_code' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('treatments');
}
