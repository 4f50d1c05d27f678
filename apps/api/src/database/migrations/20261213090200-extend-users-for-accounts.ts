import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

// What each person sets for themselves (locale, e-mail preferences) and what the People page shows
// (last sign-in, when the password last changed).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('users', 'locale', { type: DataTypes.STRING(20), allowNull: true });
  await queryInterface.addColumn('users', 'email_reminders', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
  await queryInterface.addColumn('users', 'email_receipts', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
  await queryInterface.addColumn('users', 'last_sign_in_at', { type: DataTypes.DATE(3), allowNull: true });
  await queryInterface.addColumn('users', 'password_changed_at', { type: DataTypes.DATE(3), allowNull: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  // One ALTER with an explicit query type: removeColumn's untyped query trips over the mariadb driver's result meta.
  await queryInterface.sequelize.query(
    'ALTER TABLE users DROP COLUMN password_changed_at, DROP COLUMN last_sign_in_at, DROP COLUMN email_receipts, DROP COLUMN email_reminders, DROP COLUMN locale',
    { type: QueryTypes.RAW },
  );
}
