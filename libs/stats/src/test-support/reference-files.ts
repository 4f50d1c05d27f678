import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** The reference datasets inside the repository (datasets/reference; each file's source in its README.md). */
export const referenceFolder = path.resolve(__dirname, '../../../../datasets/reference');

/** A reference dataset that should be in the repository is not: the check that needs it cannot run. */
export class MissingReferenceDataError extends Error {
  override name = 'MissingReferenceDataError';
}

/**
 * Absolute path of a reference file in datasets/reference. A missing file fails the test that asked
 * for it, naming the file: a reference check never passes, or skips, without its data.
 */
export function referencePath(relative: string): string {
  const file = path.join(referenceFolder, relative);
  if (!existsSync(file)) {
    throw new MissingReferenceDataError(
      `The reference dataset ${path.relative(process.cwd(), file)} is missing, so the check that compares with it cannot run. ` +
        'It belongs in the repository under datasets/reference/ (sources in datasets/reference/README.md).',
    );
  }
  return file;
}

/** Rows of a small quoted CSV file as records of strings (values keep their original text). */
export function readReferenceCsv(relative: string): Record<string, string>[] {
  const [header, ...lines] = readFileSync(referencePath(relative), 'utf8').trim().split(/\r?\n/);
  const unquote = (cell: string): string => cell.trim().replace(/^"(.*)"$/, '$1');
  const names = header!.split(',').map(unquote);
  return lines.map((line) => {
    const cells = line.split(',').map(unquote);
    return Object.fromEntries(names.map((name, i) => [name, cells[i]!]));
  });
}

/** Relative error |actual − expected| / |expected| (absolute when expected is 0). */
export function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
}
