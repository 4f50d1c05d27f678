import type { QueryInterface } from 'sequelize';
import * as createUsers from './20261201090000-create-users';
import * as createTrials from './20261201090100-create-trials';
import * as createTrialMemberships from './20261201090200-create-trial-memberships';
import * as createActivityEntries from './20261202090000-create-activity-entries';
import * as extendTrialsProtocol from './20261202090100-extend-trials-protocol';
import * as createFactors from './20261202090200-create-factors';
import * as createTreatments from './20261202090300-create-treatments';
import * as createMeasures from './20261202090400-create-measures';
import * as createAssessmentRounds from './20261202090500-create-assessment-rounds';
import * as createSites from './20261202090600-create-sites';
import * as createPlots from './20261202090700-create-plots';
import * as createInvitations from './20261203090000-create-invitations';
import * as createRoundReminders from './20261203090100-create-round-reminders';
import * as createIntakeUploads from './20261204090000-create-intake-uploads';
import * as createObservations from './20261204090100-create-observations';
import * as createObservationChanges from './20261204090200-create-observation-changes';
import * as createPlotPhotos from './20261204090300-create-plot-photos';
import * as createAnalysisSnapshots from './20261205090000-create-analysis-snapshots';
import * as createSnapshotComments from './20261205090100-create-snapshot-comments';
import * as createUserSessions from './20261213090000-create-user-sessions';
import * as createSignInLockouts from './20261213090100-create-sign-in-lockouts';
import * as extendUsersForAccounts from './20261213090200-extend-users-for-accounts';
import * as createPasswordResets from './20261213090300-create-password-resets';
import * as createTrialDepartures from './20261213090400-create-trial-departures';
import * as createAnalysisSignOffs from './20261213090500-create-analysis-sign-offs';
import * as extendSnapshotComments from './20261213090600-extend-snapshot-comments';
import * as createReviewRequests from './20261213090700-create-review-requests';
import * as addObservationUpload from './20261217090000-add-observation-upload';
import * as createIntakeImports from './20261217090100-create-intake-imports';
import * as createIntakeColumnChoices from './20261217090200-create-intake-column-choices';
import * as factorLevelRates from './20261218090000-factor-level-rates';
import * as fourFactorTreatments from './20261218090100-four-factor-treatments';
import * as plotUnits from './20261218090200-plot-units';
import * as signOffAndCommentVersions from './20261220110000-sign-off-and-comment-versions';
import * as createDataStamps from './20261215090000-create-data-stamps';
import * as createSchedulerLeases from './20261215090100-create-scheduler-leases';
import * as protocolVersions from './20261214090000-protocol-versions';

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
  ['20261202090100-extend-trials-protocol', extendTrialsProtocol],
  ['20261202090200-create-factors', createFactors],
  ['20261202090300-create-treatments', createTreatments],
  ['20261202090400-create-measures', createMeasures],
  ['20261202090500-create-assessment-rounds', createAssessmentRounds],
  ['20261202090600-create-sites', createSites],
  ['20261202090700-create-plots', createPlots],
  ['20261203090000-create-invitations', createInvitations],
  ['20261203090100-create-round-reminders', createRoundReminders],
  ['20261204090000-create-intake-uploads', createIntakeUploads],
  ['20261204090100-create-observations', createObservations],
  ['20261204090200-create-observation-changes', createObservationChanges],
  ['20261204090300-create-plot-photos', createPlotPhotos],
  ['20261205090000-create-analysis-snapshots', createAnalysisSnapshots],
  ['20261205090100-create-snapshot-comments', createSnapshotComments],
  ['20261213090000-create-user-sessions', createUserSessions],
  ['20261213090100-create-sign-in-lockouts', createSignInLockouts],
  ['20261213090200-extend-users-for-accounts', extendUsersForAccounts],
  ['20261213090300-create-password-resets', createPasswordResets],
  ['20261213090400-create-trial-departures', createTrialDepartures],
  ['20261213090500-create-analysis-sign-offs', createAnalysisSignOffs],
  ['20261213090600-extend-snapshot-comments', extendSnapshotComments],
  ['20261213090700-create-review-requests', createReviewRequests],
  ['20261217090000-add-observation-upload', addObservationUpload],
  ['20261217090100-create-intake-imports', createIntakeImports],
  ['20261217090200-create-intake-column-choices', createIntakeColumnChoices],
  ['20261218090000-factor-level-rates', factorLevelRates],
  ['20261218090100-four-factor-treatments', fourFactorTreatments],
  ['20261218090200-plot-units', plotUnits],
  ['20261215090000-create-data-stamps', createDataStamps],
  ['20261215090100-create-scheduler-leases', createSchedulerLeases],
  ['20261214090000-protocol-versions', protocolVersions],
  ['20261220110000-sign-off-and-comment-versions', signOffAndCommentVersions],
];
