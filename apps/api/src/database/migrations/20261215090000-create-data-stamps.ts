import { QueryTypes, type QueryInterface } from 'sequelize';

// Data stamps: a random token per scope ('all', or 'trial:<id>') replaced by every write, shared by every API
// instance. Findings answers are cached under the stamp they were computed at (data-stamps/, findings/findings-cache.ts).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query(
    'CREATE TABLE `data_stamps` (' +
      '`scope` VARCHAR(40) NOT NULL, ' +
      '`stamp` CHAR(32) NOT NULL, ' +
      '`changed_at` DATETIME(3) NOT NULL, ' +
      'PRIMARY KEY (`scope`)' +
      ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    { type: QueryTypes.RAW },
  );
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('data_stamps');
}
