import type { AnovaAnswer, CensoredAnswer, CountsAnswer, Findings, ModelFindings, Observation, OrdinalAnswer, RepeatedAnswer, TrialDetail } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, type TestApp } from '../support/test-app';
import { close, removeBundleFolders, runBundle } from './bundle-support';
import { buildCountsTrial } from './counts-trial';
import { openDemoTrial, type DemoTrial } from './demo-trial';

type ModelOf<A extends ModelFindings['analysis']> = Extract<ModelFindings, { analysis: A }>;

/**
 * Findings runs each measure of the demo trial FW-CLAY-26 (rcbd at three gardens, control CTL, values at Day 0 and
 * Day 14) with the model made for it, and each answer equals the stateless endpoint's on observations built here
 * independently from GET /observations.
 */
describe('Findings: the model made for each measure', () => {
  let demo: DemoTrial;
  let t: TestApp;
  let base: string;
  let protocol: TrialDetail;
  const measure = (code: string) => demo.measure(code);
  const round = (label: string) => demo.round(label);
  const get = (path: string) => demo.get(path);
  const post = (path: string, body: object) => demo.post(path, body);
  const stored = (query: string) => demo.stored(query);
  const labels = (o: Observation) => ({ treatment: o.treatmentCode, block: String(o.block), site: o.siteName });

  /** The findings answer without its context, and the context. */
  async function findings<A extends ModelFindings['analysis']>(query: string, analysis: A): Promise<{ body: ModelOf<A>; answer: Record<string, unknown> }> {
    const response = await get(`${base}/findings?${query}`);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const body = response.body as ModelOf<A>;
    expect(body.analysis).toBe(analysis);
    const { context: _context, analysis: _analysis, ...answer } = body as ModelOf<A> & Record<string, unknown>;
    return { body, answer };
  }

  beforeAll(async () => {
    demo = await openDemoTrial('Models reviewer');
    ({ t, base, protocol } = demo);
  });
  afterAll(() => t.close());

  it('drain time by default: not-drained curves, stratified log-rank and Weibull time ratios, equal to POST /api/stats/censored', async () => {
    const query = `measureId=${measure('DRAIN').id}&roundId=${round('Day 14').id}`;
    const { body, answer } = await findings(query, 'censored');
    const observations = await stored(query);
    expect(observations.some((o) => o.censored)).toBe(true);
    const direct = await post('/api/stats/censored', {
      design: 'multisite-rcbd',
      distribution: 'weibull',
      control: 'CTL',
      observations: observations.map((o) => ({ ...labels(o), value: o.valueText!, censored: o.censored })),
    });
    expect(direct.status).toBe(200);
    expect(answer).toEqual(direct.body);
    const censored = answer as unknown as CensoredAnswer;
    expect(censored.bySite!.map((s) => s.site).sort()).toEqual(protocol.sites.map((s) => s.name).sort());
    expect(censored.timeRatios.map((r) => r.treatment).sort()).toEqual(['CMP', 'GYP', 'LFM', 'SHL']);
    // Which model and why, and the ANOVA one click away, labelled as the biased fallback.
    const choice = body.context.modelChoice;
    expect(choice).toMatchObject({ analysis: 'censored', defaultAnalysis: 'censored' });
    expect(choice.why).toMatch(/cut-off of 600 s.*censored/);
    const anova = choice.options.find((o) => o.analysis === 'anova')!;
    expect(anova).toMatchObject({ available: true, isDefault: false, label: 'ANOVA on cut-off values (biased fallback)' });
    expect(anova.note).toMatch(/^Biased: \d+ plots? not drained by the cut-off/);
    expect(choice.options.filter((o) => o.available).map((o) => o.analysis).sort()).toEqual(['ancova', 'anova', 'censored', 'repeated']);
    expect(body.context.engineRequest).toEqual({ design: 'multisite-rcbd', distribution: 'weibull', control: 'CTL' });
    expect(body.context.censored.count).toBe(observations.filter((o) => o.censored).length);
    // The same request posted again from the context gives the same answer: anyone can reproduce it.
    const again = await post('/api/stats/censored', { ...body.context.engineRequest, observations: body.context.engineObservations });
    expect(again.body).toEqual(answer);

    const lognormal = await findings(`${query}&distribution=lognormal`, 'censored');
    expect(lognormal.body.distribution).toBe('lognormal');
    expect(lognormal.body.context.choices.distribution).toBe('lognormal');
  });

  it('the ANOVA fallback of a drain time keeps the stateless ANOVA body and says it is biased', async () => {
    const query = `measureId=${measure('DRAIN').id}&roundId=${round('Day 14').id}&analysis=anova`;
    const response = await get(`${base}/findings?${query}`);
    expect(response.status).toBe(200);
    const body = response.body as Findings;
    expect(body).not.toHaveProperty('analysis');
    expect(body.context.modelChoice).toMatchObject({ analysis: 'anova', defaultAnalysis: 'censored' });
    expect(body.context.modelChoice!.why).toMatch(/biased fallback.*The analysis made for this measure is not-drained curves and time ratios/);
  });

  it('drain time over rounds: REML with the covariance chosen by AIC, equal to POST /api/stats/repeated', async () => {
    const query = `measureId=${measure('DRAIN').id}&analysis=repeated`;
    const { body, answer } = await findings(query, 'repeated');
    const rows = [
      ...(await stored(`measureId=${measure('DRAIN').id}&roundId=${round('Day 0').id}`)),
      ...(await stored(`measureId=${measure('DRAIN').id}&roundId=${round('Day 14').id}`)),
    ];
    const direct = await post('/api/stats/repeated', {
      design: 'multisite-rcbd',
      covariance: 'auto',
      control: 'CTL',
      observations: rows.map((o) => ({ ...labels(o), round: o.roundLabel, time: protocol.rounds.find((r) => r.id === o.roundId)!.dayOffset, value: o.valueText! })),
    });
    expect(direct.status).toBe(200);
    expect(answer).toEqual(direct.body);
    const repeated = answer as unknown as RepeatedAnswer;
    expect(repeated.rounds).toEqual([
      { round: 'Day 0', time: 0 },
      { round: 'Day 14', time: 14 },
    ]);
    expect(repeated.byRound.map((r) => r.round)).toEqual(['Day 0', 'Day 14']);
    expect(body.context.rounds!.map((r) => r.label)).toEqual(['Day 0', 'Day 14']);
    expect(body.context.notices.join(' ')).toMatch(/not drained by the cut-off enter the model at the cut-off value/);
    const ar1 = await findings(`${query}&covariance=ar1`, 'repeated');
    expect(ar1.body.covariance.structure).toBe('ar1');
  });

  it('water retained with a day-0 baseline and one later round: analysis of covariance by default, equal to POST /api/stats/anova with the covariate', async () => {
    const query = `measureId=${measure('WATER').id}&roundId=${round('Day 14').id}`;
    const { body, answer } = await findings(query, 'ancova');
    const later = await stored(query);
    const baseline = new Map((await stored(`measureId=${measure('WATER').id}&roundId=${round('Day 0').id}`)).map((o) => [o.plotLabel, o.valueText!]));
    const paired = later.filter((o) => baseline.has(o.plotLabel));
    const direct = await post('/api/stats/anova', {
      design: 'multisite-rcbd',
      alpha: 0.05,
      sitesAre: 'random',
      control: 'CTL',
      transform: 'none',
      meanSeparation: ['tukey'],
      forceLsd: false,
      observations: paired.map((o) => ({ ...labels(o), value: o.valueText!, covariate: baseline.get(o.plotLabel)! })),
    });
    expect(direct.status).toBe(200);
    expect(answer).toEqual(direct.body);
    const ancova = answer as unknown as AnovaAnswer;
    expect(ancova.covariate).toEqual(expect.objectContaining({ slope: expect.any(Number) }));
    expect(ancova.slopes).toEqual(expect.objectContaining({ p: expect.any(Number) }));
    expect(body.context.choices).toMatchObject({ analysis: 'ancova', covariateMeasureId: measure('WATER').id, covariateRoundId: round('Day 0').id });
    expect(body.context.modelChoice.why).toMatch(/baseline/);
    expect(body.context.notices[0]).toBe('The covariate is water retained at Day 0: each plot\'s value is adjusted for its own baseline.');
    // Rounds over time stay one click away, with the same numbers as asked for directly.
    const repeated = await findings(`${query}&analysis=repeated`, 'repeated');
    expect(repeated.body.context.modelChoice.defaultAnalysis).toBe('ancova');
  });

  it('crumble score: proportional odds with the rank test beside it, equal to POST /api/stats/ordinal', async () => {
    const site = protocol.sites[0]!;
    const query = `measureId=${measure('CRUMB').id}&roundId=${round('Day 14').id}&siteId=${site.id}`;
    const { body, answer } = await findings(query, 'ordinal');
    const observations = await stored(query);
    const direct = await post('/api/stats/ordinal', { design: 'rcbd', control: 'CTL', observations: observations.map((o) => ({ treatment: o.treatmentCode, block: String(o.block), value: o.valueText! })) });
    expect(direct.status).toBe(200);
    expect(answer).toEqual(direct.body);
    const ordinal = answer as unknown as OrdinalAnswer;
    expect(ordinal.rankTest.test).toBe('friedman');
    expect(body.context.scope).toMatchObject({ siteId: site.id, siteName: site.name });
    expect(body.context.modelChoice.why).toMatch(/ordered scale/);
  });

  it('refuses an analysis the measure does not allow, in words, and an unknown one by name', async () => {
    const counts = await get(`${base}/findings?measureId=${measure('WATER').id}&analysis=counts`);
    expect(counts.status).toBe(422);
    expect(counts.body.message).toBe('Count rates is not available for water retained here: Only for a count measure.');
    const single = await get(`${base}/findings?measureId=${measure('WATER').id}&roundId=${round('Day 0').id}&analysis=repeated`);
    expect(single.status).toBe(422);
    expect(single.body.message).toMatch(/two or more rounds/);
    const unknown = await get(`${base}/findings?measureId=${measure('WATER').id}&analysis=bayes&distribution=gamma`);
    expect(unknown.status).toBe(422);
    expect(unknown.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['analysis', 'distribution']);
  });

  it('a count measure: Poisson with an overdispersion check and rate ratios, equal to POST /api/stats/counts', async () => {
    // A small trial of its own (the demo has no count measure): three treatments, one garden of four blocks, counts typed in the Ledger.
    const counts = await buildCountsTrial(t);
    const trialBase = counts.base;
    const auth = bearer(counts.token);
    const worms = { id: counts.measureId };
    const response = await t.http.get(`${trialBase}/findings?measureId=${worms.id}`).set(auth);
    expect(response.status).toBe(200);
    const { context, analysis, ...answer } = response.body as ModelOf<'counts'>;
    expect(analysis).toBe('counts');
    const observations = ((await t.http.get(`${trialBase}/observations?measureId=${worms.id}`).set(auth)).body as Observation[]).map((o) => ({
      treatment: o.treatmentCode,
      block: String(o.block),
      value: o.valueText!,
    }));
    const direct = await t.http.post('/api/stats/counts').set(auth).send({ design: 'rcbd', control: 'C', family: 'auto', observations });
    expect(direct.status).toBe(200);
    expect(answer).toEqual(direct.body);
    expect((answer as unknown as CountsAnswer).rateRatios.map((r) => r.treatment).sort()).toEqual(['G', 'K']);
    expect(context.modelChoice).toMatchObject({ analysis: 'counts', defaultAnalysis: 'counts' });
    expect(context.modelChoice.why).toMatch(/count per plot/);
    // Its bundle: R's glm (poisson, or quasipoisson when Pearson's χ² says so) gives the same rate ratios, 1e-6 relative.
    const { r } = await runBundle<ModelOf<'counts'>>(t, counts.token, `${trialBase}/findings/bundle?measureId=${worms.id}`);
    expect(r.family).toBe((answer as unknown as CountsAnswer).family);
    for (const ratio of (answer as unknown as CountsAnswer).rateRatios) close((r.rateRatios as Array<{ treatment: string; ratio: number }>).find((row) => row.treatment === ratio.treatment)!.ratio, ratio.ratio, 1e-6);
    removeBundleFolders();
  }, 180_000);
});
