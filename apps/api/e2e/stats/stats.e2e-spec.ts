import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

// Montgomery, Design and Analysis of Experiments: hardness-testing tips (4) × coupons (4) in blocks.
// Data and ANOVA as listed in datasets/reference/STATISTICS.md B.1 (NDSU SAS listing; R 4.2.2).
const hardness: Array<[tip: string, coupon: string, value: string]> = [
  ['1', '1', '9.3'], ['1', '2', '9.4'], ['1', '3', '9.6'], ['1', '4', '10.0'],
  ['2', '1', '9.4'], ['2', '2', '9.3'], ['2', '3', '9.8'], ['2', '4', '9.9'],
  ['3', '1', '9.2'], ['3', '2', '9.4'], ['3', '3', '9.5'], ['3', '4', '9.7'],
  ['4', '1', '9.7'], ['4', '2', '9.6'], ['4', '3', '10.0'], ['4', '4', '10.2'],
];
const hardnessObservations = hardness.map(([tip, coupon, value]) => ({ treatment: `tip ${tip}`, block: coupon, value }));

const relative = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);
// The reference datasets live in the repository (datasets/reference; sources in its README.md).
const referenceDir = resolve(__dirname, '../../../../datasets/reference/data');

describe('the stateless analysis API', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await createTestApp();
    token = await tokenFor(t, await createPerson());
  });
  afterAll(() => t.close());

  it('needs a signed-in person', async () => {
    const response = await t.http.post('/api/stats/anova').send({ design: 'rcbd', observations: hardnessObservations });
    expect(response.status).toBe(401);
  });

  it('analyses the hardness-tips RCBD from decimal text as the published table says', async () => {
    const response = await t.http
      .post('/api/stats/anova')
      .set(bearer(token))
      .send({ design: 'rcbd', meanSeparation: ['tukey', 'lsd'], observations: hardnessObservations });
    expect(response.status).toBe(200);
    const row = (term: string) => response.body.anova.find((r: { term: string }) => r.term === term);
    // Source: STATISTICS.md B.1 — Tips SS 0.385 (3 df), Coupons 0.825 (3), Error 0.080 (9), Total 1.290 (15); F 14.438, p 0.0008713 (R).
    expect(row('block')).toMatchObject({ df: 3 });
    expect(relative(row('block').ss, 0.825)).toBeLessThan(1e-12);
    expect(row('treatment').df).toBe(3);
    expect(relative(row('treatment').ss, 0.385)).toBeLessThan(1e-12);
    expect(relative(row('treatment').f, 14.4375)).toBeLessThan(1e-12); // 0.128333…/0.0088889… = 14.4375 exactly
    expect(row('treatment').p).toBeCloseTo(0.0008713, 7);
    expect(relative(row('error').ss, 0.08)).toBeLessThan(1e-12);
    expect(row('error').df).toBe(9);
    expect(relative(row('total').ss, 1.29)).toBeLessThan(1e-12);
    // CV 0.979542 % and mean 9.625 (NDSU SAS listing).
    expect(response.body.summary.cv).toBeCloseTo(0.979542, 6);
    expect(response.body.summary.grandMean).toBeCloseTo(9.625, 12);
    // Tip means 9.575, 9.600, 9.450, 9.875 (R 4.2.2).
    const means = Object.fromEntries(response.body.means.map((m: { treatment: string; mean: number }) => [m.treatment, m.mean]));
    expect(means['tip 1']).toBeCloseTo(9.575, 12);
    expect(means['tip 4']).toBeCloseTo(9.875, 12);
    // Tukey (multcomp::cld): tips 1–3 share a letter, tip 4 differs from all; the highest mean gets "a".
    const letters = response.body.letters.tukey;
    expect(letters['tip 4']).toBe('a');
    const share = (a: string, b: string) => [...letters[a]].some((l) => letters[b].includes(l));
    expect(share('tip 1', 'tip 2') && share('tip 1', 'tip 3') && share('tip 2', 'tip 3')).toBe(true);
    expect(share('tip 4', 'tip 1') || share('tip 4', 'tip 2') || share('tip 4', 'tip 3')).toBe(false);
    // HSD05 = 4.414890 × √(MSE/4) = 0.208120; LSD05 = 0.150810 (R 4.2.2).
    const tukeyPair = response.body.comparisons.tukey.pairs[0];
    expect(tukeyPair.upper - tukeyPair.diff).toBeCloseTo(0.20812, 5);
    const lsdPair = response.body.comparisons.lsd.pairs[0];
    expect(lsdPair.upper - lsdPair.diff).toBeCloseTo(0.15081, 5);
  });

  it(
    'tests treatment against site × treatment with random sites (Gomez & Gomez wet/dry seasons)',
    async () => {
      const lines = readFileSync(resolve(referenceDir, 'agridat_gomez.wetdry.csv'), 'utf8').trim().split('\n').slice(1);
      const observations = lines.map((line) => {
        const [season, nitrogen, rep, yieldText] = line.split(',').map((cell) => cell.replace(/"/g, ''));
        return { site: season, block: rep, treatment: `N${nitrogen}`, value: yieldText };
      });
      const response = await t.http.post('/api/stats/anova').set(bearer(token)).send({ design: 'multisite-rcbd', sitesAre: 'random', observations });
      expect(response.status).toBe(200);
      const row = (term: string) => response.body.anova.find((r: { term: string }) => r.term === term);
      // STATISTICS.md B.11 (R 4.2.2): N vs Season × N F = 1.941573 on (4,4), p = 0.26813; Season vs reps F = 14.262981, p = 0.019492.
      expect(row('treatment').f).toBeCloseTo(1.941573, 5);
      expect(row('treatment').p).toBeCloseTo(0.26813, 5);
      expect(row('site').f).toBeCloseTo(14.262981, 5);
      expect(row('site').p).toBeCloseTo(0.019492, 5);
      expect(row('error')).toMatchObject({ df: 16 });
      expect(response.body.diagnostics.bartlett).toBeDefined();
    },
  );

  it('names the malformed field with 422', async () => {
    const response = await t.http
      .post('/api/stats/anova')
      .set(bearer(token))
      .send({ design: 'latin', alpha: 2, observations: [{ treatment: 'A', block: '1', value: 'twelve' }] });
    expect(response.status).toBe(422);
    const fields = response.body.errors.map((e: { field: string }) => e.field).sort();
    expect(fields).toEqual(['alpha', 'design', 'observations']);
    expect(response.body.errors.find((e: { field: string }) => e.field === 'observations').message).toBe(
      'observations[0].value must be a finite number or a decimal string',
    );
  });

  it('answers a statistically impossible request with 422 and the engine’s sentence', async () => {
    const response = await t.http
      .post('/api/stats/anova')
      .set(bearer(token))
      .send({ design: 'rcbd', observations: [{ treatment: 'A', block: '1', value: 1 }, { treatment: 'A', block: '2', value: 2 }] });
    expect(response.status).toBe(422);
    expect(response.body.message).toMatch(/treatment/i);
    expect(JSON.stringify(response.body)).not.toMatch(/at \w+ \(/);
  });

  it('runs Friedman and Kruskal–Wallis on the same observations', async () => {
    // STATISTICS.md E.2: Hollander & Wolfe p. 116 — χ² = 0.771428571428572 (= 27/35), df 2, p 0.679964773578894 (R kruskal.test).
    const groups: Record<string, number[]> = {
      normal: [2.9, 3.0, 2.5, 2.6, 3.2],
      obstructive: [3.8, 2.7, 4.0, 2.4],
      asbestosis: [2.8, 3.4, 3.7, 2.2, 2.0],
    };
    const observations = Object.entries(groups).flatMap(([treatment, values]) => values.map((value) => ({ treatment, value })));
    const kruskal = await t.http.post('/api/stats/kruskal').set(bearer(token)).send({ observations });
    expect(kruskal.status).toBe(200);
    expect(kruskal.body.statistic).toBeCloseTo(27 / 35, 12);
    expect(kruskal.body.df).toBe(2);
    expect(kruskal.body.p).toBeCloseTo(0.679964773578894, 9);

    // Friedman on the hardness data, blocks = coupons; checked with R: friedman.test(matrix(c(9.3,9.4,9.2,9.7, 9.4,9.3,9.4,9.6, 9.6,9.8,9.5,10.0, 10.0,9.9,9.7,10.2), 4, byrow=TRUE)).
    const friedman = await t.http.post('/api/stats/friedman').set(bearer(token)).send({ observations: hardnessObservations });
    expect(friedman.status).toBe(200);
    expect(friedman.body.statistic).toBeCloseTo(8.84615384615, 10); // R 4.2.2: Friedman chi-squared 8.84615384615
    expect(friedman.body.p).toBeCloseTo(0.0314078541739, 10); // R 4.2.2: p-value 0.0314078541739
    expect(friedman.body.df).toBe(3);
    expect(friedman.body.blocksUsed).toBe(4);
  });

  it('computes power and the blocks needed', async () => {
    const power = await t.http.post('/api/stats/power').set(bearer(token)).send({ treatments: 4, blocks: 4, cv: 15, difference: 20, alpha: 0.05 });
    expect(power.status).toBe(200);
    // R 4.2.2: 1 - pf(qf(0.95, 3, 9), 3, 9, ncp = 4*(20/15)^2/2) = 0.221856955868
    expect(power.body.power).toBeCloseTo(0.221856955868, 6);
    const needed = await t.http.post('/api/stats/power').set(bearer(token)).send({ treatments: 4, cv: 15, difference: 20, alpha: 0.05, targetPower: 0.8 });
    expect(needed.status).toBe(200);
    const atNeeded = await t.http.post('/api/stats/power').set(bearer(token)).send({ treatments: 4, blocks: needed.body.blocks, cv: 15, difference: 20 });
    const below = await t.http.post('/api/stats/power').set(bearer(token)).send({ treatments: 4, blocks: needed.body.blocks - 1, cv: 15, difference: 20 });
    expect(atNeeded.body.power).toBeGreaterThanOrEqual(0.8);
    expect(below.body.power).toBeLessThan(0.8);
    const neither = await t.http.post('/api/stats/power').set(bearer(token)).send({ treatments: 4, cv: 15, difference: 20 });
    expect(neither.status).toBe(422);
  });
});
