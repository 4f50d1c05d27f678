import type { IntakeProblem, Measure } from '@friable/contracts';
import { DATA_COLUMNS, IDENTITY_COLUMNS, dataColumnOfHeader, findUnit, normaliseHeader, parseUnitFromHeader } from '@friable/field';
import { unitFactor } from './unit-factor';

export { normaliseHeader };

/** The columns that are not measures: plotLabel, block, treatment, notes, missingReason (and any identity column a design adds). */
export const COLUMN_ROLES: readonly string[] = DATA_COLUMNS.map((column) => column.role);
export type ColumnRole = string;

export interface MeasureColumn {
  readonly measureId: number;
  readonly measureCode: string;
  readonly index: number;
  readonly header: string;
  /** The unit id written in the header when it differs from the measure's unit; null when values are in the measure's unit. */
  readonly headerUnitId: string | null;
  /** Decimal multiplier from the header's unit to the measure's ("60" for min → s); null when nothing is converted. */
  readonly factor: string | null;
  /** Problems of this column (an unknown unit, a unit of another kind); its values are not read while it has any. */
  readonly problems: readonly IntakeProblem[];
}

/** An identity column other than the plot label (block, treatment code, …): checked against the plot plan. */
export interface IdentityColumnAt {
  readonly role: string;
  readonly index: number;
  readonly header: string;
}

/** A column of notes that belong to one measure's values ("drain time note", "DRAIN notes"), not to the whole row. */
export interface MeasureNoteColumn {
  readonly measureId: number;
  readonly index: number;
  readonly header: string;
}

/** The mapping's name for a measure's own notes column: "notes:DRAIN". */
export const measureNoteChoice = (code: string) => `notes:${code}`;

export interface ColumnMapping {
  readonly plotLabel: number | null;
  readonly block: number | null;
  readonly treatment: number | null;
  readonly notes: number | null;
  readonly missingReason: number | null;
  /** Every identity column the file has besides the plot label, in file order. */
  readonly identity: readonly IdentityColumnAt[];
  readonly measures: readonly MeasureColumn[];
  /** Notes columns of single measures: their text goes to that measure's value of the row only. */
  readonly measureNotes: readonly MeasureNoteColumn[];
  /** Headers of the columns nothing reads (empty headers left out). */
  readonly unmapped: readonly string[];
  /** Every mapping problem, those of the measure columns included. They are errors: nothing is written while any remain. */
  readonly problems: readonly IntakeProblem[];
  /** What each named column was read as (header → role, measure code or null), to be remembered for the trial's next upload. */
  readonly choices: Readonly<Record<string, string | null>>;
}

/**
 * How a person can override the matching, by header: a role, a measure code, or null to ignore
 * the column.
 */
export type ColumnOverrides = Readonly<Record<string, ColumnRole | string | null>>;

const roleWords: Record<string, string> = Object.fromEntries(DATA_COLUMNS.map((column) => [column.role, column.words]));
const identityRoles = new Set(IDENTITY_COLUMNS.map((column) => column.role));

function measureNamed(measures: readonly Measure[], key: string): Measure | undefined {
  return measures.find((measure) => normaliseHeader(measure.name) === key || normaliseHeader(measure.code) === key);
}

/** The template's header for a measure, as the plot plan's CSV template writes it: the name with the unit id in parentheses. */
export function templateHeader(measure: Pick<Measure, 'name' | 'unit'>): string {
  return `${measure.name} (${findUnit(measure.unit)?.id ?? measure.unit})`;
}

type Target = { role: ColumnRole } | { measure: Measure; unitText: string | null } | { notesOf: Measure } | null;

/** "drain time note", "DRAIN notes", "drain time (s) comments": the measure whose notes the header names, if any. */
const NOTE_SUFFIX = /^(.+?)\s*(?:notes?|comments?|remarks?)$/;

function measureOfHeader(header: string, measures: readonly Measure[]): { measure: Measure; unitText: string | null } | null {
  const whole = measureNamed(measures, normaliseHeader(header));
  if (whole) return { measure: whole, unitText: null };
  const parsed = parseUnitFromHeader(header);
  const named = parsed.unitText === null ? undefined : measureNamed(measures, normaliseHeader(parsed.name));
  return named ? { measure: named, unitText: parsed.unitText } : null;
}

function matchHeader(header: string, measures: readonly Measure[]): Target {
  const role = dataColumnOfHeader(header)?.role;
  if (role) return { role };
  const measure = measureOfHeader(header, measures);
  if (measure) return measure;
  const noted = NOTE_SUFFIX.exec(normaliseHeader(header));
  const notesOf = noted ? measureOfHeader(noted[1]!, measures) : null;
  return notesOf ? { notesOf: notesOf.measure } : null;
}

function overrideTarget(header: string, target: string, measures: readonly Measure[]): Target | string {
  if (COLUMN_ROLES.includes(target)) return { role: target };
  if (target.startsWith('notes:')) {
    const noted = measures.find((candidate) => measureNoteChoice(candidate.code).toLowerCase() === target.trim().toLowerCase());
    return noted ? { notesOf: noted } : `Column "${header}" is mapped to the notes of "${target.slice('notes:'.length)}", which is not a measure of this round.`;
  }
  const measure = measures.find((candidate) => candidate.code.toLowerCase() === target.trim().toLowerCase());
  if (!measure) return `Column "${header}" is mapped to "${target}", which is not a measure of this round.`;
  const wholeHeaderIsTheMeasure = measureNamed([measure], normaliseHeader(header)) !== undefined;
  return { measure, unitText: wholeHeaderIsTheMeasure ? null : parseUnitFromHeader(header).unitText };
}

/**
 * Map columns — decides which column of an uploaded file holds the plot label, the block, the
 * treatment, the notes, the reason for a missing value, and each measure of the round.
 *
 * Purpose: the template's headers ("plot label", "block", "treatment code", "drain time (s)",
 * "notes") match without help, and so do the measure's code ("DRAIN"), other cases and spacing,
 * and the unit in parentheses or brackets. A header naming a measure followed by "note", "notes" or
 * "comments" ("drain time note") holds notes of that measure's values alone. A unit Friable knows is converted ("drain time (min)"
 * for a measure in s); a unit it does not know, or one of another kind, is a problem naming the
 * column. `overrides` (header → role, measure code, or null to ignore) come from the browser's
 * mapping step and win over the matching; `remembered` choices (the trial's earlier uploads) come
 * next, and one that no longer fits the round (a measure it does not take) is passed over silently.
 * Reference: unit spellings of @friable/field's MEASURE_UNITS.
 * Throws: nothing; every difficulty is in `problems` (row null, column = the header).
 * Example: `mapColumns(['plot label', 'drain time (min)'], [drainTime])` →
 * `{ plotLabel: 0, measures: [{ measureId: 1, index: 1, header: 'drain time (min)', headerUnitId: 'min', factor: '60', problems: [] }], unmapped: [], problems: [], … }`
 */
export function mapColumns(
  headers: readonly string[],
  measures: readonly Measure[],
  overrides: ColumnOverrides = {},
  remembered: ColumnOverrides = {},
): ColumnMapping {
  const problems: IntakeProblem[] = [];
  const choices: Record<string, string | null> = {};
  const identity: IdentityColumnAt[] = [];
  const roles = new Map<ColumnRole, number>();
  const measureColumns: MeasureColumn[] = [];
  const measureNotes: MeasureNoteColumn[] = [];
  const unmapped: string[] = [];
  const claimedBy = new Map<string, string>();

  const claim = (key: string, header: string, what: string): boolean => {
    const earlier = claimedBy.get(key);
    if (earlier === undefined) {
      claimedBy.set(key, header);
      return true;
    }
    problems.push({ row: null, column: header, message: `Columns "${earlier}" and "${header}" both give ${what}: remove one or map it to nothing.` });
    return false;
  };

  headers.forEach((header, index) => {
    if (header === '') return;
    const target = targetOf(header, measures, overrides, remembered);
    if (typeof target === 'string') {
      problems.push({ row: null, column: header, message: target });
      return;
    }
    choices[header] = target === null ? null : 'role' in target ? target.role : 'notesOf' in target ? measureNoteChoice(target.notesOf.code) : target.measure.code;
    if (target === null) {
      unmapped.push(header);
    } else if ('notesOf' in target) {
      if (claim(`notes:${target.notesOf.id}`, header, `the notes of ${target.notesOf.name}`)) measureNotes.push(Object.freeze({ measureId: target.notesOf.id, index, header }));
    } else if ('role' in target) {
      if (claim(target.role, header, roleWords[target.role]!)) {
        roles.set(target.role, index);
        if (identityRoles.has(target.role) && target.role !== 'plotLabel') identity.push(Object.freeze({ role: target.role, index, header }));
      }
    } else if (claim(`measure:${target.measure.id}`, header, target.measure.name)) {
      const unit = unitFactor(target.unitText, header, target.measure);
      const columnProblems: IntakeProblem[] = unit.ok ? [] : [{ row: null, column: header, message: unit.message }];
      problems.push(...columnProblems);
      measureColumns.push(
        Object.freeze({
          measureId: target.measure.id,
          measureCode: target.measure.code,
          index,
          header,
          headerUnitId: unit.ok ? unit.headerUnitId : null,
          factor: unit.ok ? unit.factor : null,
          problems: Object.freeze(columnProblems),
        }),
      );
    }
  });

  if (!roles.has('plotLabel')) {
    problems.unshift({ row: null, column: null, message: 'The file has no plot label column: the first column of the template is called "plot label".' });
  }
  if (measureColumns.length === 0 && measures.length > 0) {
    const expected = measures.map(templateHeader).join(', ');
    problems.push({ row: null, column: null, message: `No column holds a measure of this round. Expected columns such as: ${expected}.` });
  }
  return Object.freeze({
    plotLabel: roles.get('plotLabel') ?? null,
    block: roles.get('block') ?? null,
    treatment: roles.get('treatment') ?? null,
    notes: roles.get('notes') ?? null,
    missingReason: roles.get('missingReason') ?? null,
    identity: Object.freeze(identity),
    measures: Object.freeze(measureColumns),
    measureNotes: Object.freeze(measureNotes),
    unmapped: Object.freeze(unmapped),
    problems: Object.freeze(problems.map((problem) => Object.freeze(problem))),
    choices: Object.freeze(choices),
  });
}

/** The person's choice for the header, else the trial's remembered one while it still fits, else the automatic match. */
function targetOf(header: string, measures: readonly Measure[], overrides: ColumnOverrides, remembered: ColumnOverrides): Target | string {
  if (Object.hasOwn(overrides, header)) {
    const override = overrides[header];
    return override === null || override === undefined ? null : overrideTarget(header, override, measures);
  }
  if (Object.hasOwn(remembered, header)) {
    const choice = remembered[header];
    if (choice === null) return null;
    const target = choice === undefined ? null : overrideTarget(header, choice, measures);
    if (target !== null && typeof target !== 'string') return target;
  }
  return matchHeader(header, measures);
}
