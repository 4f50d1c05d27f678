import { DataTypes, type QueryInterface } from 'sequelize';

// The audit trail of every value: who changed it, when, from what to what, and whether by an
// upload (upload_id) or by an edit in the Ledger. before_* are null for a value's first save.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('observation_changes', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    observation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'observations', key: 'id' }, onDelete: 'CASCADE' },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    at: { type: DataTypes.DATE(3), allowNull: false },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    source: { type: DataTypes.STRING(10), allowNull: false },
    upload_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'intake_uploads', key: 'id' }, onDelete: 'SET NULL' },
    /** false when the value did not exist before this change. */
    had_before: { type: DataTypes.BOOLEAN, allowNull: false },
    before_text: { type: DataTypes.STRING(40), allowNull: true },
    before_censored: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    before_missing_reason: { type: DataTypes.STRING(200), allowNull: true },
    after_text: { type: DataTypes.STRING(40), allowNull: true },
    after_censored: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    after_missing_reason: { type: DataTypes.STRING(200), allowNull: true },
  });
  await queryInterface.addIndex('observation_changes', ['observation_id', 'id'], { name: 'observation_changes_value' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('observation_changes');
}
