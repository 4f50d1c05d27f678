import type { IntakeValue } from './validate-intake';

/** A value from `validateIntake`; `blank` (see `keepExistingWhereBlank`) and `notes` may be left out. */
export type IncomingValue = Pick<IntakeValue, 'plotId' | 'plotLabel' | 'measureId' | 'measureCode' | 'valueText' | 'censored' | 'missingReason'> &
  Partial<Pick<IntakeValue, 'blank' | 'notes'>>;

export interface ExistingValue {
  readonly plotId: number;
  readonly measureId: number;
  readonly valueText: string | null;
  readonly censored: boolean;
  readonly missingReason: string | null;
  /** Compared only when given. */
  readonly notes?: string | null;
}

export interface PlannedChange {
  readonly plotId: number;
  readonly plotLabel: string;
  readonly measureId: number;
  readonly measureCode: string;
  readonly kind: 'new' | 'changed' | 'unchanged';
  /** As a person would write it: "12.50", ">600", "NA", "NA (flooded)"; null when there was no value. */
  readonly before: string | null;
  readonly after: string | null;
}

export interface ChangePlan {
  readonly created: number;
  readonly updated: number;
  readonly unchanged: number;
  readonly changes: readonly PlannedChange[];
}

export interface PlanOptions {
  /**
   * When true, an empty cell leaves a value already stored as it is (reported as unchanged)
   * instead of replacing it with "missing". Off by default: the issue says blank = missing.
   */
  readonly keepExistingWhereBlank?: boolean;
}

type Stored = Pick<ExistingValue, 'valueText' | 'censored' | 'missingReason'>;

/** How a stored or incoming value reads in the change list. */
export function describeStoredValue(value: Stored): string {
  if (value.valueText === null) return value.missingReason ? `NA (${value.missingReason})` : 'NA';
  return `${value.censored ? '>' : ''}${value.valueText}`;
}

function sameValue(incoming: IncomingValue, existing: ExistingValue): boolean {
  const sameNotes = existing.notes === undefined || (existing.notes ?? null) === (incoming.notes ?? null);
  return (
    incoming.valueText === existing.valueText &&
    incoming.censored === existing.censored &&
    (incoming.valueText !== null || (incoming.missingReason ?? null) === (existing.missingReason ?? null)) &&
    sameNotes
  );
}

const keyOf = (value: { plotId: number; measureId: number }): string => `${value.plotId}:${value.measureId}`;

/**
 * Plan changes — compares the values of an upload with those already stored and says, value by
 * value, what committing it would do (the dry run's diff).
 *
 * Purpose: the uploader sees "new", "changed" (before → after) and "unchanged" before anything is
 * written. Values compare as text, exactly: what was typed is what comes back, so "12.50" over a
 * stored "12.5" is a change even though the numbers are equal. The censoring flag, the reason of a
 * missing value and (when the stored side gives them) the notes count too. Stored values the file
 * does not mention are not part of the plan: an upload never deletes.
 * Reference: the Intake issue (dry run before the all-or-nothing commit).
 * Throws: RangeError when `incoming` holds a plot and measure twice (validateIntake refuses such files).
 * Example: `planChanges([{ plotId: 1, plotLabel: 'HL-B1-P01', measureId: 2, measureCode: 'DRAIN', valueText: '12.50', censored: false, missingReason: null }],
 *   [{ plotId: 1, measureId: 2, valueText: '12.5', censored: false, missingReason: null }])`
 * → `{ created: 0, updated: 1, unchanged: 0, changes: [{ …, kind: 'changed', before: '12.5', after: '12.50' }] }`
 */
export function planChanges(incoming: readonly IncomingValue[], existing: readonly ExistingValue[], options: PlanOptions = {}): ChangePlan {
  const stored = new Map(existing.map((value) => [keyOf(value), value]));
  const seen = new Set<string>();
  const counts = { new: 0, changed: 0, unchanged: 0 };
  const changes = incoming.map((value): PlannedChange => {
    const key = keyOf(value);
    if (seen.has(key)) {
      throw new RangeError(`planChanges: incoming must hold each plot and measure once (got plot ${value.plotId}, measure ${value.measureId} twice)`);
    }
    seen.add(key);
    const before = stored.get(key);
    const keep = before !== undefined && value.blank === true && options.keepExistingWhereBlank === true;
    const kind = before === undefined ? 'new' : keep || sameValue(value, before) ? 'unchanged' : 'changed';
    counts[kind] += 1;
    const beforeText = before === undefined ? null : describeStoredValue(before);
    return Object.freeze({
      plotId: value.plotId,
      plotLabel: value.plotLabel,
      measureId: value.measureId,
      measureCode: value.measureCode,
      kind,
      before: beforeText,
      after: keep ? beforeText : describeStoredValue(value),
    });
  });
  return Object.freeze({ created: counts.new, updated: counts.changed, unchanged: counts.unchanged, changes: Object.freeze(changes) });
}
