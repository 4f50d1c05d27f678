import type { Observation } from '@friable/contracts';
import { StaleEditException } from '../protocol-gate/edit-version';

/** An edit from a stale version (or a new value for a cell that has one): nothing written; carries the stored value. */
export class ObservationConflictException extends StaleEditException<Observation> {}
