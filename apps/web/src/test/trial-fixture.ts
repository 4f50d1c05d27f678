import type { DoseAnswer, MaterialRate, Plot, PlotAmount, Site, Treatment, TrialDetail } from '@friable/contracts';

// An invented trial for component tests: two sites, a control and two amendments, one measure, one round.
export const person = { id: 7, email: 'ines@example.org', name: 'Ines Marlow', isAdmin: false, isActive: true, createdAt: '2026-11-01T00:00:00.000Z' };

/** Nothing applied: the rate and material fields of a treatment or factor level without a rate. */
export const noMaterial: MaterialRate = {
  rateValue: null,
  rateUnit: null,
  rateBasis: 'area',
  incorporationDepthCm: null,
  product: null,
  purity: null,
  moistureBasis: 'as-is',
  moistureFraction: null,
  materialKind: 'other',
};

const treatment = (id: number, code: string, name: string, extra: Partial<Treatment> = {}): Treatment => ({
  id,
  version: 1,
  code,
  name,
  description: null,
  isControl: false,
  ...noMaterial,
  factorLevelIds: [],
  position: id,
  ...extra,
});

const site = (id: number, name: string, labelPrefix: string, extra: Partial<Site> = {}): Site => ({
  id,
  version: 1,
  name,
  location: 'Fernwick',
  soilDescription: 'Heavy clay',
  shape: 'rectangle',
  lengthM: 1.2,
  widthM: 1.2,
  diameterCm: null,
  containerDepthCm: null,
  soilVolumeL: null,
  areaM2: 1.44,
  blocks: 4,
  labelPrefix,
  leadUserId: null,
  leadName: null,
  randomizedAt: '2026-11-20T09:00:00.000Z',
  randomizationSeed: 'clay-2026',
  plotCount: 12,
  hasObservations: false,
  warnings: ['Error degrees of freedom are 6, below the 12 usually advised; add blocks or treatments.'],
  strata: [{ unit: 'plot', name: 'Error', errorDf: 6, arithmetic: '(3 treatments − 1) × (4 blocks − 1)', terms: ['treatment'], criticalF: 5.143 }],
  ...extra,
});

export function makeTrial(extra: Partial<TrialDetail> = {}): TrialDetail {
  return {
    id: 3,
    version: 1,
    code: 'CLAY-T',
    title: 'Clay test trial',
    question: 'Does gypsum shorten drain time?',
    design: 'rcbd',
    status: 'draft',
    startDate: '2027-03-01',
    seed: 'clay-2026',
    safetyNotes: 'Wear a dust mask when spreading gypsum.',
    noControlReason: null,
    ownerId: 7,
    myRoles: ['investigator'],
    mySiteIds: [],
    updatedAt: '2026-11-20T09:00:00.000Z',
    factors: [],
    treatments: [
      treatment(1, 'CTRL', 'Untreated', { isControl: true }),
      treatment(2, 'G40', 'Gypsum', { rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum' }),
      treatment(3, 'C2', 'Compost layer', { rateValue: 2, rateUnit: 'in' }),
    ],
    measures: [
      {
        id: 11,
        version: 1,
        code: 'DRAIN',
        name: 'Drain time',
        unit: 's',
        kind: 'time-with-cutoff',
        scaleMin: null,
        scaleMax: null,
        cutoff: 600,
        plausibleMin: 5,
        plausibleMax: 600,
        hardMin: 0,
        hardMax: null,
        decimals: 0,
        higherIsBetter: false,
        position: 1,
      },
    ],
    rounds: [{ id: 21, version: 1, label: 'Week 2', dayOffset: 14, dueDate: '2027-03-15', measureIds: [11] }],
    sites: [site(31, 'Hollow Lane', 'HL'), site(32, 'Millbrook', 'MB', { randomizedAt: null, randomizationSeed: null, plotCount: 0 })],
    activation: { ready: false, problems: ['Site Millbrook is not randomized yet.'], warnings: [] },
    ...extra,
  };
}

const dose = (grams: number | null, litres: number | null): DoseAnswer => ({
  grams,
  kilograms: grams === null ? null : grams / 1000,
  ounces: grams === null ? null : grams / 28.349523125,
  pounds: grams === null ? null : grams / 453.59237,
  litres,
  gallons: litres === null ? null : litres / 3.785411784,
  ratePerM2: { value: 195.3, unit: 'g/m2' },
  areaM2: 1.44,
  basis: 'area',
  warnings: [],
});

// 40 lb/1000 ft² = 195.3 g/m² (DOMAIN.md) × 1.44 m² = 281.2 g; 2 in = 50.8 L/m² × 1.44 m² = 73.2 L.
export const amounts: PlotAmount[] = [31, 32].flatMap((siteId) => [
  { siteId, treatmentId: 1, treatmentCode: 'CTRL', plots: 4, perPlot: null, siteTotal: null },
  { siteId, treatmentId: 2, treatmentCode: 'G40', plots: 4, perPlot: dose(281.2, null), siteTotal: { grams: 1237, litres: null } },
  { siteId, treatmentId: 3, treatmentCode: 'C2', plots: 4, perPlot: dose(null, 73.2), siteTotal: { grams: null, litres: 322 } },
]);

export function plotsFor(siteId: number, prefix: string): Plot[] {
  const order = [
    [2, 1, 3],
    [3, 2, 1],
    [1, 3, 2],
    [2, 3, 1],
  ];
  const codes: Record<number, string> = { 1: 'CTRL', 2: 'G40', 3: 'C2' };
  return order.flatMap((row, b) =>
    row.map((treatmentId, p) => ({
      id: siteId * 100 + b * 10 + p,
      label: `${prefix}-${b + 1}0${p + 1}`,
      siteId,
      siteName: prefix,
      block: b + 1,
      position: p + 1,
      treatmentId,
      treatmentCode: codes[treatmentId],
      wholePlot: null,
      subPlot: null,
      subSubPlot: null,
      wholePlotLabel: null,
    })),
  );
}
