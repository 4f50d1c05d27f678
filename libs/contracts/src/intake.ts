// Intake (CSV upload) and Ledger (the observations grid and its history).

/** One problem in an uploaded file, by row as a spreadsheet shows it (the header is row 1, the first data row is row 2) and column header. */
export interface IntakeProblem {
  row: number | null;
  column: string | null;
  message: string;
}

/** POST /api/trials/:trialId/sites/:siteId/rounds/:roundId/intake — 200 answer (also for ?dryRun=true). */
export interface IntakeResult {
  dryRun: boolean;
  created: number;
  updated: number;
  unchanged: number;
  /** Values outside the plausible range, and similar: accepted only with acceptWarnings=true. */
  warnings: IntakeProblem[];
  /** Per value: what the upload would do (dry run) or did. */
  changes: Array<{ plotLabel: string; measureCode: string; kind: 'new' | 'changed' | 'unchanged'; before: string | null; after: string | null }>;
  /** True when the file is byte-identical to the last committed upload for this site and round. */
  identicalToPrevious: boolean;
  message: string;
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
