// Intake (CSV upload) and Ledger (the observations grid and its history).

/** One problem in an uploaded file, by row as a spreadsheet shows it (the header is row 1, the first data row is row 2) and column header. */
export interface IntakeProblem {
  row: number | null;
  column: string | null;
  message: string;
}

/** One value of an upload's change list. */
export interface IntakeChange {
  plotLabel: string;
  measureCode: string;
  kind: 'new' | 'changed' | 'unchanged';
  /** As a person writes it: "12.50", ">600", "NA (flooded)"; null when there was no value. */
  before: string | null;
  after: string | null;
}

/** POST /api/trials/:trialId/sites/:siteId/rounds/:roundId/intake — 200 answer (also for ?dryRun=true). */
export interface IntakeResult {
  dryRun: boolean;
  created: number;
  updated: number;
  unchanged: number;
  /** Values outside the plausible range, and similar: accepted only with acceptWarnings=true. */
  warnings: IntakeProblem[];
  /**
   * Per value: what the upload would do (dry run) or did — changed values first, then new ones,
   * then unchanged ones, each in file order, at most INTAKE_CHANGE_LIST_CAP of them.
   */
  changes: IntakeChange[];
  /** How many values the counts hold beyond those listed in `changes` (0 for files of up to 1,000 values). */
  changesOmitted: number;
  /** True when the file is byte-identical to the last committed upload for this site and round. */
  identicalToPrevious: boolean;
  message: string;
  /** The import record that followed this upload (GET /api/trials/:trialId/intake-imports/:ticket). */
  ticket: string;
}

/** Most values listed in an IntakeResult's `changes`. */
export const INTAKE_CHANGE_LIST_CAP = 1000;

/**
 * Where an upload stands: checking rows, comparing with the values already stored, writing; then
 * done, refused (nothing written, problems listed), failed (nothing written, a server fault) or
 * interrupted (the server stopped while it ran; nothing was written).
 */
export type IntakeStage = 'checking' | 'comparing' | 'writing' | 'done' | 'refused' | 'failed' | 'interrupted';

/** GET /api/trials/:trialId/intake-imports/:ticket — an upload's progress, then its answer. */
export interface IntakeImport {
  ticket: string;
  siteId: number;
  roundId: number;
  fileName: string;
  sizeBytes: number;
  format: 'csv' | 'xlsx';
  dryRun: boolean;
  stage: IntakeStage;
  /** Data rows read and checked so far. */
  rowsChecked: number;
  /** Bytes of the file read so far (CSV; a workbook is unpacked first, so it stays 0). */
  bytesRead: number;
  /** Values to compare or write, once known. */
  valuesTotal: number | null;
  /** Values compared or written so far. */
  valuesDone: number;
  /** The answer's sentence once finished; what is happening while it runs. */
  message: string | null;
  userName: string | null;
  startedAt: string;
  updatedAt: string;
  finishedAt: string | null;
  /** The 200 answer, once done. */
  result: IntakeResult | null;
  /** The 422 answer, once refused: every problem by row and column. */
  refusal: IntakeRefusal | null;
}

/** GET /api/trials/:trialId/intake-columns — how the trial's uploads read their own headers, where people chose it. */
export interface IntakeColumnChoice {
  header: string;
  /** plotLabel, block, treatment, notes, missingReason, a measure code, or null ("not read"). */
  choice: string | null;
}

/** 422 answer of the intake: nothing was written. */
export interface IntakeRefusal {
  statusCode: 422;
  error: string;
  message: string;
  errors: IntakeProblem[];
}

export interface Observation {
  id: number;
  plotId: number;
  plotLabel: string;
  siteId: number;
  siteName: string;
  block: number;
  treatmentCode: string;
  roundId: number;
  roundLabel: string;
  measureId: number;
  measureCode: string;
  /** Exactly as typed and stored (decimal text); null when missing. */
  valueText: string | null;
  valueNumber: number | null;
  /** Right-censored at valueText (e.g. not drained by the cut-off). */
  censored: boolean;
  missingReason: string | null;
  notes: string | null;
  version: number;
  recordedById: number | null;
  recordedBy: string | null;
  recordedAt: string;
}

/** PATCH /api/trials/:trialId/observations/:observationId — or POST for a cell that has no value yet. */
export interface ObservationEdit {
  /** The version the editor saw; a stale version answers 409 with the current value. */
  version: number;
  /** "12.5", ">600", "" or "NA" (missing). */
  value: string;
  missingReason?: string | null;
  notes?: string | null;
  /** True to keep a value outside the usual range (a warning); without it such an edit answers 422 with the warning. */
  acceptWarnings?: boolean;
}

/** POST /api/trials/:trialId/observations — a value for a cell that has none yet. */
export interface ObservationCreate {
  plotId: number;
  roundId: number;
  measureId: number;
  /** "12.5", ">600", "" or "NA" (missing). */
  value: string;
  missingReason?: string | null;
  notes?: string | null;
  acceptWarnings?: boolean;
}

/** 409 answer of an edit made from a stale version (or a POST for a cell that already has a value): nothing was written. */
export interface ObservationConflict {
  statusCode: 409;
  error: string;
  message: string;
  /** The value as it is stored now, with its version. */
  current: Observation;
}

/** GET /api/trials/:trialId/plots/:plotId/rounds/:roundId/photo answers the image; PUT answers this. */
export interface PlotPhoto {
  plotId: number;
  roundId: number;
  contentType: 'image/jpeg' | 'image/png';
  sizeBytes: number;
  uploadedById: number | null;
  uploadedAt: string;
}

export interface ObservationHistoryEntry {
  at: string;
  by: string | null;
  source: 'upload' | 'edit';
  before: string | null;
  after: string | null;
}
