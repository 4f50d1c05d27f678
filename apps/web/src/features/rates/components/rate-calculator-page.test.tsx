import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { RateCalculatorPage } from './rate-calculator-page';

const person = { id: 9, email: 'p@example.org', name: 'Priya Vance', isAdmin: false, isActive: true, createdAt: '2026-11-01T00:00:00.000Z' };

async function setBox(label: string, text: string) {
  const box = screen.getByLabelText(label);
  await userEvent.clear(box);
  if (text) await userEvent.type(box, text);
}

function result() {
  return within(screen.getByText('Amount per plot').closest('.fr-result-card') as HTMLElement);
}

describe('RateCalculatorPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('turns 40 lb/1,000 ft² of gypsum into 13.8 g for a pot of 30 cm inside diameter', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.click(screen.getByLabelText('Round (inside diameter)'));
    await setBox('Inside diameter', '30');
    await setBox('Allowance', '');
    // DOMAIN.md worked example: 40 lb/1000 ft² = 195.3 g/m² → 13.8 g for a 30 cm pot; 13.8 g = 0.487 oz.
    expect(result().getByText('13.8 g')).toBeInTheDocument();
    expect(result().getByText('0.014 kg')).toBeInTheDocument();
    expect(result().getByText('0.487 oz')).toBeInTheDocument();
    expect(result().getByText('0.03 lb')).toBeInTheDocument();
    // 4 plots × 13.80 g = 55.2 g = 0.122 lb; no allowance, so the sum is the same.
    const totals = within(result().getByRole('table', { name: 'Amount for all plots' }));
    expect(totals.getByRole('row', { name: /For all 4 plots/ })).toHaveTextContent('55.2 g (0.122 lb)');
    expect(totals.getByRole('row', { name: /To weigh out in all/ })).toHaveTextContent('55.2 g (0.122 lb)');
  });

  it('reads 0,5 and 0.5 as the same rate', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'kg/m2');
    // 0.5 kg/m² × 1.44 m² = 720 g (arithmetic).
    await setBox('Rate', '0,5');
    expect(result().getByText('720 g')).toBeInTheDocument();
    await setBox('Rate', '0.5');
    expect(result().getByText('720 g')).toBeInTheDocument();
    // Never ten times the amount: 5 kg/m² would be 7,200 g.
    expect(result().queryByText('7.2 kg')).not.toBeInTheDocument();
  });

  it('asks whether 1,000 is a thousand or one, and shows no amount until answered', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'g/m2');
    await setBox('Rate', '1,000');
    expect(result().getByText('Check the rate box: see the note under it.')).toBeInTheDocument();
    const question = screen.getByRole('group', { name: 'What does 1,000 mean?' });
    await userEvent.click(within(question).getByRole('button', { name: '1,000 (thousands)' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('1000');
    // 1,000 g/m² × 1.44 m² = 1,440 g.
    expect(result().getByText('1,440 g')).toBeInTheDocument();
    await setBox('Rate', '1,000');
    await userEvent.click(within(screen.getByRole('group', { name: 'What does 1,000 mean?' })).getByRole('button', { name: '1.000 (decimals)' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('1.000');
    expect(result().getByText('1.44 g')).toBeInTheDocument();
  });

  it('takes plot sides in feet and container diameters in inches', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await setBox('Length', '4');
    await setBox('Width', '4');
    await userEvent.selectOptions(screen.getByLabelText('Length unit'), 'ft');
    // DOMAIN.md worked example: a 16 ft² plot at 40 lb/1000 ft² = 0.64 lb = 290 g.
    expect(result().getByText('290 g')).toBeInTheDocument();
    expect(result().getByText('0.64 lb')).toBeInTheDocument();
    await userEvent.click(screen.getByLabelText('Round (inside diameter)'));
    await setBox('Inside diameter', '11,811');
    await userEvent.click(within(screen.getByRole('group', { name: 'What does 11,811 mean?' })).getByRole('button', { name: '11.811 (decimals)' }));
    await userEvent.selectOptions(screen.getByLabelText('Diameter unit'), 'in');
    // 11.811 in = 30.0 cm (× 2.54), so the DOMAIN.md pot example again: 13.8 g.
    expect(result().getByText('13.8 g')).toBeInTheDocument();
  });

  it('shows the allowance as its own line, which the person can change', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.click(screen.getByLabelText('Round (inside diameter)'));
    await setBox('Inside diameter', '30');
    const totals = () => within(result().getByRole('table', { name: 'Amount for all plots' }));
    // 4 × 13.80 g = 55.2 g; 10 % of it = 5.52 g; 60.7 g in all (0.134 lb).
    expect(totals().getByRole('row', { name: /Allowance/ })).toHaveTextContent('+ 5.52 g');
    expect(totals().getByRole('row', { name: /To weigh out in all/ })).toHaveTextContent('60.7 g (0.134 lb)');
    await setBox('Allowance', '25');
    // 25 % of 55.2 g = 13.8 g; 69.0 g in all.
    expect(totals().getByRole('row', { name: /Allowance/ })).toHaveTextContent('+ 13.8 g');
    expect(totals().getByRole('row', { name: /To weigh out in all/ })).toHaveTextContent('69 g');
  });

  it('gives 646 g for 2 short tons per acre on a 1.2 m × 1.2 m plot, and the total with a margin', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await setBox('Rate', '2');
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'ton/acre');
    // DOMAIN.md worked example: 2 short t/acre = 0.448 kg/m² → 646 g on 1.2 m × 1.2 m.
    expect(result().getByText('646 g')).toBeInTheDocument();
    // 2 × 907,184.74 g / 4,046.8564224 m² × 1.44 m² = 645.6 g; × 4 plots × 1.10 = 2,840.7 g = 6.263 lb
    // (computed from the NIST SP 811 factors in DOMAIN.md, shown to 3 significant digits).
    expect(result().getByText('2.84 kg (6.26 lb)')).toBeInTheDocument();
  });

  it('gives litres and gallons for a compost layer, and warns about a layer far deeper than usual', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await setBox('Rate', '1');
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'cm');
    // 1 cm over 1 m² = 10 L (DOMAIN.md); 1.44 m² → 14.4 L = 3.80 US gal (3.785411784 L/gal).
    expect(result().getByText('14.4 L')).toBeInTheDocument();
    expect(result().getByText('3.8 gal')).toBeInTheDocument();
    expect(screen.queryByText(/deep is beyond the usual/)).not.toBeInTheDocument();
    await setBox('Rate', '10');
    expect(result().getByText(/A layer 10 cm .* deep is beyond the usual 3 in at most/)).toBeInTheDocument();
    expect(screen.getByText(/gloves and wash your hands/)).toBeInTheDocument();
  });

  it('warns when a gypsum rate is far above common garden rates (the 100 vs 1000 trap)', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.selectOptions(screen.getByLabelText('Unit'), 'lb/100ft2');
    expect(result().getByText(/400 lb\/1,000 ft² of gypsum is far above/)).toBeInTheDocument();
    expect(result().getByText(/check that this one is really per 100 ft²/)).toBeInTheDocument();
    expect(screen.getByText(/dust mask and eye protection/)).toBeInTheDocument();
  });

  it('says what is missing instead of showing a number', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
    renderWithApp(<RateCalculatorPage />);
    await userEvent.click(screen.getByLabelText(/Concentration/));
    expect(result().getByText('For a concentration rate, type the incorporation depth and the soil volume.')).toBeInTheDocument();
  });

  it('asks the server once typing pauses and shows its answer', async () => {
    const answer = { grams: 281.2, kilograms: 0.2812, ounces: 9.92, pounds: 0.62, litres: null, gallons: null, ratePerM2: { value: 195.3, unit: 'g/m2' }, areaM2: 1.44, basis: 'area', warnings: [], total: { grams: 1237, kilograms: 1.237, pounds: 2.727, litres: null, gallons: null } };
    const calls = mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'POST /api/rates/dose': { status: 200, body: answer } });
    renderWithApp(<RateCalculatorPage />);
    expect(await screen.findByText('Checked with Friable’s server.', {}, { timeout: 3000 })).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ rate: 40, unit: 'lb/1000ft2', basis: 'area', materialKind: 'gypsum', lengthM: 1.2, widthM: 1.2, plots: 4, marginPercent: 10 });
    expect(result().getByText('1.24 kg (2.73 lb)')).toBeInTheDocument();
  });
});
