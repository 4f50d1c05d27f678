import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseTrial, type TrialAnalysis } from './analyse-trial';
import type { TrialObservation } from './trial-layout';

const reference = (file: string) => path.resolve(__dirname, '../../../datasets/reference', file);

function csv(file: string): string[][] {
  return readFileSync(reference(file), 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(',').map((cell) => cell.replace(/"/g, '')));
}

/** Yates's oats (R's nlme::Oats, datasets/reference/nlme-oats.csv): 6 blocks, Variety on whole plots, nitro on sub plots. */
function oats(drop: readonly number[] = []): TrialObservation[] {
  return csv('nlme-oats.csv')
    .filter((_, i) => !drop.includes(i + 1))
    .map(([block, variety, nitro, value]) => ({ block: block!, factors: { Variety: variety!, nitro: nitro! }, value: Number(value) }));
}

/** Gomez & Gomez (1984) 2nd ed. p. 143, rice split-split plot (agridat gomez.splitsplit): nitrogen ⊃ management ⊃ variety, 3 reps. */
function gomezSplitSplit(): TrialObservation[] {
  return csv('data/agridat_gomez.splitsplit.csv').map(([rep, nitro, management, gen, value]) => ({ block: rep!, factors: { nf: nitro!, management: management!, gen: gen! }, value }));
}

function expectClose(actual: number | null | undefined, expected: number, relative: number, what: string): void {
  expect(actual, what).not.toBeNull();
  expect(Math.abs(actual! - expected) / Math.abs(expected), `${what}: ${actual} vs ${expected}`).toBeLessThan(relative);
}

const row = (analysis: TrialAnalysis, term: string) => {
  const found = analysis.anova.find((r) => r.term === term);
  expect(found, term).toBeDefined();
  return found!;
};

/** ANOVA lines [term, df, SS, error term, F] as printed by R, SS and F to the given relative tolerances. */
function expectLines(analysis: TrialAnalysis, expected: readonly [string, number, number, string | null, number | null][], ssTolerance: number, fTolerance: number): void {
  for (const [term, df, ss, errorTerm, f] of expected) {
    const line = row(analysis, term);
    expect(line.df, `${term} df`).toBe(df);
    expectClose(line.ss, ss, ssTolerance, `${term} SS`);
    if (f !== null) {
      expect(line.errorTerm, `${term} error`).toBe(errorTerm);
      expectClose(line.f, f, fTolerance, `${term} F`);
    }
  }
}

describe('split plot: Yates’s oats (R nlme::Oats)', () => {
  const analysis = analyseTrial({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats() });

  it('every ANOVA line equals R summary(aov(yield ~ Variety*nitro + Error(Block/Variety))) (R 4.2.2, printed to 12 digits)', () => {
    expect(analysis.model!.kind).toBe('anova');
    const expected: [string, number, number, string | null, number | null][] = [
      ['Variety', 2, 1786.36111, 'block:Variety', 1.48534],
      ['block:Variety', 10, 6013.30556, null, null],
      ['nitro', 3, 20020.5, 'error', 37.68565],
      ['Variety:nitro', 6, 321.75, 'error', 0.30282],
      ['error', 45, 7968.75, null, null],
    ];
    expectLines(analysis, expected, 1e-8, 5e-5);
    // Pr(>F) as printed by R: 0.27239, 2.4577e-12, 0.9322.
    expectClose(row(analysis, 'Variety').p, 0.27239, 1e-4, 'Variety p');
    expectClose(row(analysis, 'nitro').p, 2.4577e-12, 1e-4, 'nitro p');
    expect(analysis.strata!.map((s) => [s.stratum, s.errorTerm, s.df])).toEqual([
      ['whole plot', 'block:Variety', 10],
      ['sub plot', 'error', 45],
    ]);
    expect(analysis.strata![0]!.terms).toContain('Variety');
    expect(analysis.strata![1]!.terms).toEqual(['nitro', 'Variety:nitro']);
  });

  it('the four standard errors of a difference equal emmeans on lmer(yield ~ Variety*nitro + (1|Block) + (1|Block:Variety)), Kenward–Roger', () => {
    // R: pairs(emmeans(m, ~ Variety)) SE 7.08 df 10; the mixed kind pairs(emmeans(m, ~ Variety*nitro)) SE 9.72 df 30.2.
    // Closed forms (Gomez & Gomez 2nd ed. §3.4.2): √(2Ea/rb), √(2Eb/ra), √(2Eb/r), √(2[(b−1)Eb + Ea]/rb), r = 6, a = 3, b = 4.
    const ea = 6013.30556 / 10;
    const eb = 7968.75 / 45;
    const kinds = Object.fromEntries(analysis.differences!.map((d) => [d.kind, d]));
    expectClose(kinds['Variety']!.se, Math.sqrt((2 * ea) / 24), 1e-8, 'two whole-plot means');
    expectClose(kinds['Variety']!.se, 7.08, 1e-3, 'emmeans SE (printed 7.08)');
    expect(kinds['Variety']!.errorTerm).toBe('block:Variety');
    expectClose(kinds['nitro']!.se, Math.sqrt((2 * eb) / 18), 1e-8, 'two sub-plot means');
    expectClose(kinds['nitro within Variety']!.se, Math.sqrt((2 * eb) / 6), 1e-8, 'two sub-plot means at one whole-plot level');
    const mixed = kinds['Variety within nitro']!;
    expectClose(mixed.se, Math.sqrt((2 * (3 * eb + ea)) / 24), 1e-8, 'two whole-plot means at the same or different sub-plot levels');
    expectClose(mixed.se, 9.72, 1e-3, 'emmeans SE (printed 9.72)');
    expectClose(mixed.df, 30.2, 2e-3, 'Kenward–Roger = Satterthwaite df (printed 30.2)');
    // Weighted t (Gomez & Gomez §3.4.2): [(b−1)Eb·t_b + Ea·t_a] / [(b−1)Eb + Ea], t at 0.05 of 45 and 10 df (R qt(0.975, 45) = 2.014103, qt(0.975, 10) = 2.228139).
    expectClose(mixed.critical, (3 * eb * 2.014103389 + ea * 2.228138852) / (3 * eb + ea), 1e-8, 'weighted t');
    expect(mixed.errorTerm).toBe('block:Variety and error (Satterthwaite)');
  });

  it('asked for REML, balanced data give the classical F tests (pbkrtest KRmodcomp on the lmer above equals aov)', () => {
    const reml = analyseTrial({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats(), model: 'reml' });
    expect(reml.model!.kind).toBe('reml');
    expectClose(row(reml, 'Variety').f, row(analysis, 'Variety').f!, 1e-6, 'Variety F');
    expectClose(row(reml, 'Variety').denDf, 10, 1e-6, 'Variety denDf');
    expectClose(row(reml, 'nitro').f, row(analysis, 'nitro').f!, 1e-6, 'nitro F');
    expectClose(row(reml, 'nitro').denDf, 45, 1e-6, 'nitro denDf');
    expect(row(reml, 'nitro').ss).toBeNull();
  });

  it('letters of the whole-plot factor use the whole-plot error; nothing is sliced when the interaction is not significant', () => {
    expect(analysis.factorComparisons!['Variety']!.errorTerm).toBe('block:Variety');
    expect(analysis.factorComparisons!['Variety']!.df).toBeCloseTo(10, 10);
    expect(analysis.factorComparisons!['nitro']!.errorTerm).toBe('error');
    expect(analysis.slices).toEqual([]);
  });

  it('permuting the observations changes nothing', () => {
    const shuffled = [...oats()].reverse();
    const again = analyseTrial({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: shuffled });
    again.anova.forEach((line) => expectClose(line.ss, row(analysis, line.term).ss!, 1e-10, `${line.term} SS`));
  });
});

describe('split-split plot: Gomez & Gomez (1984) 2nd ed. p. 143 rice data', () => {
  const analysis = analyseTrial({ design: 'split-split-plot', factorNames: ['nf', 'management', 'gen'], observations: gomezSplitSplit() });

  it('every ANOVA line equals R summary(aov(yield ~ nf*management*gen + Error(rep/nf/management))) (agridat example; R 4.2.2, 12 digits)', () => {
    const expected: [string, number, number, string | null, number | null][] = [
      ['nf', 4, 61.6408218, 'block:nf', 27.69533],
      ['block:nf', 8, 4.4513507, null, null],
      ['management', 2, 42.936107, 'block:nf:management', 81.99649],
      ['nf:management', 8, 1.1029733, 'block:nf:management', 0.5266],
      ['block:nf:management', 20, 5.2363348, null, null],
      ['gen', 2, 206.0131597, 'error', 207.86671],
      ['nf:gen', 8, 14.1445063, 'error', 3.56794],
      ['management:gen', 4, 3.8517692, 'error', 1.94321],
      ['nf:management:gen', 16, 3.6992321, 'error', 0.46656],
      ['error', 60, 29.7324893, null, null],
    ];
    expectLines(analysis, expected, 1e-7, 1e-5);
    expectClose(row(analysis, 'block').ss, 0.731994504, 1e-8, 'rep SS');
    expect(analysis.strata!.map((s) => s.stratum)).toEqual(['whole plot', 'sub plot', 'sub-sub plot']);
  });

  it('standard errors of a difference of each kind equal the closed forms of Gomez & Gomez (2nd ed. ch. 3, split-split plot) from the aov mean squares', () => {
    // Ea, Eb, Ec: R's aov above; r = 3 reps, a = 5 nitrogen, b = 3 managements, c = 3 varieties. The forms are
    // derived from the strata (variance of a difference = Σ stratum MS × its share); listed as in the book, from memory.
    const [ea, eb, ec] = [4.4513507 / 8, 5.2363348 / 20, 29.7324893 / 60];
    const [r, a, b, c] = [3, 5, 3, 3];
    const kinds = Object.fromEntries(analysis.differences!.map((d) => [d.kind, d]));
    const expected: [string, number][] = [
      ['nf', (2 * ea) / (r * b * c)],
      ['management', (2 * eb) / (r * a * c)],
      ['gen', (2 * ec) / (r * a * b)],
      ['management within nf', (2 * eb) / (r * c)],
      ['nf within management', (2 * ((b - 1) * eb + ea)) / (r * b * c)],
      ['gen within nf', (2 * ec) / (r * b)],
      ['gen within management', (2 * ec) / (r * a)],
      ['nf within gen', (2 * ((c - 1) * ec + ea)) / (r * b * c)],
      ['management within gen', (2 * ((c - 1) * ec + eb)) / (r * a * c)],
    ];
    for (const [kind, variance] of expected) expectClose(kinds[kind]!.se, Math.sqrt(variance), 1e-6, `${kind} SE`);
    // Satterthwaite's df of (c−1)Ec + Ea: ((2Ec + Ea)²) / ((2Ec)²/60 + Ea²/8).
    expectClose(kinds['nf within gen']!.df, (2 * ec + ea) ** 2 / ((2 * ec) ** 2 / 60 + ea ** 2 / 8), 1e-8, 'nf within gen df');
    // Where no variance component sits at 0, lmer agrees: pairs(emmeans(lmer(yield ~ rep + nf*management*gen +
    // (1|rep:nf) + (1|rep:nf:management)), ~ nf)) SE 0.203017757448, df 8 (R 4.2.2). (Its sub-plot variance is
    // estimated at 0, Eb < Ec, so kinds that involve Eb differ there: the classical forms above are the book's.)
    expectClose(kinds['nf']!.se, 0.203017757448, 1e-8, 'nf SE (emmeans)');
    expectClose(kinds['nf']!.df, 8, 1e-8, 'nf df (emmeans)');
  });

  it('the significant nf × gen interaction is sliced both ways', () => {
    const slice = (factor: string, level: string) => analysis.slices!.find((s) => s.factor === factor && s.level === level)!;
    // Varieties within a nitrogen rate lie in the sub-sub-plot stratum: F = 9·Σ(ȳ − ȳ̄)²/2 / Ec, R:
    // m <- with(d[d$nitro == 0, ], tapply(yield, gen, mean)); 9 * sum((m - mean(m))^2) / 2 / Ec → 18.2020450231 (140: 82.3534958963).
    expectClose(slice('gen', '0').f, 18.2020450231, 1e-8, 'gen | 0 F');
    expect(slice('gen', '0').denDf).toBeCloseTo(60, 8);
    expect(slice('gen', '0').errorTerm).toBe('error');
    expectClose(slice('gen', '140').f, 82.3534958963, 1e-8, 'gen | 140 F');
    expect(Object.keys(slice('gen', '140').letters.tukey!)).toEqual(expect.arrayContaining(['V1', 'V2', 'V3']));
    // Nitrogen within a variety mixes the whole-plot and sub-sub-plot strata: Kenward–Roger on the mixed model, as
    // joint_tests(lmer(yield ~ rep + nf*management*gen + (1|rep:nf) + (1|rep:nf:management)), by = "gen") prints:
    // V1 F = 5.253 (4, 39.79), V2 13.106, V3 21.371.
    expectClose(slice('nf', 'V1').f, 5.253, 1e-3, 'nf | V1 F');
    expectClose(slice('nf', 'V1').denDf, 39.79, 1e-3, 'nf | V1 df');
    expectClose(slice('nf', 'V2').f, 13.106, 1e-4, 'nf | V2 F');
    expectClose(slice('nf', 'V3').f, 21.371, 1e-4, 'nf | V3 F');
    expect(slice('nf', 'V1').errorTerm).toBe('Kenward–Roger');
    // management:gen and the others are not significant: no slices of them.
    expect(new Set(analysis.slices!.map((s) => `${s.factor}|${s.within}`))).toEqual(new Set(['nf|gen', 'gen|nf']));
  });
});
