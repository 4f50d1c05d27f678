import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, person } from '../../../test/trial-fixture';
import { SitesPage } from './sites-page';

const base = { 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials/3/members': { status: 200, body: [] } };

describe('SitesPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows each site’s plot size, surface area, blocks and guardrail warnings', () => {
    mockApi(base);
    renderWithApp(<SitesPage trial={makeTrial()} />);
    const hollow = screen.getByLabelText('Site Hollow Lane');
    expect(within(hollow).getByText('1.2 m × 1.2 m')).toBeInTheDocument();
    // 1.44 m² / 0.09290304 m² per ft² (NIST SP 811) = 15.5 ft².
    expect(within(hollow).getByText('1.44 m² (15.5 ft²) per plot')).toBeInTheDocument();
    expect(within(hollow).getByText(/Error degrees of freedom are 6/)).toBeInTheDocument();
    expect(within(hollow).getByText(/12 plots, randomized 20 Nov 2026 with seed/)).toBeInTheDocument();
    expect(within(screen.getByLabelText('Site Millbrook')).getByText('not randomized yet')).toBeInTheDocument();
  });

  it('works out the surface area of a round container while it is typed', async () => {
    mockApi(base);
    renderWithApp(<SitesPage trial={makeTrial()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Add site' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.click(within(dialog).getByLabelText('Round (container)'));
    await userEvent.type(within(dialog).getByLabelText('Inside diameter'), '30');
    // π × 0.15² = 0.0707 m² (plotSurfaceAreaM2 doc example, @friable/field) = 0.761 ft².
    expect(within(dialog).getByText('0.071 m² (0.761 ft²)')).toBeInTheDocument();
  });

  it('randomizes a site again with an optional seed once its trial code is typed, and says it is refused once data exist', async () => {
    const impact = { sites: [{ siteId: 31, siteName: 'Hollow Lane', plots: 12, values: 0 }], layouts: 1, plots: 12, values: 0, summary: 'Clears the layout of Hollow Lane, 12 plots: the site must be randomized again, and printed sheets and plot labels made anew.', refusal: null };
    const calls = mockApi({ ...base, 'GET /api/trials/3/layout-impact?siteId=31': { status: 200, body: impact }, 'POST /api/trials/3/sites/31/randomize': { status: 201, body: [] }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    const trial = makeTrial();
    renderWithApp(<SitesPage trial={trial} />);
    await userEvent.click(screen.getByRole('button', { name: 'Randomize again Hollow Lane' }));
    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText(/once data exist it is refused/)).toBeInTheDocument();
    await userEvent.type(within(dialog).getByLabelText('Seed (optional)'), 'spring-27');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Randomize again' }));
    const confirm = await screen.findByRole('dialog', { name: 'Replace the plot plan of Hollow Lane' });
    expect(await within(confirm).findByText(impact.summary)).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    await userEvent.type(within(confirm).getByLabelText(`Type the trial code ${trial.code} to confirm`), trial.code);
    await userEvent.click(within(confirm).getByRole('button', { name: 'Randomize again' }));
    await vi.waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ seed: 'spring-27' }));
  });

  it('does not offer to randomize again a site that has data', () => {
    mockApi(base);
    const trial = makeTrial();
    trial.sites[0] = { ...trial.sites[0], hasObservations: true };
    renderWithApp(<SitesPage trial={trial} />);
    expect(screen.getByRole('button', { name: 'Randomize again Hollow Lane' })).toBeDisabled();
    expect(screen.getByText(/can no longer be randomized again/)).toBeInTheDocument();
  });

  it('shows a reviewer the sites without edit controls', () => {
    mockApi(base);
    renderWithApp(<SitesPage trial={makeTrial({ myRoles: ['reviewer'] })} />);
    expect(screen.getByText('Hollow Lane')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit|Add|Remove|Randomize/ })).not.toBeInTheDocument();
  });
});
