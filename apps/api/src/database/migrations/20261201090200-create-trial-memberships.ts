import { DataTypes, type QueryInterface } from 'sequelize';

// Roles are held per trial: a person may lead one trial and collaborate on another.
// site_id gains its foreign key when the sites table arrives.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('trial_memberships', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'trials', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    role: { type: DataTypes.STRING(16), allowNull: false },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('trial_memberships', ['trial_id', 'user_id', 'role', 'site_id'], {
    unique: true,
    name: 'trial_memberships_unique_role',
  });
  await queryInterface.addIndex('trial_memberships', ['user_id'], { name: 'trial_memberships_user' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('trial_memberships');
}
