import { QueryTypes, type QueryInterface } from 'sequelize';

// Sign-offs and comments become editable records with a version: a sign-off's author amends its statement or
// withdraws it (kept, with the reason, never deleted), and a stale edit of either is refused. `live` (1 while
// not withdrawn, NULL once withdrawn) keeps one standing sign-off per person and analysis, so someone who
// withdrew theirs can sign again while the withdrawn one stays on the record.
const run = (queryInterface: QueryInterface, sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await run(
    queryInterface,
    'ALTER TABLE `analysis_sign_offs` ADD COLUMN `version` INT UNSIGNED NOT NULL DEFAULT 1, ' +
      'ADD COLUMN `amended_at` DATETIME(3) NULL, ADD COLUMN `withdrawn_at` DATETIME(3) NULL, ' +
      'ADD COLUMN `withdrawal_reason` VARCHAR(1000) NULL, ' +
      'ADD COLUMN `live` TINYINT AS (IF(`withdrawn_at` IS NULL, 1, NULL)) PERSISTENT',
  );
  await run(queryInterface, 'ALTER TABLE `analysis_sign_offs` DROP INDEX `analysis_sign_offs_signer`, ADD UNIQUE INDEX `analysis_sign_offs_signer` (`snapshot_id`, `user_id`, `live`)');
  await run(queryInterface, 'ALTER TABLE `snapshot_comments` ADD COLUMN `version` INT UNSIGNED NOT NULL DEFAULT 1');
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await run(queryInterface, 'ALTER TABLE `snapshot_comments` DROP COLUMN `version`');
  // Withdrawn sign-offs would clash with standing ones under the old key: they go first.
  await run(queryInterface, 'DELETE FROM `analysis_sign_offs` WHERE `withdrawn_at` IS NOT NULL');
  await run(queryInterface, 'ALTER TABLE `analysis_sign_offs` DROP INDEX `analysis_sign_offs_signer`, ADD UNIQUE INDEX `analysis_sign_offs_signer` (`snapshot_id`, `user_id`)');
  await run(queryInterface, 'ALTER TABLE `analysis_sign_offs` DROP COLUMN `live`, DROP COLUMN `withdrawal_reason`, DROP COLUMN `withdrawn_at`, DROP COLUMN `amended_at`, DROP COLUMN `version`');
}
