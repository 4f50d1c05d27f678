import type { Findings, Observation } from '@friable/contracts';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FindingsCache } from '../../src/findings/findings-cache';
import { amendmentByMulch, buildFactorTrial, type FactorTrial } from '../designs/design-builder';
import { expectStatus } from '../protocol/protocol-builder';
import { createTestApp, patchCurrent, type TestApp } from '../support/test-app';
import { close, removeBundleFolders, runBundle } from './bundle-support';

type Row = { term: string; df: number; ss: number | null; f: number | null };

// Factorial and split-plot trials made, randomized and recorded through the API the way a collaborator does it:
// the site's CSV template downloaded, filled in and uploaded. Findings must give exactly what POST /api/stats/anova
// gives on the same data (the engine's numbers are checked against R in libs/stats and e2e/stats), and the
// analysis bundle's R script (aov with Error() strata, emmeans) must give Findings' numbers.
describe('Findings of factorial and split-plot trials, from the filled-in template to R', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    removeBundleFolders();
    await t.close();
  });

  /** Downloads the site's template for the round, fills the measure's column with value(row) and uploads it through Intake. */
  async function fillTemplate(trial: FactorTrial, siteId: number, value: (row: Record<string, string>, index: number) => string): Promise<string[]> {
    const template = await t.http.get(`${trial.base}/sites/${siteId}/rounds/${trial.roundId}/template.csv`).set(trial.auth);
    expect(template.status).toBe(200);
    const parsed = Papa.parse<Record<string, string>>(template.text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const column = parsed.meta.fields!.find((field) => field === 'crust resistance (kgf/cm2)')!;
    const filled = parsed.data.map((row, i) => ({ ...row, [column]: value(row, i) }));
    const csv = Papa.unparse({ fields: parsed.meta.fields!, data: filled.map((row) => parsed.meta.fields!.map((field) => row[field] ?? '')) });
    const upload = await t.http
      .post(`${trial.base}/sites/${siteId}/rounds/${trial.roundId}/intake`)
      .set(trial.auth)
      .attach('file', Buffer.from(csv), { filename: 'filled-template.csv', contentType: 'text/csv' });
    if (upload.status !== 200) expect.fail(`the filled template was refused (${upload.status}): ${JSON.stringify(upload.body)}`);
    return parsed.meta.fields!;
  }

  /** The stored values straight to the engine: each with its block and its treatment's factor levels. */
  async function direct(trial: FactorTrial, engineRequest: Findings['context']['engineRequest']) {
    const levelCode = new Map(trial.detail.factors.flatMap((f) => f.levels.map((l) => [l.id, { factor: f.name, code: l.code }] as const)));
    const factorsOf = new Map(trial.detail.treatments.map((tr) => [tr.code, Object.fromEntries(tr.factorLevelIds.map((id) => [levelCode.get(id)!.factor, levelCode.get(id)!.code]))]));
    const stored = ((await t.http.get(`${trial.base}/observations?measureId=${trial.measureId}`).set(trial.auth)).body as Observation[]).filter((o) => o.valueText !== null);
    const observations = stored.map((o) => ({ factors: factorsOf.get(o.treatmentCode)!, block: String(o.block), value: o.valueText! }));
    const response = await t.http.post('/api/stats/anova').set(trial.auth).send({ ...engineRequest, observations });
    expect(response.status).toBe(200);
    return { body: response.body as Findings, stored };
  }

  /** R's ANOVA rows equal Friable's: every SS (1e-8 relative), every F (1e-8 relative) — R: the bundle's aov / anova(lm). */
  function sameTable(r: Array<{ term: string; df: number; ss?: number; f: number | null }>, friable: Row[]) {
    const tested = friable.filter((row) => row.ss !== null && row.term !== 'total');
    expect(tested.length).toBeGreaterThan(3);
    for (const row of tested) {
      const fromR = r.find((rRow) => rRow.term === row.term);
      if (!fromR) expect.fail(`R's table has no row ${row.term}: ${r.map((rRow) => rRow.term).join(', ')}`);
      expect(fromR.df, row.term).toBe(row.df);
      close(fromR.ss!, row.ss!, 1e-8);
      if (row.f !== null) close(fromR.f!, row.f, 1e-8);
    }
  }

  it('a split plot: the template filled in and uploaded gives the split-plot ANOVA with its strata, equal to the stateless analysis and to R’s aov', async () => {
    const trial = await buildFactorTrial(t, { design: 'split-plot', seed: 'findings-split', factors: amendmentByMulch, sites: [{ name: 'Split Garden', labelPrefix: 'SG', blocks: 4 }] });
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { noControlReason: 'Comparing amendments only.' }), 200);
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { status: 'active' }), 200);
    // Invented values (test data only): compost lowers crust resistance, woodchip more so, with block spread.
    const codes = trial.detail.treatments.map((tr) => tr.code);
    const fields = await fillTemplate(trial, trial.siteIds['Split Garden']!, (row, i) =>
      (4 - codes.indexOf(row['treatment code']!) * 0.3 + ((Number(row.block) * 13 + i * 5) % 7) * 0.05).toFixed(2),
    );
    expect(fields.slice(0, 4)).toEqual(['plot label', 'block', 'whole plot', 'sub plot']);

    const response = await t.http.get(`${trial.base}/findings?measureId=${trial.measureId}`).set(trial.auth);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const { context, ...answer } = response.body as Findings;
    expect(context.engineRequest).toMatchObject({ design: 'split-plot', factorNames: ['Amendment', 'Mulch'] });
    expect(answer.model!.kind).toBe('anova');
    expect(answer.strata!.map((s) => s.errorTerm)).toEqual(['block:Amendment', 'error']);
    expect(answer.anova.find((r) => r.term === 'Amendment')!.errorTerm).toBe('block:Amendment');
    const { body, stored } = await direct(trial, context.engineRequest);
    expect(stored).toHaveLength(24);
    expect(answer.anova).toEqual(body.anova);
    expect(answer.strata).toEqual(body.strata);
    expect(answer.differences).toEqual(body.differences);
    expect(answer.marginalMeans).toEqual(body.marginalMeans);

    // The bundle: R's aov(value ~ Amendment * Mulch + Error(block/Amendment)) gives the same table, the same four
    // standard errors of a difference (the textbook formulas, as e2e/stats/designs checks them on Yates’s oats) and, by emmeans, the same level means.
    const token = trial.auth.Authorization.replace(/^Bearer /, '');
    const cache = t.app.get(FindingsCache);
    const before = { ...cache.counts };
    const { friable, r, csv } = await runBundle<Findings>(t, token, `${trial.base}/findings/bundle?measureId=${trial.measureId}`);
    // The bundle is the answer Findings gave, from its cache: nothing computed again.
    expect(cache.counts).toEqual({ hits: before.hits + 1, misses: before.misses });
    expect(friable).toEqual(response.body);
    expect(csv.split('\n')[0]).toBe('treatment,Amendment,Mulch,block,value,censored,plot');
    sameTable(r.anova as Array<{ term: string; df: number; ss: number; f: number | null }>, answer.anova);
    const differences = r.differences as Array<{ kind: string; se: number }>;
    for (const difference of answer.differences!) close(differences.find((d) => d.kind === difference.kind)!.se, difference.se, 1e-8);
    sameMeans(r.factorMeans as FactorMeanRow[], answer.marginalMeans!, ['Amendment', 'Mulch']);
  }, 240_000);

  it('a split plot with a plot not measured is fitted by REML, and the bundle’s lme4 + pbkrtest script gives its Kenward–Roger tests and means', async () => {
    const trial = await buildFactorTrial(t, { design: 'split-plot', seed: 'findings-split-reml', factors: amendmentByMulch, sites: [{ name: 'Gap Garden', labelPrefix: 'GG', blocks: 4 }] });
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { noControlReason: 'Comparing amendments only.' }), 200);
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { status: 'active' }), 200);
    // Invented values (test data only), one plot left blank (not measured).
    const codes = trial.detail.treatments.map((tr) => tr.code);
    await fillTemplate(trial, trial.siteIds['Gap Garden']!, (row, i) => (i === 5 ? '' : (4 - codes.indexOf(row['treatment code']!) * 0.3 + ((Number(row.block) * 13 + i * 5) % 7) * 0.05).toFixed(2)));
    const response = await t.http.get(`${trial.base}/findings?measureId=${trial.measureId}`).set(trial.auth);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const answer = response.body as Findings;
    expect(answer.model!.kind).toBe('reml');
    const token = trial.auth.Authorization.replace(/^Bearer /, '');
    const { friable, r } = await runBundle<Findings>(t, token, `${trial.base}/findings/bundle?measureId=${trial.measureId}`);
    expect(friable).toEqual(response.body);
    // R: KRmodcomp(lmer(value ~ Amendment * Mulch + (1 | block) + (1 | block:Amendment)), L)$test per term, contr.sum —
    // F and denominator df 1e-5 relative (both iterate REML to convergence), as e2e/stats/designs checks on its fixtures.
    const tests = answer.anova.filter((row) => row.numDf !== undefined && row.numDf !== null);
    expect(tests.map((row) => row.term)).toEqual(['Amendment', 'Mulch', 'Amendment:Mulch']);
    for (const row of tests) {
      const fromR = (r.anova as Array<{ term: string; numDf: number; denDf: number; f: number }>).find((rRow) => rRow.term === row.term)!;
      expect(fromR.numDf, row.term).toBe(row.numDf);
      close(fromR.denDf, row.denDf!, 1e-5);
      close(fromR.f, row.f!, 1e-5);
    }
    // emmeans(fit, ~ factor) on the same fit — 1e-6 relative (the means weigh the plots by the fitted variances).
    for (const name of ['Amendment', 'Mulch']) {
      for (const mean of answer.marginalMeans!.find((m) => m.term === name)!.means) {
        close((r.factorMeans as FactorMeanRow[]).find((row) => row.term === name && row.level === mean.levels[name])!.emmean, mean.mean, 1e-6);
      }
    }
  }, 240_000);

  it('a split plot at two sites (sites random, a plot not measured): the bundle’s lme4 script with site × factor terms gives Findings’ tests', async () => {
    const trial = await buildFactorTrial(t, {
      design: 'split-plot',
      seed: 'findings-split-sites',
      factors: amendmentByMulch,
      sites: [
        { name: 'East Plot Garden', labelPrefix: 'EP', blocks: 3 },
        { name: 'West Plot Garden', labelPrefix: 'WP', blocks: 3 },
      ],
    });
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { noControlReason: 'Comparing amendments only.' }), 200);
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { status: 'active' }), 200);
    // Invented values (test data only): the west garden runs higher; one east plot left blank.
    const codes = trial.detail.treatments.map((tr) => tr.code);
    for (const [site, shift] of [['East Plot Garden', 0], ['West Plot Garden', 0.6]] as const) {
      await fillTemplate(trial, trial.siteIds[site]!, (row, i) =>
        shift === 0 && i === 4 ? '' : (4 + shift - codes.indexOf(row['treatment code']!) * 0.25 + ((Number(row.block) * 11 + i * 7) % 5) * 0.06).toFixed(2),
      );
    }
    const response = await t.http.get(`${trial.base}/findings?measureId=${trial.measureId}&analysis=anova`).set(trial.auth);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const answer = response.body as Findings;
    expect(answer.context.engineRequest).toMatchObject({ design: 'multisite-split-plot' });
    expect(answer.model!.kind).toBe('reml');
    // Two sites leave the whole-plot comparisons under one Kenward–Roger degree of freedom: given without tests, said in words.
    expect(answer.warnings.join(' ')).toMatch(/The [^.]+ means are not compared: their differences have 0\.\d+ degrees of freedom \(.+\), fewer than one/);
    const token = trial.auth.Authorization.replace(/^Bearer /, '');
    const { r, csv } = await runBundle<Findings>(t, token, `${trial.base}/findings/bundle?measureId=${trial.measureId}&analysis=anova`);
    expect(csv.split('\n')[0]).toContain('site');
    // R: KRmodcomp(lmer(value ~ Amendment * Mulch + (1 | site) + (1 | site:Amendment) + (1 | site:Mulch) +
    // (1 | site:Amendment:Mulch) + (1 | site:block) + (1 | site:block:Amendment)), L)$test — 1e-4 relative (a fit with
    // variance components at the boundary converges less tightly).
    const tests = answer.anova.filter((row) => row.numDf !== undefined && row.numDf !== null);
    expect(tests.map((row) => row.term)).toEqual(['Amendment', 'Mulch', 'Amendment:Mulch']);
    for (const row of tests) {
      const fromR = (r.anova as Array<{ term: string; numDf: number; denDf: number; f: number }>).find((rRow) => rRow.term === row.term)!;
      expect(fromR.numDf, row.term).toBe(row.numDf);
      close(fromR.f, row.f!, 1e-4);
    }
  }, 240_000);

  it('a three-factor factorial in blocks: the template filled in and uploaded, then R’s anova(lm) on the bundle gives every main effect and interaction', async () => {
    const factors = [...amendmentByMulch, { name: 'Depth', levels: [{ code: 'S', name: 'Shallow' }, { code: 'D', name: 'Deep' }] }];
    const trial = await buildFactorTrial(t, { design: 'factorial-rcbd', seed: 'findings-three', factors, sites: [{ name: 'Three Garden', labelPrefix: 'THG', blocks: 3 }] });
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { noControlReason: 'Comparing amendments only.' }), 200);
    await expectStatus(patchCurrent(t, trial.base, trial.auth, { status: 'active' }), 200);
    // Invented values (test data only): each factor moves the value, depth more with compost, with block spread.
    const levels = new Map(trial.detail.treatments.map((tr) => [tr.code, tr.factorLevelIds]));
    await fillTemplate(trial, trial.siteIds['Three Garden']!, (row, i) => {
      const ids = levels.get(row['treatment code']!)!;
      return (3 + (ids[0]! % 3) * 0.4 + (ids[1]! % 2) * 0.3 + (ids[2]! % 2) * (0.2 + (ids[0]! % 3) * 0.15) + ((Number(row.block) * 11 + i * 7) % 5) * 0.07).toFixed(2);
    });
    const response = await t.http.get(`${trial.base}/findings?measureId=${trial.measureId}&analysis=anova`).set(trial.auth);
    if (response.status !== 200) expect.fail(`findings answered ${response.status}: ${JSON.stringify(response.body)}`);
    const { context, ...answer } = response.body as Findings;
    expect(context.engineRequest).toMatchObject({ design: 'factorial-rcbd', factorNames: ['Amendment', 'Mulch', 'Depth'] });
    expect(answer.model!.kind).toBe('anova');
    const { body, stored } = await direct(trial, context.engineRequest);
    expect(stored).toHaveLength(36);
    expect(answer.anova).toEqual(body.anova);
    expect(answer.anova.map((row) => row.term)).toEqual(expect.arrayContaining(['block', 'Amendment', 'Mulch', 'Depth', 'Amendment:Mulch', 'Amendment:Depth', 'Mulch:Depth', 'Amendment:Mulch:Depth', 'error']));

    // R: anova(lm(value ~ block + Amendment * Mulch * Depth)) and emmeans(fit, ~ factor) — 1e-8 relative.
    const token = trial.auth.Authorization.replace(/^Bearer /, '');
    const { friable, r } = await runBundle<Findings>(t, token, `${trial.base}/findings/bundle?measureId=${trial.measureId}&analysis=anova`);
    expect(friable).toEqual(response.body);
    sameTable(r.anova as Array<{ term: string; df: number; ss: number; f: number | null }>, answer.anova);
    sameMeans(r.factorMeans as FactorMeanRow[], answer.marginalMeans!, ['Amendment', 'Mulch', 'Depth']);
  }, 240_000);
});

type FactorMeanRow = { term: string; level: string; emmean: number };

/** Each factor's level means from R's emmeans equal Friable's marginal means (1e-8 relative). */
function sameMeans(r: FactorMeanRow[], friable: NonNullable<Findings['marginalMeans']>, factorNames: string[]) {
  for (const name of factorNames) {
    const term = friable.find((m) => m.term === name)!;
    expect(term.means.length).toBeGreaterThan(1);
    for (const mean of term.means) close(r.find((row) => row.term === name && row.level === mean.levels[name])!.emmean, mean.mean, 1e-8);
  }
}
