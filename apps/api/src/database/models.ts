import { ActivityEntryRow } from '../activity/models/activity-entry.model';
import { TrialInvitation } from '../invitations/models/trial-invitation.model';
import { RoundReminder } from '../reminders/models/round-reminder.model';
import { FactorLevel } from '../factors/models/factor-level.model';
import { TrialFactor } from '../factors/models/trial-factor.model';
import { MeasureRow } from '../measures/models/measure.model';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { RoundMeasure } from '../rounds/models/round-measure.model';
import { SiteRow } from '../sites/models/site.model';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import { IntakeUploadRow } from '../intake/models/intake-upload.model';
import { ObservationChangeRow } from '../observations/models/observation-change.model';
import { ObservationRow } from '../observations/models/observation.model';
import { PlotPhotoRow } from '../photos/models/plot-photo.model';
import { AnalysisSnapshotRow } from '../analyses/models/analysis-snapshot.model';
import { SnapshotCommentRow } from '../analyses/models/snapshot-comment.model';
import { SnapshotCommentRevisionRow } from '../analyses/models/snapshot-comment-revision.model';
import { AnalysisSignOffRow } from '../analyses/models/analysis-sign-off.model';
import { ReviewRequestRow } from '../analyses/models/review-request.model';
import { TrialDeparture } from '../trials/models/trial-departure.model';
import { UserSession } from '../auth/models/user-session.model';
import { SignInLockout } from '../auth/models/sign-in-lockout.model';
import { PasswordReset } from '../auth/models/password-reset.model';
import { IntakeImportRow } from '../intake/models/intake-import.model';
import { IntakeColumnChoiceRow } from '../intake/models/intake-column-choice.model';

/** Every model, for connections made outside Nest (command line, tests). */
export const allModels = [
  User,
  Trial,
  TrialMembership,
  ActivityEntryRow,
  TrialFactor,
  FactorLevel,
  TreatmentRow,
  MeasureRow,
  AssessmentRoundRow,
  RoundMeasure,
  SiteRow,
  PlotRow,
  TrialInvitation,
  RoundReminder,
  IntakeUploadRow,
  ObservationRow,
  ObservationChangeRow,
  PlotPhotoRow,
  AnalysisSnapshotRow,
  SnapshotCommentRow,
  SnapshotCommentRevisionRow,
  AnalysisSignOffRow,
  ReviewRequestRow,
  TrialDeparture,
  UserSession,
  SignInLockout,
  PasswordReset,
  IntakeImportRow,
  IntakeColumnChoiceRow,
];
