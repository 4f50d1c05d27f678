import { QueryTypes, type QueryInterface } from 'sequelize';

// Protocol rows carry a version (a stale edit is refused, not silently applied), and treatments, measures,
// rounds and sites are archived instead of deleted (deleted_at). An archived row keeps its code, label or name
// for the record; `live` (1 while not archived, NULL once archived) keeps those unique among live rows only.
const versioned = ['trials', 'treatments', 'measures', 'assessment_rounds', 'sites', 'trial_factors'] as const;

const uniqueKeys: ReadonlyArray<{ table: string; name: string; columns: string[] }> = [
  { table: 'treatments', name: 'treatments_code', columns: ['trial_id', 'code'] },
  { table: 'measures', name: 'measures_code', columns: ['trial_id', 'code'] },
  { table: 'assessment_rounds', name: 'assessment_rounds_label', columns: ['trial_id', 'label'] },
  { table: 'sites', name: 'sites_name', columns: ['trial_id', 'name'] },
  { table: 'sites', name: 'sites_label_prefix', columns: ['trial_id', 'label_prefix'] },
];
const archived = [...new Set(uniqueKeys.map((key) => key.table))];

const run = (queryInterface: QueryInterface, sql: string) => queryInterface.sequelize.query(sql, { type: QueryTypes.RAW });
const columnList = (columns: string[]) => columns.map((c) => `\`${c}\``).join(', ');

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  for (const table of versioned) await run(queryInterface, `ALTER TABLE \`${table}\` ADD COLUMN \`version\` INT UNSIGNED NOT NULL DEFAULT 1`);
  for (const table of archived) {
    await run(
      queryInterface,
      `ALTER TABLE \`${table}\` ADD COLUMN \`deleted_at\` DATETIME NULL, ` +
        'ADD COLUMN `live` TINYINT AS (IF(`deleted_at` IS NULL, 1, NULL)) PERSISTENT',
    );
  }
  for (const key of uniqueKeys) {
    await run(queryInterface, `ALTER TABLE \`${key.table}\` DROP INDEX \`${key.name}\`, ADD UNIQUE INDEX \`${key.name}\` (${columnList([...key.columns, 'live'])})`);
  }
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  // Archived rows would clash with live ones under the old keys: they go first.
  for (const table of archived) await run(queryInterface, `DELETE FROM \`${table}\` WHERE \`deleted_at\` IS NOT NULL`);
  for (const key of uniqueKeys) {
    await run(queryInterface, `ALTER TABLE \`${key.table}\` DROP INDEX \`${key.name}\`, ADD UNIQUE INDEX \`${key.name}\` (${columnList(key.columns)})`);
  }
  for (const table of archived) await run(queryInterface, `ALTER TABLE \`${table}\` DROP COLUMN \`live\`, DROP COLUMN \`deleted_at\``);
  for (const table of versioned) await run(queryInterface, `ALTER TABLE \`${table}\` DROP COLUMN \`version\``);
}
