import type { ActivityEntry, Factor, LevelAmount, Plot, Site, Treatment, TrialDetail } from '@friable/contracts';
import { computeDose, randomizeSite } from '@friable/field';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FactorLevel } from '../../src/factors/models/factor-level.model';
import { PlotRow } from '../../src/plots/models/plot.model';
import { TreatmentRow } from '../../src/treatments/models/treatment.model';
import { expectStatus } from '../protocol/protocol-builder';
import { createTestApp, type TestApp, patchCurrent, putFactorsCurrent } from '../support/test-app';
import { amendmentByMulch, buildFactorTrial, type FactorTrial } from './design-builder';

/** The split-plot restriction, read from the stored rows: in each block one whole plot per amendment, each holding one sub plot per mulch. */
function splitRestrictionBroken(plots: Plot[], levelsOf: Map<number, string[]>): string | null {
  const wholePlots = new Map<string, Plot[]>();
  for (const plot of plots) wholePlots.set(`${plot.siteId}/${plot.block}/${plot.wholePlot}`, [...(wholePlots.get(`${plot.siteId}/${plot.block}/${plot.wholePlot}`) ?? []), plot]);
  const perBlock = new Map<string, string[]>();
  for (const [key, members] of wholePlots) {
    const amendments = new Set(members.map((p) => levelsOf.get(p.treatmentId)![0]));
    if (amendments.size !== 1) return `whole plot ${key} holds ${[...amendments].join(' and ')}`;
    const mulches = members.map((p) => levelsOf.get(p.treatmentId)![1]).sort();
    if (mulches.join() !== '0,W') return `whole plot ${key} holds the mulches ${mulches.join(', ')}`;
    if (members.map((p) => p.subPlot).sort().join() !== '1,2') return `whole plot ${key} has sub plots ${members.map((p) => p.subPlot).join(', ')}`;
    const block = key.split('/').slice(0, 2).join('/');
    perBlock.set(block, [...(perBlock.get(block) ?? []), [...amendments][0]!]);
  }
  for (const [block, amendments] of perBlock) if (amendments.sort().join() !== 'C,G,K') return `block ${block} holds the amendments ${amendments.join(', ')}`;
  return null;
}

describe('split-plot and factorial designs through the API', () => {
  let t: TestApp;
  let split: FactorTrial;

  beforeAll(async () => {
    t = await createTestApp();
    split = await buildFactorTrial(t, {
      design: 'split-plot',
      seed: 'split-e2e-1',
      factors: amendmentByMulch,
      sites: [
        { name: 'Hollow Lane', labelPrefix: 'HL', blocks: 4 },
        { name: 'Quarry Hill', labelPrefix: 'QH', blocks: 2 },
      ],
    });
  });
  afterAll(() => t.close());

  it('keeps the factors in order with where each is applied, the levels with their rates, and the six combinations as treatments', async () => {
    const { factors, treatments } = split.detail;
    expect(factors.map((f) => [f.position, f.name, f.appliedTo, f.levels.map((l) => l.code).join('')])).toEqual([
      [1, 'Amendment', 'whole plot', 'CGK'],
      [2, 'Mulch', 'sub plot', '0W'],
    ]);
    expect(factors[0]!.levels[1]).toMatchObject({ code: 'G', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum', product: 'Garden gypsum' });
    expect(factors[0]!.levels[0]).toMatchObject({ code: 'C', rateValue: null, rateUnit: null });
    expect(treatments.map((x) => x.code)).toEqual(['C0', 'CW', 'G0', 'GW', 'K0', 'KW']);
    expect(treatments.map((x) => x.name)[3]).toBe('Gypsum × Woodchip 5 cm');
    expect(treatments[0]!.isControl).toBe(true);
    // The rows written: the rate as typed on the level, the combination's two level ids.
    const gypsum = await FactorLevel.findByPk(factors[0]!.levels[1]!.id);
    expect(Number(gypsum?.rateValue)).toBe(40);
    const gw = await TreatmentRow.findOne({ where: { trialId: split.trialId, code: 'GW' } });
    expect([gw?.factorLevelAId, gw?.factorLevelBId, gw?.factorLevelCId]).toEqual([factors[0]!.levels[1]!.id, factors[1]!.levels[1]!.id, null]);
  });

  it('shows each site\'s error strata and says plainly how few df of whole-plot error 2 blocks leave', async () => {
    const quarry = split.detail.sites.find((s) => s.name === 'Quarry Hill')!;
    // (2 blocks − 1) × (3 amendments − 1) = 2; sub-plot error 3 × (2 − 1) × (2 − 1) = 3 (R: aov(y ~ A*B + Error(block/A))).
    expect(quarry.strata.map((s) => [s.name, s.errorDf, s.terms])).toEqual([
      ['Whole-plot error', 2, ['Amendment']],
      ['Sub-plot error', 3, ['Mulch', 'Amendment:Mulch']],
    ]);
    expect(quarry.warnings).toContain(
      'A split plot with 2 blocks has only 2 degrees of freedom for whole-plot error at the site ((2 blocks − 1) × (3 levels of Amendment − 1)), fewer than the 12 EPPO PP 1/152 asks for. ' +
        'Amendment is tested against it: at p = 0.05 the F of Amendment must exceed 19.0, so only a very large difference could show. 7 blocks would give 12.',
    );
    expect(split.detail.activation.warnings).toContain(`Quarry Hill: ${quarry.warnings[1]}`);
    expect(split.detail.activation).toMatchObject({ ready: true, problems: [] });
  });

  it('a split plot in 2 blocks with 2 whole-plot levels: 1 df of whole-plot error, on the site and in the activation check', async () => {
    const small = await buildFactorTrial(t, {
      design: 'split-plot',
      seed: 'two-blocks',
      factors: [
        { name: 'Amendment', levels: [{ code: 'C', name: 'None' }, { code: 'G', name: 'Gypsum' }] },
        { name: 'Mulch', levels: [{ code: '0', name: 'Bare' }, { code: 'W', name: 'Woodchip' }] },
      ],
      sites: [{ name: 'Tiny Garden', labelPrefix: 'TG', blocks: 2 }],
      randomize: false,
    });
    const sentence =
      'A split plot with 2 blocks has only 1 degree of freedom for whole-plot error at the site ((2 blocks − 1) × (2 levels of Amendment − 1)), fewer than the 12 EPPO PP 1/152 asks for. ' +
      'Amendment is tested against it: at p = 0.05 the F of Amendment must exceed 161.4, so only a very large difference could show. 13 blocks would give 12.';
    expect(small.detail.sites[0]!.warnings).toContain(sentence);
    expect(small.detail.activation.warnings).toContain(`Tiny Garden: ${sentence}`);
  });

  it('randomizes whole plots within blocks and sub plots within whole plots, exactly as randomizeSite, and writes the unit of every plot', async () => {
    const plots = await expectStatus<Plot[]>(t.http.get(`${split.base}/plots`).set(split.auth), 200);
    const levelsOf = new Map(split.detail.treatments.map((x) => [x.id, x.factorLevelIds.map((id) => split.detail.factors.flatMap((f) => f.levels).find((l) => l.id === id)!.code)]));
    expect(splitRestrictionBroken(plots, levelsOf)).toBeNull();
    for (const [name, siteId] of Object.entries(split.siteIds)) {
      const site = split.detail.sites.find((s) => s.id === siteId)!;
      const library = randomizeSite({
        seed: 'split-e2e-1',
        siteKey: `site-${siteId}`,
        design: 'split-plot',
        factors: [
          { name: 'Amendment', levels: ['C', 'G', 'K'] },
          { name: 'Mulch', levels: ['0', 'W'] },
        ],
        blocks: site.blocks,
        labelPrefix: site.labelPrefix,
      });
      const stored = plots.filter((p) => p.siteId === siteId);
      expect(stored.map((p) => [p.label, p.block, p.wholePlot, p.subPlot, p.treatmentCode]), name).toEqual(
        library.map((p) => [p.label, p.block, p.wholePlot, p.subPlot, p.treatmentCode]),
      );
    }
    const first = plots.find((p) => p.siteId === split.siteIds['Hollow Lane'])!;
    expect(first).toMatchObject({ label: 'HL-B1-W1-S1', wholePlot: 1, subPlot: 1, subSubPlot: null, wholePlotLabel: 'HL-B1-W1' });
    // The rows written carry the units.
    const rows = await PlotRow.findAll({ where: { trialId: split.trialId } });
    expect(rows).toHaveLength(4 * 6 + 2 * 6);
    expect(rows.every((row) => row.wholePlot !== null && row.subPlot !== null && row.subSubPlot === null)).toBe(true);
  });

  it('gives the same layout for the same seed, and a different one for another seed that still keeps the restriction', async () => {
    const siteId = split.siteIds['Hollow Lane']!;
    const layout = async () => (await expectStatus<Plot[]>(t.http.get(`${split.base}/plots?siteId=${siteId}`).set(split.auth), 200)).map((p) => `${p.label}=${p.treatmentCode}`);
    const first = await layout();
    await expectStatus(t.http.post(`${split.base}/sites/${siteId}/randomize`).set(split.auth).send({}), 200);
    expect(await layout()).toEqual(first);
    await expectStatus(t.http.post(`${split.base}/sites/${siteId}/randomize`).set(split.auth).send({ seed: 'another split seed' }), 200);
    const other = await expectStatus<Plot[]>(t.http.get(`${split.base}/plots?siteId=${siteId}`).set(split.auth), 200);
    expect(other.map((p) => `${p.label}=${p.treatmentCode}`)).not.toEqual(first);
    const levelsOf = new Map(split.detail.treatments.map((x) => [x.id, [x.code[0]!, x.code[1]!]]));
    expect(splitRestrictionBroken(other, levelsOf)).toBeNull();
    await expectStatus(t.http.post(`${split.base}/sites/${siteId}/randomize`).set(split.auth).send({ seed: 'split-e2e-1' }), 200);
    expect(await layout()).toEqual(first);
  });

  it('serves a template whose rows carry the block, whole plot and sub plot of every plot', async () => {
    const siteId = split.siteIds['Quarry Hill']!;
    const response = await t.http.get(`${split.base}/sites/${siteId}/rounds/${split.roundId}/template.csv`).set(split.auth);
    expect(response.status).toBe(200);
    const plots = await expectStatus<Plot[]>(t.http.get(`${split.base}/plots?siteId=${siteId}`).set(split.auth), 200);
    const expected = [
      'plot label,block,whole plot,sub plot,treatment code,crust resistance (kgf/cm2),missing reason,notes',
      ...plots.map((p) => `${p.label},${p.block},${p.wholePlot},${p.subPlot},${p.treatmentCode},,,`),
    ];
    expect(response.text).toBe(`${expected.join('\r\n')}\r\n`);
  });

  it('works out a whole-plot amendment per whole plot (its two sub plots side by side) and a sub-plot mulch per sub plot', async () => {
    const amounts = await expectStatus<LevelAmount[]>(t.http.get(`${split.base}/level-amounts?marginPercent=0`).set(split.auth), 200);
    const hollow = split.siteIds['Hollow Lane']!;
    const gypsum = amounts.find((a) => a.siteId === hollow && a.factorName === 'Amendment' && a.levelCode === 'G')!;
    // 1.5 m × 1 m sub plots, two to a whole plot: 3 m² a whole plot; 4 blocks → 4 whole plots of gypsum.
    expect(gypsum).toMatchObject({ appliedTo: 'whole plot', plotsPerUnit: 2, unitAreaM2: 3, units: 4, problem: null });
    const wholePlotDose = computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { areaM2: 3 }, materialKind: 'gypsum' });
    expect(gypsum.perUnit?.grams).toBeCloseTo(wholePlotDose.grams!, 9);
    // DOMAIN.md: 40 lb/1000 ft² = 195.3 g/m², so 586 g on 3 m².
    expect(gypsum.perUnit?.grams).toBeCloseTo(585.9, 1);
    expect(gypsum.siteTotal?.grams).toBeCloseTo(wholePlotDose.grams! * 4, 6);
    const woodchip = amounts.find((a) => a.siteId === hollow && a.factorName === 'Mulch' && a.levelCode === 'W')!;
    expect(woodchip).toMatchObject({ appliedTo: 'sub plot', plotsPerUnit: 1, unitAreaM2: 1.5, units: 12 });
    // 5 cm over 1.5 m² = 75 L (1 cm over 1 m² = 10 L, DOMAIN.md).
    expect(woodchip.perUnit?.litres).toBeCloseTo(75, 9);
    const bare = amounts.find((a) => a.siteId === hollow && a.levelCode === '0')!;
    expect(bare).toMatchObject({ perUnit: null, siteTotal: null, units: 12 });
  });

  it('changes level names and rates in place without touching the layouts; changing a level code rebuilds and clears them', async () => {
    const before = await PlotRow.count({ where: { trialId: split.trialId } });
    const renamed = structuredClone(amendmentByMulch);
    renamed[0]!.levels[1] = { ...renamed[0]!.levels[1]!, name: 'Gypsum, pelleted', rateValue: 50 };
    const answer = await expectStatus<{ factors: Factor[]; treatments: Treatment[] }>(putFactorsCurrent(t, `${split.base}/factors`, split.auth, { factors: renamed }), 200);
    expect(answer.factors[0]!.levels[1]).toMatchObject({ id: split.detail.factors[0]!.levels[1]!.id, name: 'Gypsum, pelleted', rateValue: 50 });
    expect(answer.treatments.find((x) => x.code === 'GW')).toMatchObject({ id: split.detail.treatments.find((x) => x.code === 'GW')!.id, name: 'Gypsum, pelleted × Woodchip 5 cm' });
    expect(await PlotRow.count({ where: { trialId: split.trialId } })).toBe(before);
    const activity = await expectStatus<ActivityEntry[]>(t.http.get(`${split.base}/activity?kind=factors.updated`).set(split.auth), 200);
    expect(activity[0]!.summary).toBe('Changed the names or rates of the levels of Amendment × Mulch; the plot layouts stay.');

    const other = await buildFactorTrial(t, { design: 'split-plot', seed: 'rebuild', factors: amendmentByMulch, sites: [{ name: 'Rebuild Garden', labelPrefix: 'RG', blocks: 4 }] });
    const recoded = structuredClone(amendmentByMulch);
    recoded[1]!.levels[1] = { ...recoded[1]!.levels[1]!, code: 'S', name: 'Straw' };
    const rebuilt = await expectStatus<{ treatments: Treatment[] }>(putFactorsCurrent(t, `${other.base}/factors`, other.auth, { factors: recoded }), 200);
    expect(rebuilt.treatments.map((x) => x.code)).toEqual(['C0', 'CS', 'G0', 'GS', 'K0', 'KS']);
    expect(await PlotRow.count({ where: { trialId: other.trialId } })).toBe(0);
    const sites = await expectStatus<Site[]>(t.http.get(`${other.base}/sites`).set(other.auth), 200);
    expect(sites[0]).toMatchObject({ plotCount: 0, randomizedAt: null });
  });

  it('refuses, in words, factors the design does not take and a level rate without its unit, writing nothing', async () => {
    const levelsBefore = await FactorLevel.count();
    const three = [...amendmentByMulch, { name: 'Variety', levels: [{ code: 'x', name: 'Roma' }, { code: 'y', name: 'Cherry' }] }];
    const tooMany = await putFactorsCurrent(t, `${split.base}/factors`, split.auth, { factors: three });
    expect(tooMany.status).toBe(422);
    expect(tooMany.body.errors).toEqual([
      { field: 'factors', message: 'A split plot in blocks takes exactly 2 factors, in this order: the whole-plot factor, then the sub-plot factor; 3 were given.' },
    ]);
    const five = await putFactorsCurrent(t, `${split.base}/factors`, split.auth, { factors: [...three, three[0], three[1]] });
    expect(five.status).toBe(422);
    expect(five.body.errors).toEqual([{ field: 'factors', message: 'factors must list 2 to 4 factors' }]);
    const noUnit = structuredClone(amendmentByMulch);
    noUnit[0]!.levels[1] = { code: 'G', name: 'Gypsum', rateValue: 40 };
    const refused = await putFactorsCurrent(t, `${split.base}/factors`, split.auth, { factors: noUnit });
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([{ field: 'factors.0.levels.1.rateUnit', message: 'Amendment, level G: rate unit is needed when a rate is given' }]);
    expect(await FactorLevel.count()).toBe(levelsBefore);
  });

  it('keeps the factors between factor designs (the activation check says when their number no longer fits) and drops them for a one-factor design', async () => {
    const trial = await buildFactorTrial(t, { design: 'split-plot', seed: 'switch', factors: amendmentByMulch, sites: [{ name: 'Switch Garden', labelPrefix: 'SG', blocks: 4 }] });
    const splitSplit = await expectStatus<TrialDetail>(patchCurrent(t, trial.base, trial.auth, { design: 'split-split-plot' }), 200);
    expect(splitSplit.factors).toHaveLength(2);
    expect(splitSplit.activation.problems).toContain(
      'A split-split plot in blocks takes exactly 3 factors, in this order: the whole-plot factor, then the sub-plot factor, then the sub-sub-plot factor; 2 were given. Change the factors or the design.',
    );
    const factorial = await expectStatus<TrialDetail>(patchCurrent(t, trial.base, trial.auth, { design: 'factorial-rcbd' }), 200);
    expect(factorial.factors.map((f) => f.appliedTo)).toEqual(['plot', 'plot']);
    expect(factorial.activation.problems).toEqual(['Site Switch Garden is not randomized yet.']);
    const oneFactor = await expectStatus<TrialDetail>(patchCurrent(t, trial.base, trial.auth, { design: 'rcbd' }), 200);
    expect(oneFactor.factors).toEqual([]);
    expect(oneFactor.treatments.every((x) => x.factorLevelIds.length === 0)).toBe(true);
  });

  it('lays out a split-split plot with sub-sub plots inside sub plots, and a four-factor factorial completely randomized', async () => {
    const splitSplit = await buildFactorTrial(t, {
      design: 'split-split-plot',
      seed: 'ssp',
      factors: [...amendmentByMulch, { name: 'Variety', levels: [{ code: 'x', name: 'Roma' }, { code: 'y', name: 'Cherry' }] }],
      sites: [{ name: 'Three Level Garden', labelPrefix: 'TL', blocks: 3 }],
    });
    const plots = await expectStatus<Plot[]>(t.http.get(`${splitSplit.base}/plots`).set(splitSplit.auth), 200);
    expect(plots).toHaveLength(3 * 3 * 2 * 2);
    expect(plots[0]).toMatchObject({ label: 'TL-B1-W1-S1-SS1', subSubPlot: 1, wholePlotLabel: 'TL-B1-W1' });
    const subPlots = new Map<string, Plot[]>();
    for (const plot of plots) subPlots.set(`${plot.block}/${plot.wholePlot}/${plot.subPlot}`, [...(subPlots.get(`${plot.block}/${plot.wholePlot}/${plot.subPlot}`) ?? []), plot]);
    for (const members of subPlots.values()) {
      expect(new Set(members.map((p) => p.treatmentCode.slice(0, 2))).size).toBe(1);
      expect(members.map((p) => p.treatmentCode.slice(2)).sort()).toEqual(['x', 'y']);
    }
    expect(splitSplit.detail.sites[0]!.strata.map((s) => [s.name, s.errorDf])).toEqual([
      ['Whole-plot error', 4],
      ['Sub-plot error', 6],
      // ab(r − 1)(c − 1) = 3 × 2 × 2 × 1 (Gomez & Gomez 1984, Table 3.13; R: aov(y ~ A*B*C + Error(block/A/B))).
      ['Sub-sub-plot error', 12],
    ]);

    const four = await buildFactorTrial(t, {
      design: 'factorial-crd',
      seed: 'four',
      factors: [
        { name: 'A', levels: [{ code: 'a', name: 'a1' }, { code: 'b', name: 'a2' }] },
        { name: 'B', levels: [{ code: '1', name: 'b1' }, { code: '2', name: 'b2' }] },
        { name: 'C', levels: [{ code: 'x', name: 'c1' }, { code: 'y', name: 'c2' }] },
        { name: 'D', levels: [{ code: 'P', name: 'd1' }, { code: 'Q', name: 'd2' }, { code: 'R', name: 'd3' }] },
      ],
      sites: [{ name: 'Four Factor Garden', labelPrefix: 'FF', blocks: 2 }],
    });
    expect(four.detail.treatments).toHaveLength(24);
    expect((await TreatmentRow.findOne({ where: { trialId: four.trialId, code: 'b2yR' } }))?.factorLevelDId).toBe(four.detail.factors[3]!.levels[2]!.id);
    const fourPlots = await expectStatus<Plot[]>(t.http.get(`${four.base}/plots`).set(four.auth), 200);
    expect(fourPlots).toHaveLength(48);
    expect(fourPlots.every((p) => /^FF-P\d\d$/.test(p.label) && p.wholePlot === null)).toBe(true);
    expect(four.detail.sites[0]!.strata.map((s) => [s.name, s.errorDf, s.terms.length])).toEqual([['Error', 24, 15]]);
  });
});
