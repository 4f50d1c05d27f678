import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readDatabaseConfig } from '../../src/config/database.config';
import { createMigrator } from '../../src/database/migrator';
import { migrations } from '../../src/database/migrations';
import { sequelizeOptions } from '../../src/database/sequelize-options';

// Runs on a scratch database of its own, so the test database the other suites use is untouched.
describe('migrations', () => {
  let sequelize: Sequelize;
  const tables = async () =>
    (await sequelize.query<{ name: string }>('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()', { type: QueryTypes.SELECT }))
      .map((row) => row.name)
      .sort();

  beforeAll(async () => {
    const database = process.env.FRIABLE_SCRATCH_DB ?? `${readDatabaseConfig().database}_migrations`;
    sequelize = new Sequelize(sequelizeOptions({ ...readDatabaseConfig(), database }));
    // Leftovers of an earlier run, dropped on one connection with foreign-key checks off.
    const leftovers = await tables();
    await sequelize.transaction(async (transaction) => {
      await sequelize.query('SET FOREIGN_KEY_CHECKS = 0', { transaction, type: QueryTypes.RAW });
      for (const name of leftovers) await sequelize.query(`DROP TABLE IF EXISTS \`${name}\``, { transaction, type: QueryTypes.RAW });
      await sequelize.query('SET FOREIGN_KEY_CHECKS = 1', { transaction, type: QueryTypes.RAW });
    });
  });
  afterAll(() => sequelize.close());

  it('goes up from empty, down to empty, and up again', async () => {
    const migrator = createMigrator(sequelize, undefined);
    expect(await tables()).toEqual([]);

    const applied = await migrator.up();
    expect(applied.map((m) => m.name)).toEqual(migrations.map(([name]) => name));
    expect(await tables()).toEqual([
      'activity_entries',
      'analysis_sign_offs',
      'analysis_snapshots',
      'assessment_rounds',
      'data_stamps',
      'factor_levels',
      'intake_column_choices',
      'intake_imports',
      'intake_uploads',
      'invitations',
      'measures',
      'observation_changes',
      'observations',
      'password_resets',
      'plot_photos',
      'plots',
      'review_requests',
      'round_measures',
      'round_reminders',
      'scheduler_leases',
      'schema_migrations',
      'sign_in_lockouts',
      'sites',
      'snapshot_comment_revisions',
      'snapshot_comments',
      'treatments',
      'trial_departures',
      'trial_factors',
      'trial_memberships',
      'trials',
      'user_sessions',
      'users',
    ]);

    const reverted = await migrator.down({ to: 0 });
    expect(reverted).toHaveLength(migrations.length);
    expect(await tables()).toEqual(['schema_migrations']);

    const again = await migrator.up();
    expect(again).toHaveLength(migrations.length);
    expect((await migrator.pending()).length).toBe(0);
  });
});
