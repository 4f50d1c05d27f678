import { readFileSync } from 'node:fs';
import path from 'node:path';

/** Absolute path of a file in the repository's datasets/reference folder (committed with its source). */
export function projectDatasetPath(name: string): string {
  return path.resolve(__dirname, '../../../../datasets/reference', name);
}

/** Rows of a small unquoted CSV file in datasets/reference as records of strings. */
export function readProjectCsv(name: string): Record<string, string>[] {
  const [header, ...lines] = readFileSync(projectDatasetPath(name), 'utf8').trim().split(/\r?\n/);
  const names = header!.split(',');
  return lines.map((line) => {
    const cells = line.split(',');
    return Object.fromEntries(names.map((n, i) => [n, cells[i]!]));
  });
}
