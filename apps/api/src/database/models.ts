import { ActivityEntryRow } from '../activity/models/activity-entry.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';

/** Every model, for connections made outside Nest (command line, tests). */
export const allModels = [User, Trial, TrialMembership, ActivityEntryRow];
