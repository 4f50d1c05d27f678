import { describe, expect, it, vi } from 'vitest';
import { analyseTrial, type TrialAnalysis, type TrialAnalysisRequest } from './analyse-trial';
import { StatsInputError } from './errors';
import type { TrialObservation } from './trial-layout';
import { readReferenceCsv, relativeError } from './test-support/reference-files';

// Tukey p-values call studentizedRangeCdf (~20 ms each), so examples with many pairs need more than 5 s.
vi.setConfig({ testTimeout: 300_000 });

// Every expected value below names its source; "STATISTICS.md X" is datasets/reference/STATISTICS.md
// section X, which records where each number was read or how it was computed (R 4.2.2 calls).
// Tolerances: values printed with d significant digits are checked to half a unit in the last printed digit
// (relative), via `close(actual, expected, digits)`.

function close(actual: number | null | undefined, expected: number, digits = 6): void {
  expect(actual).not.toBeNull();
  expect(actual).toBeDefined();
  expect(relativeError(actual!, expected), `${actual} vs ${expected}`).toBeLessThan(0.5 * 10 ** (1 - digits) * 1.0001);
}

/** Observations from a treatment × block table (rows = treatments, columns = blocks). */
function rcbdObservations(treatments: readonly string[], table: readonly (readonly number[])[]): TrialObservation[] {
  return table.flatMap((row, t) => row.map((value, b) => ({ treatment: treatments[t]!, block: String(b + 1), value })));
}

function row(result: TrialAnalysis, term: string) {
  const found = result.anova.find((r) => r.term === term);
  expect(found, term).toBeDefined();
  return found!;
}

function mean(result: TrialAnalysis, treatment: string): number {
  return result.means.find((m) => m.treatment === treatment)!.mean;
}

function pair(result: TrialAnalysis, method: 'lsd' | 'tukey' | 'dunnett' | 'bonferroni' | 'holm', a: string, b: string) {
  const found = result.comparisons[method]!.pairs.find((p) => p.a === a && p.b === b);
  expect(found, `${method} ${a}−${b}`).toBeDefined();
  return found!;
}

/** Letter invariant (STATISTICS.md H): two treatments share a letter exactly when they do not differ. */
function sharesLetter(letters: Readonly<Record<string, string>>, a: string, b: string): boolean {
  return [...letters[a]!].some((letter) => letters[b]!.includes(letter));
}

function expectLetterGroups(letters: Readonly<Record<string, string>> | undefined, expected: Record<string, string>): void {
  expect(letters).toBeDefined();
  const names = Object.keys(expected);
  for (const a of names) for (const b of names) if (a < b) expect(sharesLetter(letters!, a, b), `${a} ~ ${b}`).toBe(sharesLetter(expected, a, b));
}

describe('analyseTrial: RCBD worked examples', () => {
  // Montgomery hardness tips, STATISTICS.md B.1 (data and ANOVA confirmed in the NDSU SAS listing; the rest R 4.2.2).
  const hardness: TrialAnalysisRequest = {
    design: 'rcbd',
    meanSeparation: ['lsd', 'tukey'],
    observations: rcbdObservations(['1', '2', '3', '4'], [
      [9.3, 9.4, 9.6, 10.0],
      [9.4, 9.3, 9.8, 9.9],
      [9.2, 9.4, 9.5, 9.7],
      [9.7, 9.6, 10.0, 10.2],
    ]),
  };
  it('hardness tips (Montgomery; NDSU listing and R)', () => {
    const result = analyseTrial(hardness);
    close(row(result, 'treatment').ss, 0.385, 12); // SS exact in the listing
    close(row(result, 'block').ss, 0.825, 12);
    close(row(result, 'error').ss, 0.08, 11);
    close(row(result, 'total').ss, 1.29, 12);
    close(row(result, 'treatment').f, 14.4375, 12); // scipy-index Python test asserts 14.4375
    close(row(result, 'treatment').p, 0.0008713, 4); // R: p=0.0008713
    close(row(result, 'block').f, 30.9375, 12); // 0.275/0.0088889 = 30.94 in the listing
    close(result.summary.cv, 0.979542, 6); // NDSU SAS listing C.V.
    expect(result.summary.grandMean).toBeCloseTo(9.625, 12);
    close(mean(result, '4'), 9.875, 12);
    close(result.comparisons.lsd!.leastSignificantDifference, 0.15081, 5); // R 4.2.2: LSD05 0.150810
    close(result.comparisons.tukey!.leastSignificantDifference, 0.20812, 5); // R: HSD05 0.208120
    close(pair(result, 'tukey', '4', '3').p, 0.000606, 3); // R TukeyHSD p adj
    close(pair(result, 'tukey', '2', '1').p, 0.9809, 4);
    close(pair(result, 'tukey', '4', '1').p, 0.006658, 4);
    expectLetterGroups(result.letters.tukey, { '1': 'a', '2': 'a', '3': 'a', '4': 'b' }); // multcomp::cld
  });

  it('vascular graft (Montgomery Example 4.1, 8th ed.; R 4.2.2 in STATISTICS.md B.2)', () => {
    const psi = ['8500', '8700', '8900', '9100'];
    const result = analyseTrial({
      design: 'rcbd',
      control: '8500',
      meanSeparation: ['lsd', 'tukey', 'dunnett', 'holm', 'bonferroni'],
      observations: rcbdObservations(psi, [
        [90.3, 89.2, 98.2, 93.9, 87.4, 97.9],
        [92.5, 89.5, 90.6, 94.7, 87.0, 95.8],
        [85.5, 90.8, 89.6, 86.2, 88.0, 93.4],
        [82.5, 89.5, 85.6, 87.4, 78.9, 90.7],
      ]),
    });
    close(row(result, 'treatment').ss, 178.1712, 7); // Montgomery Table 4.4: 178.17 (from memory); R 178.1712
    close(row(result, 'treatment').f, 8.10708, 6);
    close(row(result, 'treatment').p, 0.0019163, 5);
    close(row(result, 'block').ss, 192.2521, 7);
    close(row(result, 'block').f, 5.24867, 6);
    close(row(result, 'error').ss, 109.8863, 7);
    close(row(result, 'error').ms, 7.32575, 6);
    close(result.summary.grandMean, 89.795833, 8);
    close(result.summary.cv, 3.014185, 7);
    [92.816667, 91.683333, 88.916667, 85.766667].forEach((value, i) => close(mean(result, psi[i]!), value, 8));
    close(result.comparisons.lsd!.leastSignificantDifference, 3.330738, 7);
    close(result.comparisons.tukey!.leastSignificantDifference, 4.503828, 7);
    const tukey: [string, string, number, number, number, number][] = [
      ['8700', '8500', -1.133333, -5.637161, 3.370495, 0.8854831],
      ['8900', '8500', -3.9, -8.403828, 0.603828, 0.1013084],
      ['9100', '8500', -7.05, -11.553828, -2.546172, 0.0020883],
      ['8900', '8700', -2.766667, -7.270495, 1.737161, 0.3245644],
      ['9100', '8700', -5.916667, -10.420495, -1.412839, 0.0086667],
      ['9100', '8900', -3.15, -7.653828, 1.353828, 0.2257674],
    ];
    for (const [a, b, diff, lower, upper, p] of tukey) {
      const found = pair(result, 'tukey', a, b);
      close(found.diff, diff, 6);
      close(found.lower, lower, 6);
      close(found.upper, upper, 6);
      close(found.p, p, 5);
    }
    const unadjusted = [0.47946, 0.024713, 0.00041369, 0.096962, 0.0017929, 0.0621];
    const holm = [0.47946, 0.098851, 0.0024821, 0.19392, 0.0089643, 0.1863];
    const bonferroni = [1, 0.14828, 0.0024821, 0.58177, 0.010757, 0.3726];
    tukey.forEach(([a, b], i) => {
      close(pair(result, 'lsd', a, b).p, unadjusted[i]!, 4);
      close(pair(result, 'holm', a, b).p, holm[i]!, 4);
      close(pair(result, 'bonferroni', a, b).p, bonferroni[i]!, 4);
    });
    close(result.comparisons.dunnett!.critical, 2.6099485, 4); // R mvtnorm quantile; our integration to 1e-4
    [
      ['8700', -0.72526, 0.8109],
      ['8900', -2.49574, 0.0621],
      ['9100', -4.51153, 0.00101],
    ].forEach(([a, t, p]) => {
      const found = pair(result, 'dunnett', a as string, '8500');
      close(found.diff / found.se, t as number, 5);
      expect(Math.abs(found.p - (p as number))).toBeLessThan(0.002); // glht p printed to 3-4 digits
    });
    expectLetterGroups(result.letters.tukey, { '8500': 'a', '8700': 'a', '8900': 'ab', '9100': 'b' });
    expectLetterGroups(result.letters.lsd, { '8500': 'a', '8700': 'ab', '8900': 'bc', '9100': 'c' });
    expect(result.letters).not.toHaveProperty('dunnett');
  });

  const montgomery43 = rcbdObservations(['1', '2', '3', '4'], [
    [73, 68, 74, 71, 67],
    [73, 67, 75, 72, 70],
    [75, 68, 78, 73, 68],
    [73, 71, 75, 75, 69],
  ]);
  it('Montgomery Problem 4.3 (scribd solutions manual F = 2.38; R 4.2.2): LSD refused unless forced', () => {
    const refused = analyseTrial({ design: 'rcbd', meanSeparation: ['lsd', 'tukey'], observations: montgomery43 });
    close(row(refused, 'treatment').ss, 12.95, 10);
    close(row(refused, 'treatment').f, 2.37615, 6);
    close(row(refused, 'treatment').p, 0.12114, 5); // Python test in the index: p = 0.1211
    close(row(refused, 'block').ss, 157, 10);
    close(row(refused, 'error').ss, 21.8, 10);
    close(refused.summary.cv, 1.8785, 5);
    expect(refused.comparisons.lsd).toBeUndefined();
    expect(refused.warnings.some((w) => w.includes("Fisher's LSD was not computed"))).toBe(true);
    expect(refused.warnings.some((w) => w.includes('letters are shown for reference only'))).toBe(true);
    close(refused.comparisons.tukey!.leastSignificantDifference, 2.530832, 6);
    expectLetterGroups(refused.letters.tukey, { '1': 'a', '2': 'a', '3': 'a', '4': 'a' });
    const forced = analyseTrial({ design: 'rcbd', meanSeparation: ['lsd'], forceLsd: true, observations: montgomery43 });
    close(forced.comparisons.lsd!.leastSignificantDifference, 1.857323, 6);
  });

  it('fabric strength (Montgomery & Runger Example 13-5; issuhub Table 13-12 and R 4.2.2)', () => {
    const result = analyseTrial({
      design: 'rcbd',
      meanSeparation: ['lsd', 'tukey'],
      observations: rcbdObservations(['1', '2', '3', '4'], [
        [1.3, 1.6, 0.5, 1.2, 1.1],
        [2.2, 2.4, 0.4, 2.0, 1.8],
        [1.8, 1.7, 0.6, 1.5, 1.3],
        [3.9, 4.4, 2.0, 4.1, 3.4],
      ]),
    });
    close(row(result, 'treatment').ss, 18.044, 10); // published 18.04
    close(row(result, 'total').ss, 25.688, 10); // published SS_T 25.69
    close(row(result, 'block').ss, 6.693, 10);
    close(row(result, 'treatment').f, 75.89485, 6);
    [1.14, 1.76, 1.38, 3.56].forEach((value, i) => close(mean(result, String(i + 1)), value, 10));
    close(result.comparisons.lsd!.leastSignificantDifference, 0.387927, 6);
    close(result.comparisons.tukey!.leastSignificantDifference, 0.528598, 6);
    expectLetterGroups(result.letters.tukey, { '1': 'a', '2': 'b', '3': 'ab', '4': 'c' });
  });

  const seedRate = readReferenceCsv('data/agridat_gomez.seedrate.csv');
  it('Gomez & Gomez seed rate (Table 2.6 from memory; R 4.2.2 in STATISTICS.md B.5)', () => {
    const result = analyseTrial({
      design: 'rcbd',
      control: '25',
      meanSeparation: ['lsd', 'tukey', 'dunnett'],
      forceLsd: true,
      observations: seedRate!.map((r) => ({ treatment: r.rate!, block: r.rep!, value: r.yield! })),
    });
    close(row(result, 'block').ss, 1944361, 7);
    close(row(result, 'block').f, 5.86224, 6);
    close(row(result, 'treatment').ss, 1198331, 7);
    close(row(result, 'treatment').f, 2.16778, 6);
    close(row(result, 'treatment').p, 0.1128094, 6);
    close(row(result, 'error').ms, 110558.41, 8);
    close(result.summary.cv, 6.704258, 7); // Gomez: cv = 6.7%
    close(result.comparisons.lsd!.leastSignificantDifference, 501.1364, 7);
    close(result.comparisons.tukey!.leastSignificantDifference, 763.8821, 6);
    for (const p of result.comparisons.dunnett!.pairs) expect(p.p).toBeGreaterThan(0.29);
    close(result.diagnostics.shapiroWilk!.w, 0.96233827, 6); // R shapiro.test on aov residuals
    close(result.diagnostics.shapiroWilk!.p, 0.4871759, 5);
    expectLetterGroups(result.letters.lsd, { '25': 'ab', '50': 'ab', '75': 'a', '100': 'ab', '125': 'b', '150': 'b' });
    expectLetterGroups(result.letters.tukey, { '25': 'a', '50': 'a', '75': 'a', '100': 'a', '125': 'a', '150': 'a' });
  });

  const clewer = readReferenceCsv('data/agridat_clewer.wheat.csv');
  it('Clewer & Scarisbrick wheat (agridat Rd "matches book"; R 4.2.2)', () => {
    const observations = clewer!.map((r) => ({ treatment: r.gen!, block: r.block!, value: r.yield! }));
    const result = analyseTrial({ design: 'rcbd', meanSeparation: ['lsd', 'tukey'], observations });
    close(row(result, 'block').ss, 9.78, 3); // book: Block SS=9.78
    close(row(result, 'treatment').ss, 6.63, 3); // Variety SS=6.63
    close(row(result, 'error').ss, 2.4, 3); // Error SS=2.40, MSE=0.40
    close(row(result, 'treatment').f, 5.525, 4);
    close(row(result, 'treatment').p, 0.0367303, 5);
    close(row(result, 'block').f, 12.225, 5);
    close(result.summary.cv, 8.723525, 6);
    close(result.comparisons.lsd!.leastSignificantDifference, 1.26358, 6);
    close(result.comparisons.tukey!.leastSignificantDifference, 1.78762, 6);
    expectLetterGroups(result.letters.tukey, { V1: 'a', V2: 'ab', V3: 'ab', V4: 'b' });
    const crd = analyseTrial({ design: 'crd', observations: observations.map(({ treatment, value }) => ({ treatment, value })) });
    close(row(crd, 'treatment').f, 1.4517, 4); // "VR=1.45" ignoring blocks
    close(row(crd, 'error').ms, 1.5225, 5);
  });

  const beets = readReferenceCsv('data/agridat_cochran.beets.csv');
  it('Snedecor sugar beets (Statistical Methods 4th ed. Table 12.13 data; R 4.2.2)', () => {
    const result = analyseTrial({
      design: 'rcbd',
      control: 'None',
      meanSeparation: ['lsd', 'tukey', 'holm', 'bonferroni', 'dunnett'],
      observations: beets!.map((r) => ({ treatment: r.fert!, block: r.block!, value: r.yield! })),
    });
    close(row(result, 'block').ss, 6.31334, 6);
    close(row(result, 'treatment').ss, 112.85615, 8);
    close(row(result, 'treatment').f, 24.28823, 7);
    close(row(result, 'error').ms, 0.7744227, 7);
    close(result.summary.cv, 16.64664, 7);
    close(result.comparisons.lsd!.leastSignificantDifference, 1.037629, 7);
    close(result.comparisons.tukey!.leastSignificantDifference, 1.603817, 7);
    const tukeyGroups = { None: 'a', P: 'b', K: 'a', PK: 'bc', PN: 'bc', KN: 'a', PKN: 'c' };
    expectLetterGroups(result.letters.tukey, tukeyGroups);
    expectLetterGroups(result.letters.lsd, { None: 'a', P: 'b', K: 'a', PK: 'bc', PN: 'c', KN: 'a', PKN: 'c' });
    expectLetterGroups(result.letters.holm, tukeyGroups);
    expectLetterGroups(result.letters.bonferroni, tukeyGroups);
    const dunnettT: Record<string, number> = { P: 4.48096, K: 0.41332, PK: 6.16706, PN: 7.33487, KN: 0.36412, PKN: 7.87284 };
    for (const [a, t] of Object.entries(dunnettT)) {
      const found = pair(result, 'dunnett', a, 'None');
      close(found.diff / found.se, t, 5);
    }
  });

  const gomez728 = readReferenceCsv('data/agridat_gomez.heteroskedastic.csv');
  it('Gomez & Gomez Table 7.28, 35 genotypes × 3 reps (agridat Rd "Match Gomez table 7.28")', () => {
    // STATISTICS.md B.8: the table is reproduced after setting G17/R2 to 7.58 (as on Gomez p. 311); the file has 5.58.
    const fixed = gomez728!.map((r) => (r.gen === 'G17' && r.rep === 'R2' ? { ...r, yield: '7.58' } : r));
    const result = analyseTrial({ design: 'rcbd', observations: fixed.map((r) => ({ treatment: r.gen!, block: r.rep!, value: r.yield! })) });
    close(row(result, 'block').ss, 3.306079, 7); // R 4.2.2; table 3.306
    close(row(result, 'block').f, 5.6164, 5);
    close(row(result, 'treatment').ss, 40.01987, 7);
    close(row(result, 'treatment').f, 3.9992, 5);
    close(row(result, 'error').ss, 20.014058, 8);
    close(row(result, 'error').ms, 0.29432, 5);
  });
});

describe('analyseTrial: one-way examples', () => {
  it('plasma etching (Montgomery Example 3.1; transtutors F0 = 66.80; R 4.2.2 in STATISTICS.md B.9)', () => {
    const groups: Record<string, number[]> = {
      '160': [575, 542, 530, 539, 570],
      '180': [565, 593, 590, 579, 610],
      '200': [600, 651, 610, 637, 629],
      '220': [725, 700, 715, 685, 710],
    };
    const result = analyseTrial({
      design: 'crd',
      control: '160',
      meanSeparation: ['lsd', 'tukey', 'dunnett'],
      observations: Object.entries(groups).flatMap(([treatment, values]) => values.map((value) => ({ treatment, value }))),
    });
    close(row(result, 'treatment').ss, 66870.55, 7);
    close(row(result, 'treatment').f, 66.79707, 7);
    close(row(result, 'error').ms, 333.7, 8);
    close(result.comparisons.lsd!.leastSignificantDifference, 24.49202, 7); // Montgomery 24.49
    close(result.comparisons.tukey!.leastSignificantDifference, 33.05438, 6); // exact q (Montgomery's table q gives 33.09)
    // d0.05(3,16): Montgomery 2.59 (from memory). STATISTICS.md's 2.593670 (qmvt at default precision) is off in
    // the 4th digit: R 4.2.2 mvtnorm::pmvt(lower = -c, upper = c, df = 16, corr = 0.5 off-diagonal, abseps = 1e-7)
    // gives 0.9500000021 at c = 2.5923207 and 0.9501311 at c = 2.59367.
    close(result.comparisons.dunnett!.critical, 2.5923207, 7);
    close(pair(result, 'dunnett', '180', '160').diff / pair(result, 'dunnett', '180', '160').se, 3.13329, 6);
    expect(Math.abs(pair(result, 'dunnett', '180', '160').p - 0.0168)).toBeLessThan(0.002);
    close(pair(result, 'tukey', '180', '160').p, 0.029428, 4);
    close(pair(result, 'tukey', '200', '180').p, 0.021599, 4);
    close(pair(result, 'tukey', '220', '200').p, 1.46e-5, 2);
    close(result.diagnostics.brownForsythe!.f, 0.19587, 5); // Levene median (BF) on the groups = on residuals
  });

  const plantGrowth = readReferenceCsv('data/PlantGrowth.csv');
  it("PlantGrowth (R datasets-Ex.Rout.save anova; TukeyHSD printed output; R 4.2.2)", () => {
    const result = analyseTrial({
      design: 'crd',
      control: 'ctrl',
      meanSeparation: ['lsd', 'tukey', 'dunnett', 'bonferroni', 'holm'],
      observations: plantGrowth!.map((r) => ({ treatment: r.group!, value: r.weight! })),
    });
    close(row(result, 'treatment').ss, 3.76634, 6);
    close(row(result, 'treatment').f, 4.84609, 6);
    close(row(result, 'treatment').p, 0.01591, 4);
    close(row(result, 'error').ss, 10.49209, 7);
    close(result.summary.cv, 12.28809, 7);
    close(result.comparisons.lsd!.leastSignificantDifference, 0.5720126, 7);
    close(result.comparisons.tukey!.leastSignificantDifference, 0.69121605141, 10); // computed to 12 digits
    close(pair(result, 'tukey', 'trt1', 'ctrl').p, 0.390871144202, 9);
    close(pair(result, 'tukey', 'trt2', 'ctrl').p, 0.1979959913, 9);
    close(pair(result, 'tukey', 'trt2', 'trt1').p, 0.012006423979, 9);
    close(pair(result, 'tukey', 'trt2', 'trt1').lower, 0.1737839, 7);
    close(pair(result, 'lsd', 'trt1', 'ctrl').p, 0.1943879, 7);
    close(pair(result, 'bonferroni', 'trt2', 'trt1').p, 0.013378, 5);
    close(pair(result, 'holm', 'trt2', 'ctrl').p, 0.175363, 6);
    close(pair(result, 'holm', 'trt1', 'ctrl').p, 0.194388, 6);
    close(result.comparisons.dunnett!.critical, 2.3335384, 4);
    expect(Math.abs(pair(result, 'dunnett', 'trt1', 'ctrl').p - 0.3227)).toBeLessThan(0.002);
    expect(Math.abs(pair(result, 'dunnett', 'trt2', 'ctrl').p - 0.15349)).toBeLessThan(0.002);
    close(pair(result, 'dunnett', 'trt2', 'ctrl').lower, -0.1565476, 4);
    expectLetterGroups(result.letters.tukey, { ctrl: 'ab', trt1: 'a', trt2: 'b' });
    close(result.diagnostics.shapiroWilk!.w, 0.96606812, 7); // shapiro.test on aov residuals
    close(result.diagnostics.shapiroWilk!.p, 0.4378986, 6);
    close(result.diagnostics.brownForsythe!.f, 1.11919, 5);
    close(result.diagnostics.brownForsythe!.p, 0.34123, 4);
  });
});

describe('analyseTrial: factorial in blocks', () => {
  const turnip = readReferenceCsv('data/agridat_mead.turnip.csv');
  it('Mead turnips, density × spacing in 3 blocks (Example 12.3; R 4.2.2 aov in STATISTICS.md B.10)', () => {
    const result = analyseTrial({
      design: 'factorial-rcbd',
      factorNames: ['density', 'spacing'],
      observations: turnip!.map((r) => ({ factors: { density: r.density!, spacing: r.spacing! }, block: r.block!, value: r.yield! })),
    });
    expect(result.anova.map((r) => r.term)).toEqual(['block', 'density', 'spacing', 'density:spacing', 'error', 'total']);
    const expected: [string, number, number, number][] = [
      ['block', 2, 3.416813, 43.61733],
      ['density', 4, 25.64761, 163.70228],
      ['spacing', 3, 0.916658, 7.80107],
      ['density:spacing', 12, 0.99755, 2.12237],
    ];
    for (const [term, df, ss, f] of expected) {
      expect(row(result, term).df).toBe(df);
      close(row(result, term).ss, ss, 6);
      close(row(result, term).f, f, 6);
    }
    close(row(result, 'spacing').p, 0.000353, 3);
    close(row(result, 'density:spacing').p, 0.03891, 4);
    close(row(result, 'error').ss, 1.488387, 7);
    close(result.summary.cv, 9.347835, 7);
    expect(result.means).toHaveLength(20);
    expect(result.means[0]!.treatment).toBe('0.5 × 4');
    const density = result.factorMeans!.density!;
    [0.91, 1.9575, 2.4275, 2.654167, 2.636667].forEach((value, i) => close(density[i]!.mean, value, 6));
    const spacing = result.factorMeans!.spacing!;
    [2.098667, 2.276667, 2.159333, 1.934].forEach((value, i) => close(spacing[i]!.mean, value, 6));
  });
});

describe('analyseTrial: combined analysis over sites', () => {
  const wetDry = readReferenceCsv('data/agridat_gomez.wetdry.csv');
  const observations = wetDry?.map((r) => ({ treatment: r.nitrogen!, block: r.rep!, site: r.season!, value: r.yield! })) ?? [];
  it('Gomez & Gomez wet/dry seasons, random seasons (R 4.2.2 in STATISTICS.md B.11)', () => {
    const result = analyseTrial({ design: 'multisite-rcbd', meanSeparation: ['tukey'], observations });
    expect(result.anova.map((r) => r.term)).toEqual(['site', 'block:site', 'treatment', 'site:treatment', 'error', 'total']);
    close(row(result, 'site').ss, 4.497715, 7);
    close(row(result, 'block:site').ss, 1.261367, 7);
    close(row(result, 'treatment').ss, 18.750185, 8);
    close(row(result, 'site:treatment').ss, 9.657215, 7);
    close(row(result, 'error').ss, 7.064122, 7);
    close(row(result, 'site').f, 14.262981, 8); // season against reps within season
    close(row(result, 'site').p, 0.019492, 5);
    close(row(result, 'treatment').f, 1.941573, 7); // N against season × N
    close(row(result, 'treatment').p, 0.26813, 5);
    close(row(result, 'site:treatment').f, 5.46832, 6);
    close(row(result, 'site:treatment').p, 0.0057024, 5);
    close(result.summary.cv, 12.04809, 7);
    // Random seasons: SE of a treatment mean √(MS site:treatment / (sites · reps)) = √(2.4143037/6).
    close(result.means[0]!.se, Math.sqrt(2.4143037 / 6), 7);
    // Bartlett on the per-season error MS 0.56533125 and 0.31768398 (8 df each): K² 0.616821272649,
    // p 0.432230979447 (R 4.2.2: Bartlett's formula applied to deviance/df.residual of each season's lm(yield ~ rep + nitrogen)).
    close(result.diagnostics.bartlett!.statistic, 0.616821272649, 9);
    close(result.diagnostics.bartlett!.p, 0.432230979447, 9);
    expect(result.warnings.some((w) => w.includes('Error variances differ'))).toBe(false);
  });

  it('Gomez & Gomez wet/dry seasons, fixed seasons (R 4.2.2 in STATISTICS.md B.11)', () => {
    const result = analyseTrial({ design: 'multisite-rcbd', sitesAre: 'fixed', observations });
    close(row(result, 'treatment').f, 10.61714, 7);
    close(row(result, 'treatment').p, 0.00021418, 5);
    close(row(result, 'site').f, 10.18717, 7); // R anova(): season vs pooled error, 10.18717
    close(result.means[0]!.se, Math.sqrt(0.4415076 / 6), 7);
  });

  it('blocks are nested in sites: block "1" at one site is not block "1" at another', () => {
    const nested = analyseTrial({ design: 'multisite-rcbd', sitesAre: 'fixed', observations });
    const relabelled = analyseTrial({
      design: 'multisite-rcbd',
      sitesAre: 'fixed',
      observations: observations.map((o) => ({ ...o, block: `${o.site}-${o.block}` })),
    });
    expect(row(nested, 'block:site').df).toBe(4);
    close(row(nested, 'block:site').ss, row(relabelled, 'block:site').ss, 12);
  });
});

describe('analyseTrial: input checks and warnings', () => {
  const base: TrialObservation[] = rcbdObservations(['a', 'b', 'c'], [
    [1, 2, 3],
    [2, 3, 5],
    [4, 4, 6],
  ]);
  it('throws StatsInputError (a RangeError) with a clear message', () => {
    const bad = (request: Partial<TrialAnalysisRequest>, pattern: RegExp) => {
      const call = () => analyseTrial({ design: 'rcbd', observations: base, ...request } as TrialAnalysisRequest);
      expect(call).toThrow(StatsInputError);
      expect(call).toThrow(RangeError);
      expect(call).toThrow(pattern);
    };
    bad({ observations: base.filter((o) => o.treatment === 'a') }, /too few treatments/);
    bad({ observations: base.map((o, i) => (i === 4 ? { ...o, value: 'n/a' } : o)) }, /non-finite value: observation 4/);
    bad({ observations: base.map((o, i) => (i === 2 ? { ...o, value: Number.POSITIVE_INFINITY } : o)) }, /observation 2/);
    bad({ observations: base.map(({ block: _block, ...o }) => o) }, /missing block/);
    bad({ design: 'multisite-rcbd' }, /missing site/);
    bad({ control: 'z', meanSeparation: ['dunnett'] }, /control "z" is not among the treatments/);
    bad({ observations: [...base, { treatment: 'a', block: '9', value: 1 }] }, /block with a single plot: block 9/);
    bad({ design: 'crd', observations: [{ treatment: 'a', value: 1 }, { treatment: 'b', value: 2 }] }, /no residual degrees of freedom/);
    bad({ design: 'factorial-rcbd', factorNames: ['x', 'y'], observations: [
      { factors: { x: '1', y: '1' }, block: '1', value: 1 },
      { factors: { x: '1', y: '2' }, block: '1', value: 2 },
      { factors: { x: '2', y: '1' }, block: '1', value: 3 },
    ] }, /treatment with no data: treatment 2 × 2/);
    bad({ alpha: 1.5 }, /alpha/);
  });

  it('warns about small error df, unreplicated treatments and back-transformed means', () => {
    const crd = analyseTrial({
      design: 'crd',
      transform: 'log',
      observations: [
        { treatment: 'a', value: 1 },
        { treatment: 'a', value: 2 },
        { treatment: 'b', value: 4 },
        { treatment: 'b', value: 9 },
        { treatment: 'c', value: 30 },
      ],
    });
    expect(crd.warnings.some((w) => w.includes('only 2 degrees of freedom'))).toBe(true);
    expect(crd.warnings.some((w) => w.includes('Treatment c has fewer than two plots'))).toBe(true);
    expect(crd.means[0]!.backTransformedMean).toBeDefined();
    expect(crd.warnings.length).toBeGreaterThanOrEqual(3);
    expect(Object.isFrozen(crd)).toBe(true);
  });

  it('still answers when the residuals are all zero (diagnostics become null with a warning)', () => {
    const observations = rcbdObservations(['a', 'b', 'c'], [
      [1, 2, 3],
      [2, 3, 4],
      [5, 6, 7],
    ]);
    const result = analyseTrial({ design: 'rcbd', observations });
    expect(result.summary.errorDf).toBe(4);
    expect(row(result, 'error').ss).toBeLessThan(1e-20);
    expect(result.means.map((m) => m.mean)).toEqual([2, 3, 6]);
  });

  it('flags residuals whose standardized value exceeds 3', () => {
    const observations = Array.from({ length: 40 }, (_, i) => ({ treatment: i % 2 ? 'a' : 'b', value: (i % 5) * 0.1 + (i === 7 ? 20 : 0) }));
    const result = analyseTrial({ design: 'crd', observations });
    const flagged = result.diagnostics.residuals.filter((r) => r.flagged).map((r) => r.index);
    expect(flagged).toEqual([7]);
  });
});
