import type { Measure } from '@friable/contracts';
import { findUnit, parseUnitFromHeader } from '@friable/field';
import type { ColumnChoice } from '../api/submit-intake';

export const columnRoleLabels: Record<string, string> = {
  plotLabel: 'Plot label',
  block: 'Block',
  treatment: 'Treatment code',
  notes: 'Notes',
  missingReason: 'Missing reason',
};

// The same spellings the server matches; the server stays the judge of the mapping.
const roleSpellings: Record<string, readonly string[]> = {
  plotLabel: ['plot label', 'plot', 'label', 'plot id'],
  block: ['block', 'rep', 'replicate'],
  treatment: ['treatment code', 'treatment', 'trt'],
  notes: ['notes', 'note', 'comments', 'comment', 'remarks'],
  missingReason: ['missing reason', 'reason', 'reason missing', 'why missing'],
};

const normalise = (text: string) => text.trim().toLowerCase().replace(/[\s_-]+/g, ' ');

function measureNamed(measures: readonly Measure[], key: string): Measure | undefined {
  return measures.find((measure) => normalise(measure.name) === key || normalise(measure.code) === key);
}

/** The choice for a column of one measure's own notes, as the server names it: "notes:DRAIN". */
export const measureNoteChoice = (code: string) => `notes:${code}`;

/** "drain time note", "DRAIN notes", "drain time (s) comments": the measure whose own notes the header holds. */
function notesOfHeader(key: string, measures: readonly Measure[]): Measure | undefined {
  const named = /^(.+?)\s*(?:notes?|comments?|remarks?)$/.exec(key)?.[1];
  return named === undefined ? undefined : (measureNamed(measures, named) ?? measureNamed(measures, normalise(parseUnitFromHeader(named).name)));
}

/** A measure's column heading in words: "drain time (s)". */
export function measureHeading(measure: Pick<Measure, 'name' | 'unit'>): string {
  return `${measure.name} (${findUnit(measure.unit)?.symbol ?? measure.unit})`;
}

/**
 * Guess columns — what each header of a file most likely holds: the plot label, block, treatment,
 * notes, missing reason, a measure of the round (by name or code, a unit in brackets allowed), the
 * notes of one measure ("drain time note"), or nothing; a header the trial's uploads were told before (`remembered`) keeps that choice. The preview shows the guess; the person may change it, and only changes are sent.
 * Throws nothing. Example: `guessColumns(['plot label', 'DRAIN (min)'], [drain])` → `['plotLabel', 'DRAIN']`.
 */
export function guessColumns(headers: readonly string[], measures: readonly Measure[], remembered: Readonly<Record<string, string | null>> = {}): ColumnChoice[] {
  const taken = new Set<string>();
  return headers.map((header) => {
    const key = normalise(header);
    if (key === '') return null;
    // What the trial's earlier uploads chose for this very header comes first (the server reads it the same way).
    if (Object.hasOwn(remembered, header.trim())) {
      const choice = remembered[header.trim()] ?? null;
      const known = choice === null || choice in columnRoleLabels || measures.some((measure) => measure.code === choice || measureNoteChoice(measure.code) === choice);
      if (known && (choice === null || !taken.has(choice))) {
        if (choice !== null) taken.add(choice);
        return choice;
      }
    }
    const role = Object.keys(roleSpellings).find((candidate) => roleSpellings[candidate]!.includes(key));
    const measure = role ? undefined : (measureNamed(measures, key) ?? measureNamed(measures, normalise(parseUnitFromHeader(header).name)));
    const noted = role || measure ? undefined : notesOfHeader(key, measures);
    const choice = role ?? measure?.code ?? (noted ? measureNoteChoice(noted.code) : null);
    // A second column claiming the same thing is left for the person (the server would refuse both).
    if (choice === null || taken.has(choice)) return null;
    taken.add(choice);
    return choice;
  });
}

/** The person's changes to the guess, by header, as the server's `mapping` field wants them. */
export function mappingOverrides(headers: readonly string[], guessed: readonly ColumnChoice[], chosen: readonly ColumnChoice[]): Record<string, ColumnChoice> {
  const overrides: Record<string, ColumnChoice> = {};
  headers.forEach((header, index) => {
    if (header !== '' && chosen[index] !== guessed[index]) overrides[header] = chosen[index] ?? null;
  });
  return overrides;
}
