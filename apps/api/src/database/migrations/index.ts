import type { QueryInterface } from 'sequelize';
import * as createUsers from './20261201090000-create-users';
import * as createTrials from './20261201090100-create-trials';
import * as createTrialMemberships from './20261201090200-create-trial-memberships';
import * as createActivityEntries from './20261202090000-create-activity-entries';

export interface MigrationModule {
  up(params: { context: QueryInterface }): Promise<void>;
  down(params: { context: QueryInterface }): Promise<void>;
}

/** Every migration in the order it runs; a new file is added at the end of this list. */
export const migrations: ReadonlyArray<readonly [name: string, module: MigrationModule]> = [
  ['20261201090000-create-users', createUsers],
  ['20261201090100-create-trials', createTrials],
  ['20261201090200-create-trial-memberships', createTrialMemberships],
  ['20261202090000-create-activity-entries', createActivityEntries],
];
