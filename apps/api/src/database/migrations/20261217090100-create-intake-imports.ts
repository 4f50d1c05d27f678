import { DataTypes, type QueryInterface } from 'sequelize';

// One row per upload sent to Intake (checks and commits alike): the stage it has reached and its
// counts while it runs, then its answer. The browser follows a long import by its ticket, also
// after a page reload, and any API instance can answer because the state is here.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('intake_imports', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    ticket: { type: DataTypes.STRING(64), allowNull: false },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    site_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'sites', key: 'id' }, onDelete: 'CASCADE' },
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    size_bytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
    format: { type: DataTypes.STRING(8), allowNull: false },
    dry_run: { type: DataTypes.BOOLEAN, allowNull: false },
    /** checking, comparing, writing, then done, refused or failed. */
    stage: { type: DataTypes.STRING(12), allowNull: false },
    rows_checked: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    bytes_read: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    values_total: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    values_done: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    message: { type: DataTypes.STRING(1000), allowNull: true },
    /** The answer once finished: the IntakeResult, or the refusal with its problems (JSON). */
    outcome: { type: DataTypes.TEXT('medium'), allowNull: true },
    started_at: { type: DataTypes.DATE(3), allowNull: false },
    finished_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('intake_imports', ['trial_id', 'ticket'], { unique: true, name: 'intake_imports_ticket' });
  await queryInterface.addIndex('intake_imports', ['site_id', 'round_id', 'id'], { name: 'intake_imports_latest' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('intake_imports');
}
