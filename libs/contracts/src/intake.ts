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
}

export interface ObservationHistoryEntry {
  at: string;
  by: string | null;
  source: 'upload' | 'edit';
  before: string | null;
  after: string | null;
}
