import { readReferenceCsv } from './reference-files';

/** Values of `valueColumn` grouped by `groupColumn`, groups in first-seen order (a missing file throws). */
export function groupedReferenceValues(relative: string, valueColumn: string, groupColumn: string): Map<string, number[]> {
  const rows = readReferenceCsv(relative);
  const groups = new Map<string, number[]>();
  for (const row of rows) groups.set(row[groupColumn], [...(groups.get(row[groupColumn]) ?? []), Number(row[valueColumn])]);
  return groups;
}

/** NIST/SEMATECH gear diameters, 10 batches × 10 (STATISTICS.md F, from scipy's test_morestats.py). */
export const nistGearBatches: readonly (readonly number[])[] = [
  [1.006, 0.996, 0.998, 1.0, 0.992, 0.993, 1.002, 0.999, 0.994, 1.0],
  [0.998, 1.006, 1.0, 1.002, 0.997, 0.998, 0.996, 1.0, 1.006, 0.988],
  [0.991, 0.987, 0.997, 0.999, 0.995, 0.994, 1.0, 0.999, 0.996, 0.996],
  [1.005, 1.002, 0.994, 1.0, 0.995, 0.994, 0.998, 0.996, 1.002, 0.996],
  [0.998, 0.998, 0.982, 0.99, 1.002, 0.984, 0.996, 0.993, 0.98, 0.996],
  [1.009, 1.013, 1.009, 0.997, 0.988, 1.002, 0.995, 0.998, 0.981, 0.996],
  [0.99, 1.004, 0.996, 1.001, 0.998, 1.0, 1.018, 1.01, 0.996, 1.002],
  [0.998, 1.0, 1.006, 1.0, 1.002, 0.996, 0.998, 0.996, 1.002, 1.006],
  [1.002, 0.998, 0.996, 0.995, 0.996, 1.004, 1.004, 0.998, 0.999, 0.991],
  [0.991, 0.995, 0.984, 0.994, 0.997, 0.997, 0.991, 0.998, 1.004, 0.997],
];

/** Montgomery Example 3.1, plasma etch rate at 160, 180, 200, 220 W (STATISTICS.md B.9). */
export const plasmaEtchingGroups: readonly (readonly number[])[] = [
  [575, 542, 530, 539, 570],
  [565, 593, 590, 579, 610],
  [600, 651, 610, 637, 629],
  [725, 700, 715, 685, 710],
];
