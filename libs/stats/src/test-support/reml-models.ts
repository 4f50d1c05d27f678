import type { CovarianceStructure } from '../reml/covariance-structure';
import { denseRemlProblem } from '../reml/dense-reml-problem';
import { randomInterceptRemlProblem } from '../reml/random-intercept-reml-problem';
import type { RemlProblem } from '../reml/reml-problem';
import { varianceComponentsStructure } from '../reml/variance-components';
import { sumToZeroDesign, type SumToZeroDesign } from '../sum-to-zero-design';
import { codeFactor } from '../trial-layout';
import { oatsSplitPlot } from './oats-split-plot';

/** lmer(yield ~ Variety*nitro + (1|Block) + (1|Block:Variety)) on the oats with five plots missing, sum-to-zero coding. */
export function oatsModel(): { y: Float64Array; groupOf: Int32Array; structure: CovarianceStructure; coding: SumToZeroDesign } {
  const oats = oatsSplitPlot();
  const coding = sumToZeroDesign([oats.variety, oats.nitro], [
    { name: 'variety', factors: [0] },
    { name: 'nitro', factors: [1] },
    { name: 'variety:nitro', factors: [0, 1] },
  ]);
  const wholePlot = Int32Array.from(oats.block.codes, (b, i) => b * 3 + oats.variety.codes[i]!);
  const structure = varianceComponentsStructure(
    [
      { name: 'block', codes: oats.block.codes },
      { name: 'block:variety', codes: wholePlot },
    ],
    oats.block.codes,
  );
  return { y: oats.y, groupOf: oats.block.codes, structure, coding };
}

export function oatsProblem(): { problem: RemlProblem; coding: SumToZeroDesign } {
  const { y, groupOf, structure, coding } = oatsModel();
  return { problem: denseRemlProblem({ y, design: coding.design, groupOf, structure }), coding };
}

/** A small RCBD as in libs/stats/scripts/reml-core-reference.R: values by block then treatment, some plots dropped (1-based). */
export function smallRcbd(values: readonly number[], treatments: number, drop: readonly number[], kind: 'dense' | 'random-intercept'): { problem: RemlProblem; coding: SumToZeroDesign } {
  const kept = values.map((value, i) => ({ value, i })).filter((entry) => !drop.includes(entry.i + 1));
  const block = codeFactor('block', kept.map((entry) => String(Math.floor(entry.i / treatments) + 1)));
  const treatment = codeFactor('treatment', kept.map((entry) => String.fromCharCode(65 + (entry.i % treatments))));
  const coding = sumToZeroDesign([treatment], [{ name: 'treatment', factors: [0] }]);
  const y = Float64Array.from(kept, (entry) => entry.value);
  const problem =
    kind === 'dense'
      ? denseRemlProblem({ y, design: coding.design, groupOf: block.codes, structure: varianceComponentsStructure([{ name: 'block', codes: block.codes }], block.codes) })
      : randomInterceptRemlProblem({ y, design: coding.design, groupOf: block.codes, groupName: 'block' });
  return { problem, coding };
}

export const RCBD_VALUES = [12.1, 14.3, 13.0, 15.8, 11.2, 13.9, 12.4, 15.1, 13.5, 15.2, 14.1, 16.9, 12.0, 13.1, 12.2, 15.5];
export const BOUNDARY_VALUES = [10.2, 11.9, 12.8, 11.1, 11.0, 13.3, 9.8, 12.6, 12.1, 10.9, 11.4, 13.0];

/** One expected row of a type III table from R, with its tolerances. */
export interface ExpectedTermTest {
  readonly term: number;
  readonly numDf: number;
  readonly denDf: number;
  readonly f: number;
  readonly p: number;
}

/** Runs `test` on the type III hypothesis of each expected term and compares df, F and p. */
export function expectTermTests(
  coding: SumToZeroDesign,
  test: (values: Float64Array, rows: number) => { f: number; numDf: number; denDf: number; p: number },
  expected: readonly ExpectedTermTest[],
  tolerance: { denDf: number; f: number; p: number },
  check: (actual: number, expectedValue: number, relative: number, absolute?: boolean) => void,
): void {
  for (const row of expected) {
    const hypothesis = coding.typeThreeHypothesis(row.term);
    const result = test(hypothesis.values, hypothesis.rows);
    check(result.numDf, row.numDf, 0);
    check(result.denDf, row.denDf, tolerance.denDf);
    check(result.f, row.f, tolerance.f);
    check(result.p, row.p, tolerance.p, true);
  }
}
