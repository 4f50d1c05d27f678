import { DataTypes, type QueryInterface } from 'sequelize';

// One row per reminder e-mailed to a collaborator for a round due at their site, so the daily job
// never sends the same reminder twice. due_date is part of the key: moving the start date re-arms it.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('round_reminders', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'CASCADE' },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'sites', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    due_date: { type: DataTypes.DATEONLY, allowNull: false },
    sent_at: { type: DataTypes.DATE(3), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('round_reminders', ['round_id', 'site_id', 'user_id', 'due_date'], { unique: true, name: 'round_reminders_once' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('round_reminders');
}
