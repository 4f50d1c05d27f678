import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

// Gehan (1965), Biometrika 52:203: remission times of 42 leukaemia patients, 6-MP against placebo
// (datasets/reference/gehan-remission.csv, as in R's MASS::gehan).
const gehan = readFileSync(resolve(__dirname, '../../../../datasets/reference/gehan-remission.csv'), 'utf8')
  .trim()
  .split('\n')
  .slice(1)
  .map((line) => {
    const [pair, time, cens, treat] = line.split(',');
    return { treatment: treat!, block: pair!, value: time!, censored: cens === '0' };
  });

// Beall (1942) insect counts, datasets/reference/insect-sprays.csv (R's InsectSprays): 6 sprays × 12 plots.
const insects = readFileSync(resolve(__dirname, '../../../../datasets/reference/insect-sprays.csv'), 'utf8')
  .trim()
  .split('\n')
  .slice(1)
  .map((line) => {
    const [count, spray] = line.split(',');
    return { treatment: spray!, value: Number(count) };
  });

// Invented crumble scores of an RCBD: 3 treatments × 8 blocks.
const crumble: Record<string, number[]> = { CTRL: [2, 3, 3, 1, 2, 3, 4, 2], GYP: [2, 3, 4, 2, 3, 3, 3, 5], CMP: [4, 3, 5, 4, 2, 5, 4, 3] };
const crumbleObservations = Object.entries(crumble).flatMap(([treatment, values]) => values.map((value, b) => ({ treatment, block: String(b + 1), value })));

describe('the measurement-model endpoints', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await createTestApp();
    token = await tokenFor(t, await createPerson());
  });
  afterAll(() => t.close());

  describe('POST /api/stats/censored', () => {
    it('needs a signed-in person', async () => {
      const response = await t.http.post('/api/stats/censored').send({ design: 'crd', distribution: 'weibull', observations: gehan });
      expect(response.status).toBe(401);
    });

    it('answers the remission data with curves, log-rank test and the time ratio, in the contract’s shape', async () => {
      const response = await t.http
        .post('/api/stats/censored')
        .set(bearer(token))
        .send({ design: 'crd', distribution: 'weibull', control: 'control', observations: gehan.map(({ block: _block, ...o }) => o) });
      expect(response.status).toBe(200);
      const body = response.body;
      expect(Object.keys(body)).toEqual(
        expect.arrayContaining(['distribution', 'logLik', 'scale', 'coefficients', 'tests', 'logRank', 'timeRatios', 'medians', 'curves']),
      );
      // R 4.2.2, survival 3.5.3: survreg(Surv(time, cens) ~ treat, gehan) loglik −106.5794915815639, scale 0.7321944040839854;
      // survdiff χ² 16.792940989216525; quantile(survfit(...), 0.5): 8 (4, 12) and 23 (16, NA). 1e-7 relative.
      expect(body.distribution).toBe('weibull');
      expect(Math.abs(body.logLik / -106.5794915815639 - 1)).toBeLessThan(1e-9);
      expect(Math.abs(body.scale / 0.7321944040839854 - 1)).toBeLessThan(1e-7);
      expect(body.logRank).toMatchObject({ df: 1, strata: 1 });
      expect(Math.abs(body.logRank.chiSquare / 16.792940989216525 - 1)).toBeLessThan(1e-12);
      expect(body.medians).toEqual([
        { treatment: 'control', median: 8, lower: 4, upper: 12 },
        { treatment: '6-MP', median: 23, lower: 16, upper: null },
      ]);
      expect(body.timeRatios).toHaveLength(1);
      expect(body.timeRatios[0].treatment).toBe('6-MP');
      expect(Math.abs(body.timeRatios[0].ratio / 3.5513740588099121 - 1)).toBeLessThan(1e-6);
      expect(body.curves.map((c: { treatment: string }) => c.treatment)).toEqual(['control', '6-MP']);
      expect(body.curves[1].points[0]).toEqual({ time: 0, notDrained: 1, lower: 1, upper: 1, atRisk: 21, events: 0, censored: 0 });
      expect(body.tests).toEqual([{ term: 'treatment', df: 1, chiSquare: expect.any(Number), p: expect.any(Number) }]);
      expect(body.adjustment).toMatch(/single-step/);
    });

    it('stratifies the log-rank test by block: the matched pairs', async () => {
      const response = await t.http.post('/api/stats/censored').set(bearer(token)).send({ design: 'rcbd', distribution: 'lognormal', control: 'control', observations: gehan });
      expect(response.status).toBe(200);
      // R: survdiff(Surv(time, cens) ~ treat + strata(pair), gehan)$chisq = 10.714285714285715.
      expect(response.body.logRank.strata).toBe(21);
      expect(Math.abs(response.body.logRank.chiSquare / 10.714285714285715 - 1)).toBeLessThan(1e-12);
      expect(response.body.tests.map((r: { term: string }) => r.term)).toEqual(['block', 'treatment']);
    });

    it('refuses, naming the field, what it cannot take', async () => {
      const post = (body: object) => t.http.post('/api/stats/censored').set(bearer(token)).send(body);
      const noCensoring = await post({ design: 'crd', distribution: 'weibull', observations: [{ treatment: 'A', value: 3 }] });
      expect(noCensoring.status).toBe(422);
      expect(noCensoring.body.message).toMatch(/observations\[0\]\.censored is needed/);
      const badDistribution = await post({ design: 'crd', distribution: 'gamma', observations: gehan });
      expect(badDistribution.status).toBe(422);
      expect(badDistribution.body.message).toMatch(/distribution must be one of weibull, lognormal, loglogistic/);
      const noBlock = await post({ design: 'rcbd', distribution: 'weibull', observations: [{ treatment: 'A', value: 3, censored: false }, { treatment: 'B', value: 4, censored: false, block: '1' }] });
      expect(noBlock.status).toBe(422);
      expect(noBlock.body.message).toBe('missing block: row 1 of the observations has no block, which the rcbd design needs');
      const negative = await post({ design: 'crd', distribution: 'weibull', observations: [{ treatment: 'A', value: -3, censored: false }, { treatment: 'B', value: 4, censored: false }] });
      expect(negative.status).toBe(422);
      expect(negative.body.message).toMatch(/row 1 of the observations: the time must be a number of at least 0/);
    });
  });

  describe('POST /api/stats/ordinal', () => {
    it('needs a signed-in person', async () => {
      expect((await t.http.post('/api/stats/ordinal').send({ design: 'rcbd', observations: crumbleObservations })).status).toBe(401);
    });

    it('tests treatment by likelihood ratio as polr does, with odds ratios, shares and the Friedman test', async () => {
      const response = await t.http.post('/api/stats/ordinal').set(bearer(token)).send({ design: 'rcbd', control: 'CTRL', observations: crumbleObservations });
      expect(response.status).toBe(200);
      const body = response.body;
      // R 4.2.2, MASS 7.3-58.2: anova(polr(score ~ block), polr(score ~ block + treatment)): LR 10.116251241868781 on 2 df,
      // p 0.0063574646507047472; coef treatmentCMP 3.4405887575936633 (1e-6 relative).
      const treatment = body.tests.find((row: { term: string }) => row.term === 'treatment');
      expect(treatment.df).toBe(2);
      expect(Math.abs(treatment.chiSquare / 10.116251241868781 - 1)).toBeLessThan(1e-6);
      expect(Math.abs(treatment.p - 0.0063574646507047472)).toBeLessThan(1e-7);
      expect(Math.abs(body.oddsRatios[1].ratio / Math.exp(3.4405887575936633) - 1)).toBeLessThan(1e-5);
      expect(body.categories).toEqual(['1', '2', '3', '4', '5']);
      expect(body.probabilities).toHaveLength(15);
      expect(body.rankTest).toMatchObject({ test: 'friedman', df: 2 });
    });

    it('refuses a score that is not a number, naming the row', async () => {
      const response = await t.http.post('/api/stats/ordinal').set(bearer(token)).send({ design: 'crd', observations: [{ treatment: 'A', value: 'x' }, { treatment: 'B', value: 2 }] });
      expect(response.status).toBe(422);
      expect(response.body.message).toMatch(/observations\[0\]\.value must be a finite number or a decimal string/);
    });
  });

  describe('POST /api/stats/counts', () => {
    it('needs a signed-in person', async () => {
      expect((await t.http.post('/api/stats/counts').send({ design: 'crd', observations: insects })).status).toBe(401);
    });

    it('finds the insect counts overdispersed and answers with quasi-Poisson rate ratios', async () => {
      const response = await t.http.post('/api/stats/counts').set(bearer(token)).send({ design: 'crd', control: 'A', observations: insects });
      expect(response.status).toBe(200);
      const body = response.body;
      // R 4.2.2: glm(count ~ spray, InsectSprays, poisson): Pearson χ² 99.509028826974117 on 66 df (p 0.00483); quasi-Poisson
      // dispersion 1.5077125579849557; anova(…, test = "F") F 41.216414635115875 (glm.control(epsilon = 1e-14)); 1e-9 relative.
      expect(body.family).toBe('quasipoisson');
      expect(body.overdispersion.present).toBe(true);
      expect(Math.abs(body.dispersion / 1.5077125579849557 - 1)).toBeLessThan(1e-9);
      expect(Math.abs(body.tests[0].f / 41.216414635115875 - 1)).toBeLessThan(1e-9);
      expect(body.rateRatios.map((r: { treatment: string }) => r.treatment)).toEqual(['B', 'C', 'D', 'E', 'F']);
      expect(body.rates[0].rate).toBeCloseTo(14.5, 9); // mean count of spray A (R: mean(InsectSprays$count[1:12]))
    });

    it('refuses a count that is not whole and an unknown family', async () => {
      const fraction = await t.http.post('/api/stats/counts').set(bearer(token)).send({ design: 'crd', observations: [{ treatment: 'A', value: 2.5 }, { treatment: 'B', value: 1 }] });
      expect(fraction.status).toBe(422);
      expect(fraction.body.message).toMatch(/row 1 of the observations: a count must be a whole number of at least 0, got 2.5/);
      const family = await t.http.post('/api/stats/counts').set(bearer(token)).send({ design: 'crd', family: 'binomial', observations: insects });
      expect(family.status).toBe(422);
      expect(family.body.message).toMatch(/family must be one of auto, poisson, quasipoisson/);
    });
  });
});
