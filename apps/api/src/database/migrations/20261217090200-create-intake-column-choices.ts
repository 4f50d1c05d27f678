import { DataTypes, type QueryInterface } from 'sequelize';

// What a trial's uploads read each of their own column headers as, where the person chose it in
// the mapping step (a role, a measure code, or nothing): the next upload with that header starts
// from the same choice. One row per trial and header, as written.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('intake_column_choices', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    header: { type: DataTypes.STRING(255), allowNull: false },
    /** plotLabel, block, treatment, notes, missingReason, a measure code, or null for "not read". */
    choice: { type: DataTypes.STRING(40), allowNull: true },
    updated_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('intake_column_choices', ['trial_id', 'header'], { unique: true, name: 'intake_column_choices_header' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('intake_column_choices');
}
