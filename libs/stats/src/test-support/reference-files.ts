import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** The shared reference folder beside the checkout (see STATISTICS.md "How to use these files"). */
export const referenceFolder = path.resolve(__dirname, '../../../../../shared/reference');

/** Absolute path of a reference file, or null (with a console note) when the folder is absent. */
export function referencePath(relative: string): string | null {
  const file = path.join(referenceFolder, relative);
  if (existsSync(file)) return file;
  console.warn(`reference file ${file} is absent; its checks are skipped`);
  return null;
}

/** Rows of a small quoted CSV file as records of strings (values keep their original text). */
export function readReferenceCsv(relative: string): Record<string, string>[] | null {
  const file = referencePath(relative);
  if (!file) return null;
  const [header, ...lines] = readFileSync(file, 'utf8').trim().split(/\r?\n/);
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
