import { DataTypes, type QueryInterface } from 'sequelize';

// The two factors of a factorial trial and their levels.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('trial_factors', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('trial_factors', ['trial_id', 'position'], { unique: true, name: 'trial_factors_position' });
  await queryInterface.createTable('factor_levels', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    factor_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trial_factors', key: 'id' }, onDelete: 'CASCADE' },
    code: { type: DataTypes.STRING(6), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('factor_levels', ['factor_id', 'code'], { unique: true, name: 'factor_levels_code' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('factor_levels');
  await queryInterface.dropTable('trial_factors');
}
