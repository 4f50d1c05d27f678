import type { AnalysisSnapshot, FindingsAnswer, ModelFindings, SavedAnalysisChoices, TrialReport } from '@friable/contracts';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectStatus } from '../protocol/protocol-builder';
import { buildCountsTrial, type CountsTrial } from '../findings/counts-trial';
import { openDemoTrial, type DemoTrial } from '../findings/demo-trial';
import { bearer } from '../support/test-app';

/** GET /findings's query text for saved choices, as a person reopening the analysis would ask for it. */
function queryOf(choices: SavedAnalysisChoices): string {
  return new URLSearchParams(
    Object.entries(choices)
      .filter(([, value]) => value !== null && value !== undefined)
      .map(([key, value]) => [key, String(value)]),
  ).toString();
}

/**
 * Saved analyses of every kind Findings offers: each keeps its analysis and model choices, its stored numbers are
 * the very answer Findings gave, and asking Findings again with the saved choices gives the same numbers. The report
 * carries the model made for each measure with the choices it ran with.
 */
describe('Saved analyses and the report: every analysis kind with its model choices', () => {
  let demo: DemoTrial;
  let counts: CountsTrial;

  beforeAll(async () => {
    demo = await openDemoTrial('Saved models reviewer');
    counts = await buildCountsTrial(demo.t);
  });
  afterAll(() => demo.t.close());

  /** Saves the analysis asked for by `query`, checks it against Findings, reopens it and asks Findings again with the saved choices. */
  async function saveAndReopen(base: string, token: string, query: Record<string, string | number>, analysis: ModelFindings['analysis']) {
    const auth = bearer(token);
    const text = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)])).toString();
    const live = await expectStatus<FindingsAnswer>(demo.t.http.get(`${base}/findings?${text}`).set(auth), 200);
    const saved = await expectStatus<AnalysisSnapshot>(demo.t.http.post(`${base}/analyses`).set(auth).send({ ...query, title: `Saved ${analysis}` }), 201);
    expect(saved.choices.analysis).toBe(analysis);
    expect(saved.result).toEqual(live);
    expect(saved).toMatchObject({ dataChanged: false, dataHash: live.context.dataHash, currentDataHash: live.context.dataHash, measureName: live.context.measure.name });
    const reopened = await expectStatus<AnalysisSnapshot>(demo.t.http.get(`${base}/analyses/${saved.id}`).set(auth), 200);
    expect(reopened.result).toEqual(saved.result);
    expect(reopened.dataChanged).toBe(false);
    // The saved choices ask Findings for the very same analysis: the same numbers, the same context.
    const again = await expectStatus<FindingsAnswer>(demo.t.http.get(`${base}/findings?${queryOf(reopened.choices)}`).set(auth), 200);
    expect(again).toEqual(reopened.result);
    const listed = (await expectStatus<AnalysisSnapshot[]>(demo.t.http.get(`${base}/analyses`).set(auth), 200)).find((a) => a.id === saved.id)!;
    expect(listed.choices).toEqual(reopened.choices);
    expect(listed.analysisLabel).toBe(live.context.modelChoice!.options.find((o) => o.analysis === analysis)!.label);
    return reopened;
  }

  it('censored drain times with a log-normal time-ratio model', async () => {
    const saved = await saveAndReopen(demo.base, demo.token, { measureId: demo.measure('DRAIN').id, roundId: demo.round('Day 14').id, distribution: 'lognormal' }, 'censored');
    expect(saved.choices).toMatchObject({ analysis: 'censored', distribution: 'lognormal', siteId: null });
    expect((saved.result as Extract<ModelFindings, { analysis: 'censored' }>).distribution).toBe('lognormal');
    expect(saved.analysisLabel).toBe('Not-drained curves and time ratios');
  });

  it('rounds over time with continuous-time AR(1) within plots', async () => {
    const saved = await saveAndReopen(demo.base, demo.token, { measureId: demo.measure('DRAIN').id, analysis: 'repeated', covariance: 'ar1' }, 'repeated');
    expect(saved.choices).toMatchObject({ analysis: 'repeated', covariance: 'ar1', roundId: demo.round('Day 14').id });
    expect((saved.result as Extract<ModelFindings, { analysis: 'repeated' }>).covariance.structure).toBe('ar1');
  });

  it('analysis of covariance on the day-0 baseline, at one site', async () => {
    const site = demo.protocol.sites[1]!;
    const saved = await saveAndReopen(demo.base, demo.token, { measureId: demo.measure('WATER').id, roundId: demo.round('Day 14').id, siteId: site.id }, 'ancova');
    expect(saved.choices).toMatchObject({ analysis: 'ancova', siteId: site.id, covariateMeasureId: demo.measure('WATER').id, covariateRoundId: demo.round('Day 0').id });
    expect(saved.scopeLabel).toBe(site.name);
  });

  it('proportional odds of the crumble score, all sites combined', async () => {
    const saved = await saveAndReopen(demo.base, demo.token, { measureId: demo.measure('CRUMB').id, roundId: demo.round('Day 14').id }, 'ordinal');
    const ordinal = saved.result as Extract<ModelFindings, { analysis: 'ordinal' }>;
    expect(ordinal.warnings).toEqual([]);
    expect(ordinal.oddsRatios.map((r) => r.treatment).sort()).toEqual(['CMP', 'GYP', 'LFM', 'SHL']);
  });

  it('counts with Poisson forced, and a changed count marks the saved analysis as changed', async () => {
    const saved = await saveAndReopen(counts.base, counts.token, { measureId: counts.measureId, family: 'poisson' }, 'counts');
    expect(saved.choices).toMatchObject({ analysis: 'counts', family: 'poisson' });
    const answer = saved.result as Extract<ModelFindings, { analysis: 'counts' }>;
    expect(answer.family).toBe('poisson');
    const auth = bearer(counts.token);
    // The workbook's sheet of the saved analysis names the model and its options and prints its rate ratios.
    const workbook = await demo.t.http
      .get(`${counts.base}/export.xlsx`)
      .set(auth)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(workbook.status).toBe(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(workbook.body as Buffer);
    const rows: unknown[][] = [];
    book.getWorksheet(`Analysis ${saved.id}`)!.eachRow((row) => rows.push((row.values as unknown[]).slice(1)));
    expect(rows).toContainEqual(['analysis', 'Count rates']);
    expect(rows).toContainEqual(['count family', 'poisson']);
    const ratiosAt = rows.findIndex((row) => String(row[0]).startsWith('Rate ratios to C'));
    expect(rows.slice(ratiosAt + 2, ratiosAt + 2 + answer.rateRatios.length)).toEqual(answer.rateRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p]));
    const [stored] = await expectStatus<Array<{ id: number; version: number }>>(demo.t.http.get(`${counts.base}/observations?measureId=${counts.measureId}`).set(auth), 200);
    await expectStatus(demo.t.http.patch(`${counts.base}/observations/${stored!.id}`).set(auth).send({ value: '41', version: stored!.version, acceptWarnings: true }), 200);
    const reopened = await expectStatus<AnalysisSnapshot>(demo.t.http.get(`${counts.base}/analyses/${saved.id}`).set(auth), 200);
    expect(reopened.dataChanged).toBe(true);
    // The stored numbers stay as they were saved.
    expect(reopened.result).toEqual(saved.result);
  });

  it('the report gives each measure the model made for it, with the choices it ran with and its numbers', async () => {
    const report = await expectStatus<TrialReport>(demo.get(`${demo.base}/report`), 200);
    const kinds = Object.fromEntries(report.measures.map((m) => [m.measure.code, m.model?.analysis ?? 'anova']));
    // The demo: drain time has a cut-off, crumble is a score, water retained and crust resistance have a day-0 baseline and Day 14.
    expect(kinds).toEqual({ DRAIN: 'censored', CRUMB: 'ordinal', WATER: 'ancova', CRUST: 'ancova' });
    for (const entry of report.measures) {
      const model = entry.model!;
      const findings = await expectStatus<ModelFindings>(demo.get(`${demo.base}/findings?${queryOf(model.choices)}`), 200);
      expect(findings.analysis).toBe(model.analysis);
      expect(model.why).toBe(findings.context.modelChoice.why);
      expect(model.choices.roundId).toBe(entry.round!.id);
      if (findings.analysis === 'censored') {
        const ratios = model.tables.find((table) => table.title.startsWith('Time ratios'))!;
        expect(ratios.rows).toEqual(findings.timeRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p]));
        expect(model.choices.distribution).toBe('weibull');
      } else if (findings.analysis === 'ordinal') {
        const odds = model.tables.find((table) => table.title.startsWith('Odds'))!;
        expect(odds.rows).toEqual(findings.oddsRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p]));
      } else if (findings.analysis === 'ancova') {
        const means = model.tables.find((table) => table.title.startsWith('Means adjusted'))!;
        expect(means.rows).toEqual(findings.means.map((m) => [m.treatment, m.n, m.mean, m.se]));
        expect(model.choices.covariateRoundId).toBe(demo.round('Day 0').id);
      }
      // The classical ANOVA stays beside the model.
      expect(entry.anova).not.toBeNull();
    }
    expect(report.explanation).toMatch(/model made for it.*classical analysis of variance stays beside it/);
  });
});
