import type { TrialDetail } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DemoLoaderService } from '../../src/demo/demo-loader.service';
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

  it('has a second, draft factorial trial', async () => {
    const trial = await Trial.findOne({ where: { code: 'FW-MULCH-27' } });
    expect(trial).toMatchObject({ status: 'draft', design: 'factorial-rcbd' });
    const detail = await t.app.get(TrialsService).get({ trialId: trial!.id, roles: ['investigator'], siteIds: [], adminReadOnly: false });
    expect(detail.treatments.map((x) => x.code)).toEqual(['W0', 'W5', 'W10', 'S0', 'S5', 'S10']);
    expect(detail.activation.problems).toEqual(['The trial needs at least one site.']);
  });
});
