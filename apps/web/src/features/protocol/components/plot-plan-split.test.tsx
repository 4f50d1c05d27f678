import type { Factor, FactorLevel, LevelAmount, Plot, TrialDetail } from '@friable/contracts';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, noMaterial, person } from '../../../test/trial-fixture';
import { PlotPlanPage } from './plot-plan-page';

// An invented split plot: compost on whole plots (none, 2.5 cm), mulch on sub plots (bare, straw), 2 blocks at Hollow Lane.
const level = (id: number, code: string, name: string, rate: Partial<FactorLevel> = {}): FactorLevel => ({
  id,
  code,
  name,
  description: null,
  ...noMaterial,
  ...rate,
});
const factors: Factor[] = [
  { id: 1, version: 1, position: 1, name: 'Compost', appliedTo: 'whole plot', levels: [level(101, 'N', 'No compost'), level(102, 'C', 'Compost', { rateValue: 2.5, rateUnit: 'cm' })] },
  { id: 2, version: 1, position: 2, name: 'Mulch', appliedTo: 'sub plot', levels: [level(201, 'B', 'Bare'), level(202, 'S', 'Straw', { rateValue: 5, rateUnit: 'cm' })] },
];
const base = makeTrial();
const treatments = [
  ['NB', [101, 201]],
  ['NS', [101, 202]],
  ['CB', [102, 201]],
  ['CS', [102, 202]],
] as const;
const trial: TrialDetail = {
  ...base,
  design: 'split-plot',
  factors,
  treatments: treatments.map(([code, ids], index) => ({ ...base.treatments[0]!, id: index + 1, code, name: code, isControl: index === 0, factorLevelIds: [...ids], position: index + 1 })),
};

// Block 1: W1 = C (S then B), W2 = N (B then S); block 2: W1 = N, W2 = C.
const layout: Array<[number, number, number, string]> = [
  [1, 1, 1, 'CS'],
  [1, 1, 2, 'CB'],
  [1, 2, 1, 'NB'],
  [1, 2, 2, 'NS'],
  [2, 1, 1, 'NS'],
  [2, 1, 2, 'NB'],
  [2, 2, 1, 'CB'],
  [2, 2, 2, 'CS'],
];
const plots: Plot[] = layout.map(([block, wholePlot, subPlot, code], index) => ({
  id: 500 + index,
  label: `HL-B${block}-W${wholePlot}-S${subPlot}`,
  siteId: 31,
  siteName: 'Hollow Lane',
  block,
  position: index - (block - 1) * 4 + 1,
  treatmentId: treatments.findIndex(([c]) => c === code) + 1,
  treatmentCode: code,
  wholePlot,
  subPlot,
  subSubPlot: null,
  wholePlotLabel: `HL-B${block}-W${wholePlot}`,
}));

const dose = (litres: number, areaM2: number) => ({
  grams: null,
  kilograms: null,
  ounces: null,
  pounds: null,
  litres,
  gallons: litres / 3.785411784,
  ratePerM2: { value: 25, unit: 'L/m2' as const },
  areaM2,
  basis: 'area' as const,
  warnings: [],
});
const amount = (factor: Factor, lvl: FactorLevel, plotsPerUnit: number, perUnit: ReturnType<typeof dose> | null): LevelAmount => ({
  siteId: 31,
  factorId: factor.id,
  factorName: factor.name,
  levelId: lvl.id,
  levelCode: lvl.code,
  levelName: lvl.name,
  appliedTo: factor.appliedTo,
  plotsPerUnit,
  unitAreaM2: 1.44 * plotsPerUnit,
  units: 2,
  perUnit,
  siteTotal: null,
  problem: null,
});
// 2.5 cm over a whole plot of 2 sub plots × 1.44 m² = 2.88 m²: 72 L (1 cm over 1 m² = 10 L, DOMAIN.md); 5 cm over 1.44 m²: 72 L.
const levelAmounts: LevelAmount[] = [
  amount(factors[0]!, factors[0]!.levels[0]!, 2, null),
  amount(factors[0]!, factors[0]!.levels[1]!, 2, dose(72, 2.88)),
  amount(factors[1]!, factors[1]!.levels[0]!, 1, null),
  amount(factors[1]!, factors[1]!.levels[1]!, 1, dose(72, 1.44)),
];

const api = {
  'GET /api/auth/me': { status: 200, body: person },
  'GET /api/trials/3/amounts': { status: 200, body: [] },
  'GET /api/trials/3/level-amounts': { status: 200, body: levelAmounts },
  'GET /api/trials/3/plots?siteId=31': { status: 200, body: plots },
};

describe('PlotPlanPage for a split plot', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('draws each whole plot as a group holding its sub plots, named by its label and compost level', async () => {
    mockApi(api);
    renderWithApp(<PlotPlanPage trial={trial} />);
    const map = await screen.findByRole('table', { name: 'Plot plan of Hollow Lane' });
    const wholePlots = within(map).getAllByRole('group');
    expect(wholePlots.map((g) => g.getAttribute('aria-label'))).toEqual([
      'Whole plot HL-B1-W1: C · Compost',
      'Whole plot HL-B1-W2: N · No compost',
      'Whole plot HL-B2-W1: N · No compost',
      'Whole plot HL-B2-W2: C · Compost',
    ]);
    expect(within(wholePlots[0]!).getAllByLabelText(/^Sub plot /).map((cell) => cell.getAttribute('aria-label'))).toEqual(['Sub plot HL-B1-W1-S1: CS', 'Sub plot HL-B1-W1-S2: CB']);
    // Inside its outline a sub plot is named by what is left of its label.
    expect(within(wholePlots[0]!).getByText('S1')).toBeInTheDocument();
  });

  it('gives the compost per whole plot and the mulch per sub plot', async () => {
    mockApi(api);
    renderWithApp(<PlotPlanPage trial={trial} />);
    const table = await screen.findByRole('table', { name: 'Amounts per unit at Hollow Lane' });
    const compost = within(table).getByText('Compost', { exact: true }).closest('tr')!;
    expect(compost).toHaveTextContent(/each whole plot \(2 plots, 2\.88 m²/);
    expect(compost).toHaveTextContent('2 whole plots');
    // 2 whole plots × 72 L = 144 L net; with the 10 % allowance 158.4 L.
    expect(compost).toHaveTextContent('144 L');
    expect(compost).toHaveTextContent('158 L');
    const straw = within(table).getByText('Straw', { exact: true }).closest('tr')!;
    expect(straw).toHaveTextContent('each sub plot');
    expect(straw).toHaveTextContent('2 sub plots');
  });

  it('prints whole plot and sub plot on the data sheet and on every label', async () => {
    mockApi(api);
    renderWithApp(<PlotPlanPage trial={trial} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Show Sheets' }));
    const sheet = screen.getByText('Data sheet — Week 2 (day 14, due 15 Mar 2027)').closest('section')!;
    expect(within(sheet).getAllByRole('columnheader').map((th) => th.textContent)).toEqual(expect.arrayContaining(['Whole plot', 'Sub plot']));
    const first = within(sheet).getByText('HL-B1-W1-S1').closest('tr')!;
    expect(within(first).getAllByRole('cell').map((td) => td.textContent).slice(0, 5)).toEqual(['HL-B1-W1-S1', '1', 'HL-B1-W1', '1', 'CS']);
    expect(screen.getByText('whole plot HL-B2-W2 · sub plot 2')).toBeInTheDocument();
    // The sheets weigh each level out for the unit it goes on: compost per whole plot, straw per sub plot.
    const perUnit = screen.getByRole('table', { name: 'Amount per unit at Hollow Lane' });
    const compostC = within(perUnit).getAllByRole('row').find((row) => row.textContent?.startsWith('Compost: C'));
    expect(compostC).toHaveTextContent(/each whole plot \(2 plots, 2\.88 m².*72 L/);
    expect(within(first).getByText(/^C 72 L \(19(\.0)? gal\) per whole plot · S 72 L \(19(\.0)? gal\)$/)).toBeInTheDocument();
  });
});
