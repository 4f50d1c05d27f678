import { DataTypes, type QueryInterface } from 'sequelize';

// Failed sign-ins counted per account (by e-mail, known or not) and per client address, in the database
// so every API instance sees the same counts and the same lockouts.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('sign_in_lockouts', {
    subject: { type: DataTypes.STRING(300), primaryKey: true },
    failures: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    last_failure_at: { type: DataTypes.DATE(3), allowNull: true },
    locked_until: { type: DataTypes.DATE(3), allowNull: true },
  });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('sign_in_lockouts');
}
