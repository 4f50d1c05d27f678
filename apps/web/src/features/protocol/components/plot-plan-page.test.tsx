import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { amounts, makeTrial, person, plotsFor } from '../../../test/trial-fixture';
import { PlotPlanPage } from './plot-plan-page';

const base = {
  'GET /api/auth/me': { status: 200, body: person },
  'GET /api/trials/3/amounts': { status: 200, body: amounts },
  'GET /api/trials/3/plots?siteId=31': { status: 200, body: plotsFor(31, 'HL') },
};

describe('PlotPlanPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('starts a collaborator on their own site, with the map, legend and amounts per plot', async () => {
    const trial = makeTrial({ myRoles: ['collaborator'], mySiteIds: [31] });
    trial.sites.reverse();
    mockApi(base);
    renderWithApp(<PlotPlanPage trial={trial} />);
    expect(screen.getByLabelText('Site')).toHaveValue('31');
    const map = await screen.findByRole('table', { name: 'Plot plan of Hollow Lane' });
    expect(within(map).getAllByRole('row')).toHaveLength(4);
    expect(within(map).getByText('HL-101')).toBeInTheDocument();
    expect(within(map).getAllByText('G40')).toHaveLength(4);
    expect(within(screen.getAllByRole('list', { name: 'Treatments on the map' })[0]).getByText('(control)', { exact: false })).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: 'Amounts per plot at Hollow Lane' });
    const g40 = within(table).getByText('G40').closest('tr')!;
    // 281.2 g = 9.92 oz = 0.620 lb (NIST SP 811 pound 453.59237 g).
    expect(within(g40).getByText('281 g · 9.92 oz')).toBeInTheDocument();
    expect(within(g40).getByText('0.281 kg · 0.62 lb')).toBeInTheDocument();
    // 4 plots × 281.2 g = 1,124.8 g net; with the 10 % allowance 1,237 g.
    expect(within(g40).getByText('1.12 kg')).toBeInTheDocument();
    expect(within(g40).getByText('1.24 kg')).toBeInTheDocument();
    const c2 = within(table).getByText('C2').closest('tr')!;
    expect(within(c2).getByText('73.2 L · 19.3 gal')).toBeInTheDocument();
    const screenPart = table.closest('.fr-screen-only') as HTMLElement;
    expect(within(screenPart).getByText(/dust mask and eye protection/)).toBeInTheDocument();
    expect(within(screenPart).getByText(/5-gallon bucket of wet clay is about 30 kg/)).toBeInTheDocument();
  });

  it('prints data sheets per round with a blank cell per measure and its unit, and a label per plot', async () => {
    mockApi(base);
    renderWithApp(<PlotPlanPage trial={makeTrial()} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Show Sheets' }));
    expect(screen.getByText('Data sheet — Week 2 (day 14, due 15 Mar 2027)')).toBeInTheDocument();
    const sheet = screen.getByRole('table', { name: 'Data sheet Week 2 at Hollow Lane' });
    const drain = within(sheet).getByRole('columnheader', { name: /Drain time/ });
    expect(drain).toHaveTextContent('Drain times · cut-off 600'); // name, line break, unit and cut-off
    expect(screen.getAllByText(/written “>600”, not 600/).length).toBeGreaterThan(0);
    // Each plot's row carries its amount in both unit systems: 281 g of gypsum = 9.92 oz (NIST SP 811 pound).
    const g40Row = within(sheet).getAllByText('G40')[0].closest('tr')!;
    expect(within(g40Row).getByText('281 g (9.92 oz)')).toBeInTheDocument();
    const compostRow = within(sheet).getAllByText('C2')[0].closest('tr')!;
    expect(within(compostRow).getByText('73.2 L (19.3 gal)')).toBeInTheDocument();
    // The cautions and the trial's own safety note are on the sheet itself.
    const printed = sheet.closest('.fr-sheet') as HTMLElement;
    expect(within(printed).getByText(/dust mask and eye protection/)).toBeInTheDocument();
    expect(within(printed).getByText('This trial: Wear a dust mask when spreading gypsum.')).toBeInTheDocument();
    // A QR code per plot opens it in the Round walk.
    const qr = await within(g40Row).findByRole('img', { name: /^QR code: open HL-\d+ in the Round walk$/ });
    expect(qr.getAttribute('src')).toMatch(/^data:image\/svg\+xml/);
    expect(screen.getByText('Plot labels')).toBeInTheDocument();
    expect(screen.getAllByText('CLAY-T · Hollow Lane · block 1')).toHaveLength(3);
  });

  it('shows the allowance on site totals as a line the person can change', async () => {
    mockApi(base);
    renderWithApp(<PlotPlanPage trial={makeTrial()} />);
    const table = await screen.findByRole('table', { name: 'Amounts per plot at Hollow Lane' });
    expect(within(table).getByRole('columnheader', { name: 'With 10 % allowance' })).toBeInTheDocument();
    const box = screen.getByLabelText('Allowance for spills and weighing');
    await userEvent.clear(box);
    await userEvent.type(box, '0');
    const g40 = within(table).getByText('G40').closest('tr')!;
    // No allowance: both columns say 1,124.8 g → "1.12 kg"; 4 × 73.2 L = 292.8 L → "293 L".
    expect(within(g40).getAllByText('1.12 kg')).toHaveLength(2);
    expect(within(within(table).getByText('C2').closest('tr')!).getAllByText('293 L')).toHaveLength(2);
    expect(within(table).getByRole('columnheader', { name: 'With 0 % allowance' })).toBeInTheDocument();
  });

  it('says a site is not randomized yet instead of showing an empty map', () => {
    mockApi(base);
    renderWithApp(<PlotPlanPage trial={makeTrial()} />, { route: '/trials/3/plot-plan?site=32' });
    expect(screen.getByText('Millbrook is not randomized yet')).toBeInTheDocument();
  });

  it('downloads the CSV template with the session’s CSRF header and saves it through a Blob', async () => {
    const calls = mockApi({ ...base, 'GET /api/trials/3/sites/31/rounds/21/template.csv': { status: 200, body: 'plot,block,treatment,DRAIN (s)\n' } });
    const createObjectURL = vi.fn(() => 'blob:template');
    vi.stubGlobal('URL', Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() }));
    let saved = '';
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved = this.download;
    });
    renderWithApp(<PlotPlanPage trial={makeTrial()} />);
    await userEvent.click(await screen.findByRole('button', { name: 'CSV template — Week 2' }));
    await vi.waitFor(() => expect(createObjectURL).toHaveBeenCalled());
    const asked = calls.find((c) => c.path === '/api/trials/3/sites/31/rounds/21/template.csv');
    expect(asked?.headers.get('X-Friable-CSRF')).toBe('1');
    expect(saved).toBe('CLAY-T_HL_Week-2.csv');
    click.mockRestore();
  });
});
