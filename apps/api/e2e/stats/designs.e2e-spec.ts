import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

// Factorials and split plots through POST /api/stats/anova. Sources: Yates's oats (datasets/reference/nlme-oats.csv)
// against R's summary(aov(yield ~ Variety*nitro + Error(Block/Variety))); Gomez & Gomez (1984) 2nd ed. p. 143
// (datasets/reference/data/agridat_gomez.splitsplit.csv) against aov(yield ~ nf*management*gen + Error(rep/nf/management));
// random layouts in datasets/reference/r-design-fixtures.json against lmer + pbkrtest KRmodcomp and car::Anova type 3.
const reference = resolve(__dirname, '../../../../datasets/reference');
const csv = (file: string) =>
  readFileSync(resolve(reference, file), 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(',').map((cell) => cell.replace(/"/g, '')));
const oats = csv('nlme-oats.csv').map(([block, variety, nitro, value]) => ({ block, factors: { Variety: variety, nitro }, value }));
const splitSplit = csv('data/agridat_gomez.splitsplit.csv').map(([rep, nitro, management, gen, value]) => ({ block: rep, factors: { nf: nitro, management, gen }, value }));
interface FixtureCase {
  id: string;
  design: string;
  factorNames: string[];
  observations: unknown[];
  expected: {
    tests?: { term: string; numDf: number; denDf: number; f: number; p: number }[];
    rows?: { term: string; df: number; ss: number; f: number | null; p?: number }[];
    satterthwaite?: { call: string; tests: { term: string; numDf: number; denDf: number; f: number; p: number }[] };
  };
}
const fixtures: FixtureCase[] = JSON.parse(readFileSync(resolve(reference, 'r-design-fixtures.json'), 'utf8')).cases;
const fixture = (id: string) => fixtures.find((c) => c.id === id)!;

type Row = { term: string; df: number; ss: number | null; f: number | null; p: number | null; errorTerm?: string | null; numDf?: number; denDf?: number };
const relative = (actual: number | null | undefined, expected: number) => Math.abs((actual ?? NaN) - expected) / Math.abs(expected);

describe('POST /api/stats/anova for factorials and split plots', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await createTestApp();
    token = await tokenFor(t, await createPerson());
  });
  afterAll(() => t.close());

  const analyse = (body: object) => t.http.post('/api/stats/anova').set(bearer(token)).send(body);
  const rowOf = (body: { anova: Row[] }, term: string) => body.anova.find((r) => r.term === term)!;

  it('a split plot: each term against its stratum’s error, the four standard errors of a difference, letters in the right stratum', async () => {
    const response = await analyse({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats });
    expect(response.status).toBe(200);
    expect(response.body.model.kind).toBe('anova');
    // R: Variety 2 df, SS 1786.36111, F 1.48534 against Block:Variety (10 df, SS 6013.30556); nitro F 37.68565 against Within (45 df).
    expect(rowOf(response.body, 'Variety')).toMatchObject({ df: 2, errorTerm: 'block:Variety' });
    expect(relative(rowOf(response.body, 'Variety').ss, 1786.36111)).toBeLessThan(1e-8);
    expect(relative(rowOf(response.body, 'Variety').f, 1.48534)).toBeLessThan(1e-5);
    expect(relative(rowOf(response.body, 'block:Variety').ss, 6013.30556)).toBeLessThan(1e-8);
    expect(rowOf(response.body, 'nitro')).toMatchObject({ df: 3, errorTerm: 'error' });
    expect(relative(rowOf(response.body, 'nitro').f, 37.68565)).toBeLessThan(1e-6);
    expect(response.body.strata.map((s: { stratum: string; errorTerm: string; df: number }) => [s.stratum, s.errorTerm, s.df])).toEqual([
      ['whole plot', 'block:Variety', 10],
      ['sub plot', 'error', 45],
    ]);
    // √(2Ea/rb) = 7.0789, √(2Eb/ra) = 4.4358, √(2Eb/r) = 7.6830, √(2[(b−1)Eb + Ea]/rb) = 9.7150 (Ea = 601.33, Eb = 177.08, r = 6, a = 3, b = 4).
    const kinds = Object.fromEntries(response.body.differences.map((d: { kind: string; se: number }) => [d.kind, d.se]));
    expect(kinds['Variety']).toBeCloseTo(7.0789, 4);
    expect(kinds['nitro']).toBeCloseTo(4.4358, 4);
    expect(kinds['nitro within Variety']).toBeCloseTo(7.683, 3);
    expect(kinds['Variety within nitro']).toBeCloseTo(9.715, 3);
    expect(response.body.factorComparisons.Variety.errorTerm).toBe('block:Variety');
    expect(Object.keys(response.body.factorComparisons.nitro.letters.tukey).sort()).toEqual(['0', '0.2', '0.4', '0.6']);
    expect(response.body.marginalMeans.map((m: { term: string }) => m.term)).toEqual(['Variety', 'nitro', 'Variety:nitro']);
  });

  it('a split-split plot: three strata, as R’s aov on Gomez & Gomez’s rice data', async () => {
    const response = await analyse({ design: 'split-split-plot', factorNames: ['nf', 'management', 'gen'], observations: splitSplit });
    expect(response.status).toBe(200);
    expect(response.body.strata.map((s: { errorTerm: string }) => s.errorTerm)).toEqual(['block:nf', 'block:nf:management', 'error']);
    for (const [term, ss, f] of [['nf', 61.6408218, 27.69533], ['management', 42.936107, 81.99649], ['nf:gen', 14.1445063, 3.56794]] as const) {
      expect(relative(rowOf(response.body, term).ss, ss), `${term} SS`).toBeLessThan(1e-7);
      expect(relative(rowOf(response.body, term).f, f), `${term} F`).toBeLessThan(1e-5);
    }
    // nf × gen is significant (p = 0.0019): gen is sliced within each nitrogen rate, with letters inside each slice.
    const slice = response.body.slices.find((s: { factor: string; level: string }) => s.factor === 'gen' && s.level === '0');
    expect(relative(slice.f, 18.2020450231)).toBeLessThan(1e-8);
    expect(Object.keys(slice.letters.tukey).sort()).toEqual(['V1', 'V2', 'V3']);
  });

  it('unbalanced data are fitted by REML with Kenward–Roger, as lmer + pbkrtest, and the answer says why', async () => {
    for (const id of ['design-08', 'design-11']) {
      const entry = fixture(id);
      const response = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations });
      expect(response.status, id).toBe(200);
      expect(response.body.model.kind).toBe('reml');
      expect(response.body.model.reason).toMatch(/unbalanced/);
      for (const test of entry.expected.tests!) {
        const row = rowOf(response.body, test.term);
        expect(row).toMatchObject({ ss: null, ms: null, errorTerm: 'kenward-roger', numDf: test.numDf });
        expect(relative(row.denDf, test.denDf), `${id} ${test.term} denDf`).toBeLessThan(1e-5);
        expect(relative(row.f, test.f), `${id} ${test.term} F`).toBeLessThan(1e-5);
      }
      expect(response.body.varianceComponents.length).toBeGreaterThan(1);
    }
  });

  it('ddf: satterthwaite gives lmerTest’s denominator degrees of freedom on the same unbalanced split plot', async () => {
    const entry = fixture('design-08');
    const response = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations, ddf: 'satterthwaite' });
    expect(response.status).toBe(200);
    expect(response.body.model.reason).toMatch(/Satterthwaite/);
    // The fixture's call: anova(lmerTest::as_lmerModLmerTest(m), type = 3, ddf = "Satterthwaite") (R, lmerTest 3.1.3).
    for (const test of entry.expected.satterthwaite!.tests) {
      const row = rowOf(response.body, test.term);
      expect(row.numDf).toBe(test.numDf);
      expect(relative(row.denDf, test.denDf), `${test.term} denDf`).toBeLessThan(1e-5);
      expect(relative(row.f, test.f), `${test.term} F`).toBeLessThan(1e-5);
    }
    const refused = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations, ddf: 'containment' });
    expect(refused.status).toBe(422);
    expect(JSON.stringify(refused.body)).toContain('ddf must be kenward-roger or satterthwaite');
  });

  it('a value of null is a plot not measured: left out, counted in a warning, the same answer as without the row', async () => {
    const entry = fixture('design-08');
    const withNull = (entry.observations as Array<{ value: unknown }>).map((o, i) => (i === 0 ? { ...o, value: null } : o));
    const left = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: withNull });
    const without = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations.slice(1) });
    expect([left.status, without.status]).toEqual([200, 200]);
    expect(left.body.warnings.join(' ')).toMatch(/1 missing value \(null\) was left out/);
    expect(left.body.anova).toEqual(without.body.anova);
  });

  it('a block left with a single plot is analysed, with a warning, never refused', async () => {
    const entry = fixture('design-06');
    const response = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations });
    expect(response.status).toBe(200);
    expect(response.body.warnings.join(' ')).toMatch(/Block 1 has a single plot/);
    expect(relative(rowOf(response.body, 'Amendment').f, entry.expected.tests![0]!.f)).toBeLessThan(1e-5);
  });

  it('an unbalanced three-factor factorial asked for the ANOVA gets car::Anova type 3', async () => {
    const entry = fixture('design-03');
    const response = await analyse({ design: entry.design, factorNames: entry.factorNames, observations: entry.observations, model: 'anova' });
    expect(response.status).toBe(200);
    for (const rRow of entry.expected.rows!) {
      expect(relative(rowOf(response.body, rRow.term).ss, rRow.ss), `${rRow.term} SS`).toBeLessThan(1e-9);
    }
  });

  it('refuses in words naming the field', async () => {
    const tooMany = await analyse({ design: 'factorial-rcbd', factorNames: ['A', 'B', 'C', 'D', 'E'], observations: oats });
    expect(tooMany.status).toBe(422);
    expect(tooMany.body.errors).toContainEqual({ field: 'factorNames', message: 'factor names must name 2 to 4 factors' });
    const model = await analyse({ design: 'split-plot', factorNames: ['Variety', 'nitro'], model: 'bayes', observations: oats });
    expect(model.status).toBe(422);
    expect(JSON.stringify(model.body)).toContain('model must be anova or reml');
    const noBlock = await analyse({ design: 'split-plot', factorNames: ['Variety', 'nitro'], observations: oats.map(({ block: _block, ...rest }) => rest) });
    expect(noBlock.status).toBe(422);
    expect(noBlock.body.message).toBe('missing block: observation 0 has no block, which the split-plot design needs');
    const strata = await analyse({ design: 'split-plot', factorNames: ['Variety', 'nitro'], model: 'anova', observations: oats.slice(1) });
    expect(strata.status).toBe(422);
    expect(strata.body.message).toMatch(/^classical strata do not hold: .*use model "reml"$/);
  });
});
