import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { ModelFactor } from '../linear-model';
import { codeFactor } from '../trial-layout';

const NITRO = ['0', '0.2', '0.4', '0.6'];

/**
 * Yates's oats split plot (R's nlme::Oats, 6 blocks × 3 varieties on whole plots × 4 nitrogen rates on sub
 * plots), from datasets/reference/nlme-oats.csv, with the rows R's reference script drops
 * (libs/stats/scripts/reml-core-reference.R drops rows 3, 17, 40, 41 and 66).
 */
export function oatsSplitPlot(dropRows: readonly number[] = [3, 17, 40, 41, 66]): { y: Float64Array; block: ModelFactor; variety: ModelFactor; nitro: ModelFactor } {
  const file = path.resolve(__dirname, '../../../../datasets/reference/nlme-oats.csv');
  const rows = readFileSync(file, 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(',').map((cell) => cell.replace(/"/g, '')))
    .filter((_, i) => !dropRows.includes(i + 1));
  return {
    y: Float64Array.from(rows, (row) => Number(row[3])),
    block: codeFactor('block', rows.map((row) => row[0]!)),
    variety: codeFactor('variety', rows.map((row) => row[1]!)),
    // R's factor(nitro) orders the rates numerically; first appearance would put 0.6 before 0.4 once a plot is dropped.
    nitro: { name: 'nitro', levels: NITRO, codes: Int32Array.from(rows, (row) => NITRO.indexOf(row[2]!)) },
  };
}
