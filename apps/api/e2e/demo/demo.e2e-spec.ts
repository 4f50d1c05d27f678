import type { TrialDetail } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DemoLoaderService } from '../../src/demo/demo-loader.service';
import { PlotsService } from '../../src/plots/plots.service';
import { TrialsService } from '../../src/trials/trials.service';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { User } from '../../src/users/models/user.model';
import { createTestApp, type TestApp } from '../support/test-app';

describe('the demo scenario', () => {
  let t: TestApp;
  let loader: DemoLoaderService;
  // Every table the API's models map, whatever feature added it.
  const rowCounts = async () => Object.fromEntries(await Promise.all(Object.values(t.sequelize.models).map(async (model) => [model.tableName, await model.count()])));

  beforeAll(async () => {
    t = await createTestApp();
    loader = t.app.get(DemoLoaderService);
  });
  afterAll(() => t.close());

  it('loads idempotently: a second load changes no row count', async () => {
    await loader.load('friable-demo');
    const once = await rowCounts();
    const again = await loader.load('friable-demo');
    expect(again).toEqual({ created: 0, protocols: [] });
    expect(await rowCounts()).toEqual(once);
  });

  it('has FW-CLAY-26 as trial 1, active, passing its activation checks', async () => {
    const trial = await Trial.findOne({ where: { code: 'FW-CLAY-26' } });
    expect(trial).toMatchObject({ id: 1, title: 'Heavy-clay amendments across three Fernwick gardens', status: 'active', seed: 'fernwick-clay-2026' });
    const detail: TrialDetail = await t.app.get(TrialsService).get({ trialId: 1, roles: ['investigator'], siteIds: [], adminReadOnly: false });
    expect(detail.activation).toEqual({ ready: true, problems: [], warnings: [] });
    expect(detail.treatments.map((x) => x.code)).toEqual(['CTL', 'GYP', 'CMP', 'SHL', 'LFM']);
    expect(detail.treatments.filter((x) => x.isControl).map((x) => x.code)).toEqual(['CTL']);
    expect(detail.measures.map((m) => [m.code, m.kind, m.unit])).toEqual([
      ['DRAIN', 'time-with-cutoff', 's'],
      ['CRUMB', 'score', 'score'],
      ['WATER', 'continuous', 'mL'],
      ['CRUST', 'continuous', 'kgf/cm2'],
    ]);
    expect(detail.measures[0].cutoff).toBe(600);
    expect(detail.rounds.map((r) => [r.label, r.dayOffset, r.dueDate])).toEqual([
      ['Day 0', 0, '2026-04-06'],
      ['Day 14', 14, '2026-04-20'],
      ['Day 28', 28, '2026-05-04'],
    ]);
    expect(detail.sites.map((s) => [s.name, s.blocks, s.plotCount, s.randomizationSeed])).toEqual([
      ['Hollow Lane Community Garden', 5, 25, 'fernwick-clay-2026'],
      ['Millbrook Allotments', 4, 20, 'fernwick-clay-2026'],
      ['Quarry Hill Garden', 5, 25, 'fernwick-clay-2026'],
    ]);
    const leads = await Promise.all(detail.sites.map(async (s) => (await User.findByPk(s.leadUserId ?? 0))?.email));
    expect(leads).toEqual(['hollow.lane@example.org', 'millbrook@example.org', 'quarry.hill@example.org']);
    for (const site of detail.sites) {
      const membership = await TrialMembership.findOne({ where: { trialId: 1, userId: site.leadUserId, role: 'collaborator' } });
      expect(membership?.siteId).toBe(site.id);
    }
  });

  it('has a second, draft trial: a split plot at two gardens, compost on whole beds and mulch on bed thirds', async () => {
    const trial = await Trial.findOne({ where: { code: 'FW-MULCH-27' } });
    expect(trial).toMatchObject({ status: 'draft', design: 'split-plot' });
    const detail = await t.app.get(TrialsService).get({ trialId: trial!.id, roles: ['investigator'], siteIds: [], adminReadOnly: false });
    expect(detail.factors.map((f) => [f.name, f.appliedTo, f.levels.map((l) => l.code)])).toEqual([
      ['Compost', 'whole plot', ['N', 'C']],
      ['Mulch', 'sub plot', ['B', 'S', 'W']],
    ]);
    expect(detail.treatments.map((x) => x.code)).toEqual(['NB', 'NS', 'NW', 'CB', 'CS', 'CW']);
    expect(detail.sites.map((s) => [s.name, s.blocks, s.plotCount])).toEqual([
      ['Cinder Path Beds', 4, 24],
      ['Larkspur Close Allotments', 2, 12],
    ]);
    // Whole-plot error (2 blocks − 1) × (2 compost levels − 1) = 1: said plainly before the trial starts.
    const sentence = detail.activation.warnings.find((w) => w.startsWith('Larkspur Close Allotments: A split plot with 2 blocks has only 1 degree of freedom for whole-plot error'));
    expect(sentence).toBeDefined();
    expect(detail.activation).toMatchObject({ ready: true, problems: [] });

    const plots = await t.app.get(PlotsService).list(trial!.id, detail.sites[1]!.id);
    // 2 blocks × 2 whole plots × 3 sub plots, each whole plot holding one sub plot of every mulch.
    expect(new Set(plots.map((p) => p.wholePlotLabel))).toEqual(new Set(['LC-B1-W1', 'LC-B1-W2', 'LC-B2-W1', 'LC-B2-W2']));
    for (const wholePlot of new Set(plots.map((p) => p.wholePlotLabel))) {
      const inside = plots.filter((p) => p.wholePlotLabel === wholePlot);
      expect(new Set(inside.map((p) => p.treatmentCode[0])).size).toBe(1);
      expect(inside.map((p) => p.treatmentCode[1]).sort()).toEqual(['B', 'S', 'W']);
      expect(inside.map((p) => p.subPlot).sort()).toEqual([1, 2, 3]);
    }

    // Compost 2.5 cm on a whole plot of 3 sub plots × 1.2 m² = 3.6 m²: 90 L (1 cm over 1 m² = 10 L, DOMAIN.md); straw 5 cm on one 1.2 m² sub plot: 60 L.
    const amounts = await t.app.get(PlotsService).levelAmounts(trial!.id, 0);
    const cinder = (code: string) => amounts.find((a) => a.siteId === detail.sites[0]!.id && a.levelCode === code)!;
    expect([cinder('C').appliedTo, cinder('C').plotsPerUnit, cinder('C').units]).toEqual(['whole plot', 3, 4]);
    expect(cinder('C').unitAreaM2).toBeCloseTo(3.6, 10);
    expect(cinder('C').perUnit?.litres).toBeCloseTo(90, 9);
    expect([cinder('S').appliedTo, cinder('S').plotsPerUnit, cinder('S').units]).toEqual(['sub plot', 1, 8]);
    expect(cinder('S').perUnit?.litres).toBeCloseTo(60, 9);
  });
});
