import type { Measure, Plot, PlotAmount, Site, Treatment, TrialDetail } from '@friable/contracts';
import { computeDose, parseUnitFromHeader, trialTotal } from '@friable/field';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ActivityEntryRow } from '../../src/activity/models/activity-entry.model';
import { PlotRow } from '../../src/plots/models/plot.model';
import { SiteRow } from '../../src/sites/models/site.model';
import { TreatmentRow } from '../../src/treatments/models/treatment.model';
import { Trial } from '../../src/trials/models/trial.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp, patchCurrent } from '../support/test-app';
import { expectStatus, uniqueCode } from './protocol-builder';

describe('a full protocol built through the API', () => {
  let t: TestApp;
  let auth: { Authorization: string };
  let base: string;
  let trialId: number;
  const treatment: Record<string, Treatment> = {};
  const measure: Record<string, Measure> = {};
  const site: Record<string, Site> = {};
  let roundId: number;

  beforeAll(async () => {
    t = await createTestApp();
    auth = bearer(await tokenFor(t, await createPerson({ name: 'Protocol lead' })));
    const created = await expectStatus<{ id: number }>(
      t.http.post('/api/trials').set(auth).send({
        code: uniqueCode('FP'),
        title: 'Amendments on clay, full protocol',
        design: 'rcbd',
        question: 'Does gypsum make clay drain faster?',
        startDate: '2026-04-06',
        seed: 'full-protocol-seed',
        safetyNotes: 'Gloves for gypsum.',
      }),
      201,
    );
    trialId = created.id;
    base = `/api/trials/${trialId}`;
  });
  afterAll(() => t.close());

  it('adds treatments including a control, writing the DECIMAL rate as typed', async () => {
    for (const body of [
      { code: 'CTL', name: 'Untreated control', isControl: true },
      { code: 'GYP', name: 'Gypsum 40 lb/1000 ft²', rateValue: 40, rateUnit: 'lb/1000ft2', rateBasis: 'area', product: 'Garden gypsum', purity: 0.8, materialKind: 'gypsum' },
      { code: 'CMP', name: 'Compost 1 in', rateValue: 1, rateUnit: 'in', rateBasis: 'area' },
      { code: 'SHL', name: 'Shale 2 cm', rateValue: 2, rateUnit: 'cm' },
      { code: 'LFM', name: 'Leaf mould 5 t/ha dry', rateValue: 5, rateUnit: 't/ha', moistureBasis: 'dry', moistureFraction: 0.4 },
    ]) {
      const answer = await expectStatus<Treatment>(t.http.post(`${base}/treatments`).set(auth).send(body), 201);
      expect(answer).toMatchObject({ ...body, rateBasis: body.rateBasis ?? 'area', factorLevelIds: [] });
      treatment[body.code] = answer;
    }
    const row = await TreatmentRow.findByPk(treatment.GYP.id);
    expect(Number(row?.get('rateValue'))).toBe(40);
    expect(Number(row?.get('purity'))).toBe(0.8);
    const columns = await t.sequelize.getQueryInterface().describeTable('treatments');
    expect(columns.rate_value.type).toBe('DECIMAL(14,4)');
    expect((await t.http.get(`${base}/treatments`).set(auth)).body.map((x: Treatment) => x.code)).toEqual(['CTL', 'GYP', 'CMP', 'SHL', 'LFM']);
  });

  it('adds one measure of each kind', async () => {
    for (const body of [
      { code: 'DRAIN', name: 'drain time', unit: 's', kind: 'time-with-cutoff', cutoff: 600, plausibleMin: 5, plausibleMax: 600, hardMin: 0, hardMax: 3600, decimals: 0, higherIsBetter: false },
      { code: 'CRUMB', name: 'crumble score', unit: 'score', kind: 'score', higherIsBetter: true, scaleMin: 1, scaleMax: 5, decimals: 0 },
      { code: 'WORMS', name: 'earthworms', unit: 'count', kind: 'count', higherIsBetter: true, hardMin: 0, decimals: 0 },
      { code: 'CRUST', name: 'crust resistance', unit: 'kgf/cm2', kind: 'continuous', plausibleMin: 0.2, plausibleMax: 4.5, decimals: 2, higherIsBetter: false },
    ]) {
      const answer = await expectStatus<Measure>(t.http.post(`${base}/measures`).set(auth).send(body), 201);
      expect(answer).toMatchObject(body);
      measure[body.code] = answer;
    }
  });

  it('adds rounds whose due date is the start date plus the offset', async () => {
    const day0 = await expectStatus<{ id: number; dueDate: string }>(
      t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 0', dayOffset: 0, measureIds: [measure.DRAIN.id, measure.CRUMB.id, measure.WORMS.id, measure.CRUST.id] }),
      201,
    );
    roundId = day0.id;
    expect(day0.dueDate).toBe('2026-04-06');
    const day28 = await expectStatus<{ dueDate: string; measureIds: number[] }>(
      t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 28', dayOffset: 28, measureIds: [measure.DRAIN.id] }),
      201,
    );
    // 6 April 2026 + 28 days = 4 May 2026 (calendar arithmetic).
    expect(day28).toMatchObject({ dueDate: '2026-05-04', measureIds: [measure.DRAIN.id] });
  });

  it('adds two sites with their areas and guardrail warnings', async () => {
    const hollow = await expectStatus<Site>(
      t.http.post(`${base}/sites`).set(auth).send({ name: 'Hollow Lane', shape: 'rectangle', lengthM: 1.2, widthM: 1.2, blocks: 4, labelPrefix: 'HL' }),
      201,
    );
    expect(hollow.areaM2).toBeCloseTo(1.44, 12);
    // 5 treatments × 4 blocks: (5−1)(4−1) = 12 error df, 4 blocks: no warning (DOMAIN.md design rules of thumb).
    expect(hollow.warnings).toEqual([]);
    const pots = await expectStatus<Site>(
      t.http.post(`${base}/sites`).set(auth).send({ name: 'Quarry Pots', shape: 'round', diameterCm: 30, containerDepthCm: 25, blocks: 3 }),
      201,
    );
    // π (0.15 m)² = 0.0706858… m² (plotSurfaceAreaM2 doc example).
    expect(pots.areaM2).toBeCloseTo(0.07068583470577035, 12);
    expect(pots.labelPrefix).toBe('QP');
    expect(pots.warnings).toEqual([
      '3 blocks per site is fewer than the 4 replicates the PNW on-farm testing guide recommends.',
      '5 treatments × 3 blocks leave 8 error degrees of freedom at the site, fewer than the 12 EPPO PP 1/152 asks for; 4 blocks would give 12.',
    ]);
    site.HL = hollow;
    site.QP = pots;
  });

  it('says in words what stops activation before randomizing', async () => {
    const detail = await expectStatus<TrialDetail>(t.http.get(base).set(auth), 200);
    expect(detail.activation).toEqual({
      ready: false,
      problems: ['Site Hollow Lane is not randomized yet.', 'Site Quarry Pots is not randomized yet.'],
      // The sites' guardrails are read before the trial starts, without stopping it.
      warnings: detail.sites.flatMap((s) => s.warnings.map((w) => `${s.name}: ${w}`)),
    });
    expect(detail.activation.warnings).toContain(
      'Quarry Pots: 5 treatments × 3 blocks leave 8 error degrees of freedom at the site, fewer than the 12 EPPO PP 1/152 asks for; 4 blocks would give 12.',
    );
    const refused = await patchCurrent(t, base, auth, { status: 'active' });
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([
      { field: 'status', message: 'Site Hollow Lane is not randomized yet.' },
      { field: 'status', message: 'Site Quarry Pots is not randomized yet.' },
    ]);
    expect((await Trial.findByPk(trialId))?.status).toBe('draft');
  });

  it('randomizes both sites: every treatment once in every block', async () => {
    for (const s of Object.values(site)) {
      const answer = await expectStatus<Site>(t.http.post(`${base}/sites/${s.id}/randomize`).set(auth).send({}), 200);
      expect(answer).toMatchObject({ plotCount: 5 * s.blocks, randomizationSeed: 'full-protocol-seed' });
    }
    const plots = await expectStatus<Plot[]>(t.http.get(`${base}/plots?siteId=${site.HL.id}`).set(auth), 200);
    expect(plots).toHaveLength(20);
    for (let block = 1; block <= 4; block += 1) {
      expect(plots.filter((p) => p.block === block).map((p) => p.treatmentCode).sort()).toEqual(['CMP', 'CTL', 'GYP', 'LFM', 'SHL']);
    }
    expect(plots[0]).toMatchObject({ label: 'HL-B1-P01', siteName: 'Hollow Lane', block: 1, position: 1 });
    expect(await PlotRow.count({ where: { trialId } })).toBe(35);
    const all = await expectStatus<Plot[]>(t.http.get(`${base}/plots`).set(auth), 200);
    expect(all).toHaveLength(35);
  });

  it('serves the data-entry CSV of a site and round exactly', async () => {
    const response = await t.http.get(`${base}/sites/${site.HL.id}/rounds/${roundId}/template.csv`).set(auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="FP-[A-Z0-9]+-HL-Day-0\.csv"$/);
    const plots = (await t.http.get(`${base}/plots?siteId=${site.HL.id}`).set(auth)).body as Plot[];
    const expected =
      'plot label,block,treatment code,drain time (s),crumble score (score),earthworms (count),crust resistance (kgf/cm2),missing reason,notes\r\n' +
      plots.map((p) => `${p.label},${p.block},${p.treatmentCode},,,,,,\r\n`).join('');
    expect(response.text).toBe(expected);
    // The upload reads each measure column's unit back from its header.
    const headers = response.text.split('\r\n')[0].split(',').slice(3, 7);
    expect(headers.map((h) => parseUnitFromHeader(h).unitId)).toEqual(['s', 'score', 'count', 'kgf/cm2']);
  });

  it('gives per-plot amounts equal to computeDose for the same inputs, and site totals from trialTotal', async () => {
    const amounts = await expectStatus<PlotAmount[]>(t.http.get(`${base}/amounts`).set(auth), 200);
    expect(amounts).toHaveLength(10);
    const find = (siteId: number, code: string) => amounts.find((a) => a.siteId === siteId && a.treatmentCode === code) as PlotAmount;
    expect(find(site.HL.id, 'CTL')).toMatchObject({ plots: 4, perPlot: null, siteTotal: null });

    const gypsum = find(site.HL.id, 'GYP');
    const expected = computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { lengthM: 1.2, widthM: 1.2 }, purity: 0.8, materialKind: 'gypsum' });
    expect(gypsum.perPlot?.grams).toBeCloseTo(expected.grams as number, 9);
    // By hand from NIST SP 811 factors: 40 lb/1000 ft² = 195.297 g/m² (DOMAIN.md); × 1.44 m² ÷ 0.8 purity = 351.53 g.
    expect(gypsum.perPlot?.grams).toBeCloseTo(351.535, 2);
    expect(gypsum.siteTotal?.grams).toBeCloseTo(trialTotal({ dosePerPlotGrams: expected.grams as number, plots: 4, marginPercent: 10 }).grams, 9);

    const compostPot = find(site.QP.id, 'CMP');
    const compost = computeDose({ rate: 1, unit: 'in', basis: 'area', geometry: { diameterCm: 30 } });
    expect(compostPot.perPlot?.litres).toBeCloseTo(compost.litres as number, 12);
    // 1 in = 25.4 L/m² × 0.0706858 m² = 1.7954 L (DOMAIN.md: 1 cm over 1 m² = 10 L).
    expect(compostPot.perPlot?.litres).toBeCloseTo(1.79542, 4);
    expect(compostPot.perPlot?.grams).toBeNull();
    expect(compostPot.siteTotal?.litres).toBeCloseTo((compost.litres as number) * 3 * 1.1, 12);

    const leaf = find(site.HL.id, 'LFM');
    const leafDose = computeDose({ rate: 5, unit: 't/ha', basis: 'area', geometry: { lengthM: 1.2, widthM: 1.2 }, moistureFraction: 0.4 });
    expect(leaf.perPlot?.grams).toBeCloseTo(leafDose.grams as number, 9);
    // 5 t/ha = 500 g/m² × 1.44 m² ÷ (1 − 0.4) = 1200 g (arithmetic).
    expect(leaf.perPlot?.grams).toBeCloseTo(1200, 9);

    const noMargin = await expectStatus<PlotAmount[]>(t.http.get(`${base}/amounts?marginPercent=0`).set(auth), 200);
    const gypsumNet = noMargin.find((a) => a.siteId === site.HL.id && a.treatmentCode === 'GYP');
    expect(gypsumNet?.siteTotal?.grams).toBeCloseTo((expected.grams as number) * 4, 9);
  });

  it('activates once every check passes, and records it', async () => {
    const detail = await expectStatus<TrialDetail>(patchCurrent(t, base, auth, { status: 'active' }), 200);
    expect(detail).toMatchObject({ status: 'active', activation: { ready: true, problems: [] }, question: 'Does gypsum make clay drain faster?', seed: 'full-protocol-seed' });
    expect(detail.treatments).toHaveLength(5);
    expect(detail.measures).toHaveLength(4);
    expect(detail.rounds).toHaveLength(2);
    expect(detail.sites.map((s) => s.plotCount)).toEqual([20, 15]);
    expect((await Trial.findByPk(trialId))?.status).toBe('active');
    expect(await ActivityEntryRow.count({ where: { trialId, kind: 'trial.status-changed' } })).toBe(1);
  });

  it('clears the layouts an edit invalidates and says so in the activation checks', async () => {
    // Adding a treatment clears every site that has no observations (none yet have any).
    await expectStatus(t.http.post(`${base}/treatments`).set(auth).send({ code: 'EXTRA', name: 'Extra treatment' }), 201);
    expect(await PlotRow.count({ where: { trialId } })).toBe(0);
    const cleared = await ActivityEntryRow.findAll({ where: { trialId, kind: 'site.layout-cleared' } });
    expect(cleared.map((e) => e.siteId).sort()).toEqual([site.HL.id, site.QP.id].sort());
    expect(cleared[0].summary).toMatch(/^Adding treatment EXTRA cleared the plot layout of .+; randomize the site again\.$/);
    const detail = await expectStatus<TrialDetail>(t.http.get(base).set(auth), 200);
    expect(detail.activation.problems).toEqual(['Site Hollow Lane is not randomized yet.', 'Site Quarry Pots is not randomized yet.']);

    // Changing the blocks of one site clears that site only.
    for (const s of Object.values(site)) await expectStatus(t.http.post(`${base}/sites/${s.id}/randomize`).set(auth).send({}), 200);
    await expectStatus(patchCurrent(t, `${base}/sites/${site.QP.id}`, auth, { blocks: 4 }), 200);
    expect(await PlotRow.count({ where: { siteId: site.HL.id } })).toBe(24);
    expect(await PlotRow.count({ where: { siteId: site.QP.id } })).toBe(0);
    expect((await SiteRow.findByPk(site.QP.id))?.randomizedAt).toBeNull();

    // Removing a treatment clears the layouts again, then the row goes.
    const extra = (await TreatmentRow.findOne({ where: { trialId, code: 'EXTRA' } }))!;
    const removed = await t.http.delete(`${base}/treatments/${extra.id}`).set(auth);
    expect(removed.status).toBe(204);
    expect(await TreatmentRow.count({ where: { trialId } })).toBe(5);
    expect(await PlotRow.count({ where: { trialId } })).toBe(0);
  });
});
