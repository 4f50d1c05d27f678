import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseTrial } from './analyse-trial';
import type { TrialObservation } from './trial-layout';

/** Yates's oats (R's nlme::Oats, datasets/reference/nlme-oats.csv): 6 blocks, Variety on whole plots, nitro on sub plots. */
function oats(drop: readonly number[] = []): TrialObservation[] {
  const file = path.resolve(__dirname, '../../../datasets/reference/nlme-oats.csv');
  return readFileSync(file, 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(',').map((cell) => cell.replace(/"/g, '')))
    .filter((_, i) => !drop.includes(i + 1))
    .map(([block, variety, nitro, value]) => ({ block: block!, factors: { Variety: variety!, nitro: nitro! }, value: Number(value) }));
}

const relative = (actual: number | null | undefined, expected: number) => Math.abs((actual ?? NaN) - expected) / Math.abs(expected);

describe('split plot: Yates’s oats', () => {
  it('classical strata equal R summary(aov(yield ~ Variety*nitro + Error(Block/Variety)))', () => {
    const result = analyseTrial({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats() });
    console.log(JSON.stringify({ anova: result.anova, strata: result.strata, differences: result.differences, model: result.model, slices: result.slices?.length, warnings: result.warnings }, null, 1));
  });
  it('unbalanced', () => {
    const result = analyseTrial({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats([3, 17, 40, 41, 66]) });
    console.log(JSON.stringify({ anova: result.anova, differences: result.differences, model: result.model, vc: result.varianceComponents, warnings: result.warnings, means: result.means.slice(0,2) }, null, 1));
  });
});
