import { DataTypes, type QueryInterface } from 'sequelize';

// The randomized layout: one row per plot. A treatment with plots cannot be deleted (the
// service clears the layout first, or refuses when the site has observations).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('plots', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'sites', key: 'id' }, onDelete: 'CASCADE' },
    block: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    treatment_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'treatments', key: 'id' }, onDelete: 'RESTRICT' },
    label: { type: DataTypes.STRING(20), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('plots', ['site_id', 'label'], { unique: true, name: 'plots_label' });
  await queryInterface.addIndex('plots', ['site_id', 'block', 'position'], { unique: true, name: 'plots_place' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('plots');
}
