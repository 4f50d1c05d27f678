import { DataTypes, type QueryInterface } from 'sequelize';

// The trial's activity log: one row per change, written in the same transaction as the change.
// site_id carries no foreign key so an entry outlives the site it mentions.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('activity_entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'trials', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    summary: { type: DataTypes.STRING(500), allowNull: false },
    details: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('activity_entries', ['trial_id', 'id'], { name: 'activity_entries_trial' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('activity_entries');
}
