import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { amounts, makeTrial, person } from '../../../test/trial-fixture';
import { ProtocolPage } from './protocol-page';

/** Clicks Activate trial and answers its one question. */
async function activate() {
  await userEvent.click(screen.getByRole('button', { name: 'Activate trial' }));
  const question = await screen.findByRole('alertdialog');
  expect(question).toHaveTextContent('Activate trial CLAY-T? Collaborators can then record values at their sites.');
  await userEvent.click(within(question).getByRole('button', { name: 'Activate now' }));
}

const base = { 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials/3/amounts': { status: 200, body: amounts } };
/** The fixture trial before any site is randomized: adding a treatment clears nothing, so nothing is asked. */
const unrandomized = () => {
  const trial = makeTrial();
  return { ...trial, sites: trial.sites.map((site) => ({ ...site, randomizedAt: null, randomizationSeed: null, plotCount: 0 })) };
};

describe('ProtocolPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows the investigator the protocol with edit controls and each treatment’s amount per plot at each site', async () => {
    mockApi(base);
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    expect(screen.getByRole('button', { name: 'Edit trial' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Add treatment' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Add measure' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Add round' })).toBeInTheDocument();
    const g40 = screen.getByText('G40').closest('tr')!;
    expect(within(g40).getByText('40 lb / 1,000 ft²')).toBeInTheDocument();
    // The fixture's amounts: 281.2 g per plot = 9.92 oz (281.2 / 28.349523125, NIST SP 811 ounce).
    expect(await within(g40).findAllByText('281 g (9.92 oz)')).toHaveLength(2);
    const c2 = screen.getByText('C2').closest('tr')!;
    expect(within(c2).getAllByText('73.2 L (19.3 gal)')).toHaveLength(2);
    expect(within(screen.getByText('CTRL').closest('tr')!).getByText('control')).toBeInTheDocument();
    expect(screen.getByText('time with cut-off at 600 s', { exact: false })).toBeInTheDocument();
    expect(screen.getByText('15 Mar 2027')).toBeInTheDocument();
  });

  it('lists the failed activation checks in words and asks the server to activate', async () => {
    const calls = mockApi({
      ...base,
      'PATCH /api/trials/3': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'The trial cannot be activated yet.', errors: [{ field: 'status', message: 'Site Millbrook is not randomized yet.' }] },
      },
    });
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    expect(within(screen.getByRole('list', { name: 'What stops activation' })).getByText('Site Millbrook is not randomized yet.')).toBeInTheDocument();
    await activate();
    expect(await screen.findByText('The trial cannot be activated yet.')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ status: 'active', version: 1 });
  });

  it('meets an activation sent from an old copy of the trial with the edit conflict dialog, and activates on purpose with the stored version', async () => {
    const api: Record<string, { status: number; body: unknown }> = {
      ...base,
      'PATCH /api/trials/3': {
        status: 409,
        body: { statusCode: 409, error: 'Conflict', message: 'Not saved: trial CLAY-T was changed by someone else since you opened it.', current: makeTrial({ version: 2 }) },
      },
    };
    const calls = mockApi(api);
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    await activate();
    const conflict = await screen.findByRole('dialog', { name: 'Someone else changed trial CLAY-T' });
    const status = within(conflict).getByRole('group', { name: 'Status' });
    expect(status).toHaveTextContent('Yoursactive');
    expect(status).toHaveTextContent('Stored nowdraft');
    api['PATCH /api/trials/3'] = { status: 200, body: makeTrial({ status: 'active', version: 3 }) };
    await userEvent.click(within(conflict).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() =>
      expect(calls.filter((c) => c.method === 'PATCH').map((c) => c.body)).toEqual([
        { status: 'active', version: 1 },
        { status: 'active', version: 2 },
      ]),
    );
  });

  it('shows the server’s 422 message beside the field it names', async () => {
    mockApi({
      ...base,
      'POST /api/trials/3/treatments': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'The treatment was not saved.', errors: [{ field: 'code', message: 'code must be 1 to 12 letters or digits' }] },
      },
    });
    renderWithApp(<ProtocolPage trial={unrandomized()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Add treatment' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.type(within(dialog).getByLabelText('Code'), 'G 40!');
    await userEvent.type(within(dialog).getByLabelText('Name'), 'Gypsum');
    await userEvent.type(within(dialog).getByLabelText('Rate'), '40');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add treatment' }));
    const message = await within(dialog).findByText('code must be 1 to 12 letters or digits');
    expect(message.closest('.bp6-form-group')).toHaveClass('bp6-intent-danger');
    expect(message.closest('.bp6-form-group')).toContainElement(within(dialog).getByLabelText('Code'));
  });

  it('refuses a rate that is not a number before asking the server', async () => {
    const calls = mockApi(base);
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Add treatment' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.type(within(dialog).getByLabelText('Rate'), 'forty');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add treatment' }));
    expect(await within(dialog).findByText('Rate must be a number, e.g. 12.5')).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });

  it('sends a new treatment and loads the trial again', async () => {
    const calls = mockApi({ ...base, 'POST /api/trials/3/treatments': { status: 201, body: {} }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    renderWithApp(<ProtocolPage trial={unrandomized()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Add treatment' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.type(within(dialog).getByLabelText('Code'), 'G20');
    await userEvent.type(within(dialog).getByLabelText('Name'), 'Gypsum, half rate');
    await userEvent.type(within(dialog).getByLabelText('Rate'), '20');
    await userEvent.selectOptions(within(dialog).getByLabelText('Material'), 'gypsum');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add treatment' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ code: 'G20', name: 'Gypsum, half rate', isControl: false, rateValue: 20, rateUnit: 'lb/1000ft2', rateBasis: 'area', materialKind: 'gypsum', purity: null });
  });

  it('asks for the trial code before adding a treatment clears a randomized layout, and sends it only then', async () => {
    const impact = { sites: [{ siteId: 31, siteName: 'Hollow Lane', plots: 12, values: 0 }], layouts: 1, plots: 12, values: 0, summary: 'Clears the layout of Hollow Lane, 12 plots: the site must be randomized again, and printed sheets and plot labels made anew.', refusal: null };
    const calls = mockApi({ ...base, 'GET /api/trials/3/layout-impact': { status: 200, body: impact }, 'POST /api/trials/3/treatments': { status: 201, body: {} }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    const trial = makeTrial();
    renderWithApp(<ProtocolPage trial={trial} />);
    await userEvent.click(screen.getByRole('button', { name: 'Add treatment' }));
    const form = await screen.findByRole('dialog');
    await userEvent.type(within(form).getByLabelText('Code'), 'G20');
    await userEvent.type(within(form).getByLabelText('Name'), 'Gypsum, half rate');
    await userEvent.click(within(form).getByRole('button', { name: 'Add treatment' }));
    const confirm = await screen.findByRole('dialog', { name: 'Add treatment G20' });
    expect(await within(confirm).findByText(impact.summary)).toBeInTheDocument();
    const go = within(confirm).getByRole('button', { name: 'Add treatment' });
    expect(go).toBeDisabled();
    await userEvent.type(within(confirm).getByLabelText(`Type the trial code ${trial.code} to confirm`), trial.code);
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    await userEvent.click(go);
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ code: 'G20', name: 'Gypsum, half rate' }));
  });

  it('removing a measure with values says what it archives, site by site, and sends the typed trial code with the removal', async () => {
    const impact = {
      item: 'measure DRAIN (Drain time)',
      sites: [
        { siteId: 31, siteName: 'Hollow Lane', values: 40, censored: 3, missing: 1, notes: 2, photos: 0 },
        { siteId: 32, siteName: 'Quarry Path', values: 20, censored: 0, missing: 0, notes: 0, photos: 0 },
      ],
      values: 60,
      censored: 3,
      missing: 1,
      notes: 2,
      photos: 0,
      summary: 'Removes 60 recorded values and 2 notes of Drain time across 2 sites (3 censored and 1 missing with a reason). They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports.',
      confirmationNeeded: true,
      refusal: null,
    };
    const calls = mockApi({ ...base, 'GET /api/trials/3/measures/11/removal-impact': { status: 200, body: impact }, 'DELETE /api/trials/3/measures/11?confirm=clay-t': { status: 204, body: null }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    const trial = makeTrial();
    renderWithApp(<ProtocolPage trial={trial} />);
    await userEvent.click(screen.getByRole('button', { name: 'Remove DRAIN' }));
    const confirm = await screen.findByRole('dialog', { name: 'Remove measure DRAIN (Drain time)' });
    expect(await within(confirm).findByText(impact.summary)).toBeInTheDocument();
    expect(within(within(confirm).getByRole('list', { name: 'What it archives, site by site' })).getAllByRole('listitem').map((item) => item.textContent)).toEqual([
      'Hollow Lane: 40 values (3 censored, 1 missing), 2 notes',
      'Quarry Path: 20 values',
    ]);
    const go = within(confirm).getByRole('button', { name: 'Remove measure' });
    expect(go).toBeDisabled();
    await userEvent.type(within(confirm).getByLabelText(`Type the trial code ${trial.code} to confirm`), 'clay-t');
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    await userEvent.click(go);
    await waitFor(() => expect(calls.filter((c) => c.method === 'DELETE').map((c) => c.path)).toEqual(['/api/trials/3/measures/11?confirm=clay-t']));
  });

  /** Renames G40 in its dialog while the server holds a newer version (2): answers the conflict dialog. */
  async function renameStaleG40() {
    const mine = makeTrial().treatments.find((t) => t.code === 'G40')!;
    const stored = { ...mine, name: 'Gypsum, renamed meanwhile', version: 2 };
    const path = `PATCH /api/trials/3/treatments/${mine.id}`;
    const replies: Record<string, { status: number; body: unknown }> = {
      ...base,
      'GET /api/trials/3': { status: 200, body: makeTrial() },
      [path]: { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'Not saved: treatment G40 was changed by someone else since you opened it (your version 1, now 2).', current: stored } },
    };
    const calls = mockApi(replies);
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Edit G40' }));
    const form = await screen.findByRole('dialog');
    await userEvent.clear(within(form).getByLabelText('Name'));
    await userEvent.type(within(form).getByLabelText('Name'), 'Gypsum, fine grade');
    await userEvent.click(within(form).getByRole('button', { name: 'Save treatment' }));
    const conflict = await screen.findByRole('dialog', { name: 'Someone else changed treatment G40' });
    return { calls, replies, path, stored, conflict };
  }

  it('on a stale edit shows the person’s value beside the stored one and, when they keep theirs, sends it again with the stored version', async () => {
    const { calls, replies, path, stored, conflict } = await renameStaleG40();
    const name = within(conflict).getByRole('group', { name: 'Name' });
    expect(within(name).getByText('Gypsum, fine grade')).toBeInTheDocument();
    expect(within(name).getByText('Gypsum, renamed meanwhile')).toBeInTheDocument();
    replies[path] = { status: 200, body: { ...stored, name: 'Gypsum, fine grade', version: 3 } };
    await userEvent.click(within(conflict).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    const patches = calls.filter((c) => c.method === 'PATCH');
    expect(patches.map((c) => c.body)).toEqual([expect.objectContaining({ name: 'Gypsum, fine grade', version: 1 }), expect.objectContaining({ name: 'Gypsum, fine grade', version: 2 })]);
  });

  it('leaves the stored treatment when the person takes it, sending nothing more', async () => {
    const { calls, conflict } = await renameStaleG40();
    await userEvent.click(within(conflict).getByRole('button', { name: 'Take the stored values' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1);
  });

  it('shows a collaborator everything read-only, with no edit controls', async () => {
    mockApi(base);
    renderWithApp(<ProtocolPage trial={makeTrial({ myRoles: ['collaborator'], mySiteIds: [31] })} />);
    expect(screen.getByText(/only its investigator can change it/)).toBeInTheDocument();
    expect(screen.getByText('G40')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit|Add|Remove|Activate/ })).not.toBeInTheDocument();
  });

  it('shows a locked trial read-only even to its investigator, with a notice', () => {
    mockApi(base);
    renderWithApp(<ProtocolPage trial={makeTrial({ status: 'locked' })} />);
    expect(screen.getByText(/This trial is locked/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit|Add|Remove|Activate/ })).not.toBeInTheDocument();
  });
});
