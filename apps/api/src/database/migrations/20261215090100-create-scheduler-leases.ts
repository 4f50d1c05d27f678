import { QueryTypes, type QueryInterface } from 'sequelize';

// Scheduler leases: which API instance runs a scheduled job (the daily round reminders) for a while, so that
// several instances on one database elect one runner instead of a hand-set flag (reminders/scheduler-lease.ts).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(
    'CREATE TABLE `scheduler_leases` (' +
      '`name` VARCHAR(40) NOT NULL, ' +
      '`holder` VARCHAR(100) NOT NULL, ' +
      '`expires_at` DATETIME(3) NOT NULL, ' +
      'PRIMARY KEY (`name`)' +
      ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    { type: QueryTypes.RAW },
  );
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('scheduler_leases');
}
