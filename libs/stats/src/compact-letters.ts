import { StatsInputError } from './errors';

const alphabet = 'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ';

/** The n-th letter label (0-based): a … z, A … Z, then aa, ab, … (bijective base 52). */
export function letterLabel(index: number): string {
  let label = '';
  let remaining = index + 1;
  while (remaining > 0) {
    remaining -= 1;
    label = alphabet[remaining % alphabet.length] + label;
    remaining = Math.floor(remaining / alphabet.length);
  }
  return label;
}

/** Columns (sets of treatment positions) after inserting every significant pair and absorbing subsets. */
function insertAndAbsorb(count: number, differs: (i: number, j: number) => boolean): Set<number>[] {
  let columns: Set<number>[] = [new Set(Array.from({ length: count }, (_, i) => i))];
  for (let i = 0; i < count; i++) {
    for (let j = i + 1; j < count; j++) {
      if (!differs(i, j)) continue;
      const next: Set<number>[] = [];
      for (const column of columns) {
        if (column.has(i) && column.has(j)) {
          // Insert: split the column into one without i and one without j.
          next.push(new Set([...column].filter((member) => member !== i)));
          next.push(new Set([...column].filter((member) => member !== j)));
        } else {
          next.push(column);
        }
      }
      columns = absorb(next);
    }
  }
  return columns;
}

/** Drops every column that is contained in another (keeping one of equal columns). */
function absorb(columns: Set<number>[]): Set<number>[] {
  const isSubset = (small: Set<number>, large: Set<number>) => [...small].every((member) => large.has(member));
  return columns.filter(
    (column, index) =>
      column.size > 0 &&
      !columns.some(
        (other, otherIndex) =>
          otherIndex !== index && isSubset(column, other) && (other.size > column.size || otherIndex < index),
      ),
  );
}

/** Removes memberships whose every shared pair is also covered by another column (Piepho's sweep). */
function sweep(columns: Set<number>[]): Set<number>[] {
  for (const column of columns) {
    for (const member of [...column]) {
      const others = columns.filter((other) => other !== column && other.has(member));
      if (others.length === 0) continue;
      const covered = [...column].every(
        (partner) => partner === member || others.some((other) => other.has(partner)),
      );
      if (covered) column.delete(member);
    }
  }
  return columns.filter((column) => column.size > 0);
}

/**
 * Compact letter display for a mean separation: treatments that share a letter are
 * not significantly different, and two treatments share a letter exactly when
 * `differ` is false for them, for any pattern of significances.
 *
 * Piepho's insert–absorb algorithm with the sweep for redundant letters (Piepho 2004,
 * J. Comput. Graph. Stat. 13:456–466; free description in the R package multcompView's
 * vignette and https://en.wikipedia.org/wiki/Compact_letter_display). Letters go to the
 * columns in the order of their first treatment, so with treatments sorted by mean,
 * highest first, the highest mean gets "a". After a … z and A … Z come aa, ab, ….
 *
 * @param treatmentsByMeanDescending distinct treatment names, highest mean first.
 * @param differ whether two treatments differ significantly (called once per pair,
 *   earlier treatment first; should be symmetric).
 * @throws StatsInputError (a RangeError) when a treatment name repeats.
 * @example compactLetterDisplay(['trt2', 'ctrl', 'trt1'], (a, b) => a !== 'ctrl' && b !== 'ctrl')
 *   // { trt2: 'a', ctrl: 'ab', trt1: 'b' }
 */
export function compactLetterDisplay(
  treatmentsByMeanDescending: readonly string[],
  differ: (a: string, b: string) => boolean,
): Record<string, string> {
  const treatments = treatmentsByMeanDescending;
  const duplicate = treatments.find((name, index) => treatments.indexOf(name) !== index);
  if (duplicate !== undefined) {
    throw new StatsInputError('duplicate treatment', `compactLetterDisplay: treatment "${duplicate}" appears more than once`);
  }
  const significance = new Map<string, boolean>();
  const differs = (i: number, j: number): boolean => {
    const key = `${i},${j}`;
    if (!significance.has(key)) significance.set(key, differ(treatments[i], treatments[j]));
    return significance.get(key)!;
  };
  const columns = absorb(sweep(insertAndAbsorb(treatments.length, differs)));
  const ordered = columns
    .map((column) => [...column].sort((a, b) => a - b))
    .sort((a, b) => {
      for (let k = 0; k < Math.min(a.length, b.length); k++) if (a[k] !== b[k]) return a[k] - b[k];
      return a.length - b.length;
    });
  const letters: Record<string, string> = {};
  for (const name of treatments) letters[name] = '';
  ordered.forEach((column, index) => {
    for (const member of column) letters[treatments[member]] += letterLabel(index);
  });
  return Object.freeze(letters);
}
