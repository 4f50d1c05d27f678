import { DataTypes, type QueryInterface } from 'sequelize';

// The gardens a trial runs in, with plot geometry; collaborator memberships now point at a site.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  const size = { type: DataTypes.DECIMAL(10, 3), allowNull: true };
  await queryInterface.createTable('sites', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(120), allowNull: false },
    location: { type: DataTypes.STRING(300), allowNull: true },
    soil_description: { type: DataTypes.TEXT, allowNull: true },
    shape: { type: DataTypes.STRING(10), allowNull: false },
    length_m: size,
    width_m: size,
    diameter_cm: size,
    container_depth_cm: size,
    soil_volume_l: size,
    blocks: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
    label_prefix: { type: DataTypes.STRING(3), allowNull: false },
    lead_user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    randomized_at: { type: DataTypes.DATE, allowNull: true },
    randomization_seed: { type: DataTypes.STRING(60), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('sites', ['trial_id', 'name'], { unique: true, name: 'sites_name' });
  await queryInterface.addIndex('sites', ['trial_id', 'label_prefix'], { unique: true, name: 'sites_label_prefix' });
  await queryInterface.addConstraint('trial_memberships', {
    type: 'foreign key',
    fields: ['site_id'],
    name: 'trial_memberships_site',
    references: { table: 'sites', field: 'id' },
    onDelete: 'SET NULL',
    onUpdate: 'CASCADE',
  });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.removeConstraint('trial_memberships', 'trial_memberships_site');
  await queryInterface.dropTable('sites');
}
