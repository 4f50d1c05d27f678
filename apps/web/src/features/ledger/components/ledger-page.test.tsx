import type { Observation } from '@friable/contracts';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, person, plotsFor } from '../../../test/trial-fixture';
import { HistoryDrawer } from './history-drawer';
import { LedgerPage } from './ledger-page';

// The grid draws only the rows that fit its (empty) box in jsdom, so three plots are enough.
const plots = plotsFor(31, 'HL').slice(0, 3);

const observation = (plotIndex: number, extra: Partial<Observation>): Observation => ({
  id: 500 + plotIndex,
  plotId: plots[plotIndex]!.id,
  plotLabel: plots[plotIndex]!.label,
  siteId: 31,
  siteName: 'Hollow Lane',
  block: 1,
  treatmentCode: plots[plotIndex]!.treatmentCode,
  roundId: 21,
  roundLabel: 'Week 2',
  measureId: 11,
  measureCode: 'DRAIN',
  valueText: '412',
  valueNumber: 412,
  censored: false,
  missingReason: null,
  notes: null,
  version: 1,
  recordedById: 7,
  recordedBy: 'Ines Marlow',
  recordedAt: '2027-03-15T10:00:00.000Z',
  ...extra,
});

const stored = [
  observation(0, {}),
  observation(1, { valueText: '600', valueNumber: 600, censored: true }),
  observation(2, { valueText: null, valueNumber: null, missingReason: 'bed flooded by a burst pipe' }),
];

function replies(observations: Observation[] = stored) {
  return {
    'GET /api/auth/me': { status: 200, body: person },
    'GET /api/trials/3/plots?siteId=31': { status: 200, body: plots },
    'GET /api/trials/3/observations?siteId=31&roundId=21': { status: 200, body: observations },
  } as Record<string, { status: number; body: unknown }>;
}

const activeTrial = (extra = {}) => makeTrial({ status: 'active', ...extra });
const mainGrid = () => document.querySelector('.bp6-table-quadrant-main') as HTMLElement;

/** The grid's own double-click: two presses of the mouse on the cell's text in quick succession. */
function doubleClick(target: Element) {
  for (let press = 0; press < 2; press += 1) {
    fireEvent.mouseDown(target, { button: 0 });
    fireEvent.mouseUp(document, { button: 0 });
  }
}

async function typeInto(cellText: string, text: string) {
  doubleClick(within(mainGrid()).getByText(cellText));
  const input = await within(mainGrid()).findByDisplayValue(cellText);
  await userEvent.clear(input);
  await userEvent.type(input, `${text}{Enter}`);
}

describe('LedgerPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows a row per plot and a column per measure, censored and missing values marked apart, with a legend', async () => {
    mockApi(replies());
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    expect(await screen.findByText(/3 of 3 values recorded/)).toBeInTheDocument();
    const grid = mainGrid();
    expect(screen.getAllByText('Drain time (s)').length).toBeGreaterThan(0);
    expect(screen.getAllByText('HL-101').length).toBeGreaterThan(0);
    expect(within(grid).getByText('412').closest('.bp6-table-cell')).toHaveClass('fr-ledger-cell--measured');
    expect(within(grid).getByText('>600').closest('.bp6-table-cell')).toHaveClass('fr-ledger-cell--censored');
    expect(within(grid).getByText('NA').closest('.bp6-table-cell')).toHaveClass('fr-ledger-cell--missing');
    const legend = screen.getByRole('list', { name: 'How values are shown' });
    expect(legend).toHaveTextContent('censored: not reached by the cut-off');
    expect(legend).toHaveTextContent('missing, with its reason');
  });

  it('saves an edit with the version it was read at, and keeps the server’s 422 sentence beside the cell', async () => {
    const api = replies();
    api['PATCH /api/trials/3/observations/500'] = {
      status: 422,
      body: { statusCode: 422, error: 'Unprocessable Entity', message: 'drain time (s): "4l2" is not a number.', errors: [] },
    };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    await screen.findByText(/3 of 3 values recorded/);
    await typeInto('412', '4l2');
    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ value: '4l2', version: 1, missingReason: null, notes: null }));
    const alert = await screen.findByText(/"4l2" is not a number/);
    expect(alert.closest('[role="alert"]')).toHaveTextContent('HL-101 · Drain time (s): “4l2”');
    expect(within(mainGrid()).getByText('4l2').closest('.bp6-table-cell')).toHaveClass('fr-ledger-cell--error');
  });

  it('keeps a value refused only as unusual when the person says so, sending acceptWarnings', async () => {
    const api = replies();
    api['PATCH /api/trials/3/observations/500'] = {
      status: 422,
      body: { statusCode: 422, error: 'Unprocessable Entity', message: 'Not saved: 3 is below the plausible 5 s. If the value is right, confirm it to keep it.', errors: [{ field: 'value', message: 'value 3 is below the plausible 5 s.' }, { field: 'acceptWarnings', message: 'confirm the value is right to keep it' }] },
    };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    await screen.findByText(/3 of 3 values recorded/);
    await typeInto('412', '3');
    api['PATCH /api/trials/3/observations/500'] = { status: 200, body: observation(0, { valueText: '3', version: 2 }) };
    await userEvent.click(await screen.findByRole('button', { name: 'Keep this unusual value' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH')[1]?.body).toEqual({ value: '3', version: 1, missingReason: null, notes: null, acceptWarnings: true }));
  });

  it('on a conflict shows the stored value and resends the person’s own with the new version when they keep theirs', async () => {
    const api = replies();
    api['PATCH /api/trials/3/observations/500'] = { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'Someone else changed this value.' } };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    await screen.findByText(/3 of 3 values recorded/);
    // Meanwhile a second person saved 398 (version 2).
    api['GET /api/trials/3/observations?siteId=31&roundId=21'] = {
      status: 200,
      body: [observation(0, { valueText: '398', valueNumber: 398, version: 2, recordedBy: 'Tom Reyes' }), ...stored.slice(1)],
    };
    await typeInto('412', '405');
    const dialog = await screen.findByRole('dialog', { name: 'Someone else changed this value' });
    expect(within(dialog).getByText('405')).toBeInTheDocument();
    expect(within(dialog).getByText('398')).toBeInTheDocument();
    expect(dialog).toHaveTextContent('by Tom Reyes');
    api['PATCH /api/trials/3/observations/500'] = { status: 200, body: observation(0, { valueText: '405', version: 3 }) };
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH').map((c) => (c.body as { version: number }).version)).toEqual([1, 2]));
    expect(calls.filter((c) => c.method === 'PATCH')[1]!.body).toMatchObject({ value: '405' });
  });

  it('takes the stored value without sending anything when the person chooses it', async () => {
    const api = replies();
    api['PATCH /api/trials/3/observations/500'] = { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'Changed meanwhile.' } };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    await screen.findByText(/3 of 3 values recorded/);
    api['GET /api/trials/3/observations?siteId=31&roundId=21'] = { status: 200, body: [observation(0, { valueText: '398', version: 2 }), ...stored.slice(1)] };
    await typeInto('412', '405');
    await userEvent.click(await screen.findByRole('button', { name: 'Take the stored value' }));
    expect(await within(mainGrid()).findByText('398')).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1);
  });

  it('creates a value in an empty cell with POST', async () => {
    const api = replies(stored.slice(0, 2));
    api['POST /api/trials/3/observations'] = { status: 201, body: observation(2, { valueText: '95' }) };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial()} />);
    await screen.findByText(/2 of 3 values recorded/);
    const cells = [...mainGrid().querySelectorAll('.fr-ledger-cell--empty')] as HTMLElement[];
    doubleClick(cells[0]!.querySelector('.bp6-table-editable-text')!);
    const input = await within(mainGrid()).findByDisplayValue('');
    await userEvent.type(input, '95{Enter}');
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ plotId: plots[2]!.id, roundId: 21, measureId: 11, value: '95', missingReason: null, notes: null }));
  });

  it('is read-only with a notice on a locked trial, where the investigator can unlock it', async () => {
    const api = replies();
    api['PATCH /api/trials/3'] = { status: 200, body: activeTrial() };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial({ status: 'locked' })} />);
    expect(screen.getByText('This trial is locked for analysis; the investigator can unlock it.')).toBeInTheDocument();
    await screen.findByText(/3 of 3 values recorded/);
    doubleClick(within(mainGrid()).getByText('412'));
    expect(within(mainGrid()).queryByDisplayValue('412')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Unlock the trial' }));
    const dialog = await screen.findByRole('dialog');
    expect(dialog).toHaveTextContent('Data changed after sign-off');
    await userEvent.type(within(dialog).getByLabelText(/Why unlock/), 'A slipped decimal at plot 3.');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Unlock' }));
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'PATCH')).toMatchObject({ method: 'PATCH', path: '/api/trials/3', body: { status: 'active', reason: 'A slipped decimal at plot 3.' } }),
    );
  });

  it('meets a lock sent from an old copy of the trial with the edit conflict dialog, and locks on purpose with the stored version', async () => {
    const api = replies();
    api['PATCH /api/trials/3'] = {
      status: 409,
      body: { statusCode: 409, error: 'Conflict', message: 'Not saved: trial CLAY-T was changed by someone else since you opened it.', current: activeTrial({ version: 5 }) },
    };
    const calls = mockApi(api);
    renderWithApp(<LedgerPage trial={activeTrial({ version: 4 })} />);
    await screen.findByText(/3 of 3 values recorded/);
    await userEvent.click(screen.getByRole('button', { name: 'Lock the trial' }));
    await userEvent.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Lock' }));
    const conflict = await screen.findByRole('dialog', { name: 'Someone else changed trial CLAY-T' });
    const status = within(conflict).getByRole('group', { name: 'Status' });
    expect(status).toHaveTextContent('YoursLocked for analysis');
    expect(status).toHaveTextContent('Stored nowOpen for data');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();

    api['PATCH /api/trials/3'] = { status: 200, body: activeTrial({ status: 'locked', version: 6 }) };
    await userEvent.click(within(conflict).getByRole('button', { name: 'Keep mine' }));
    await waitFor(() =>
      expect(calls.filter((c) => c.method === 'PATCH').map((c) => c.body)).toEqual([
        { status: 'locked', version: 4 },
        { status: 'locked', version: 5 },
      ]),
    );
    expect(screen.queryByRole('dialog', { name: 'Someone else changed trial CLAY-T' })).not.toBeInTheDocument();
  });

  it('lets a collaborator read another site without editing, and offers no lock', async () => {
    mockApi(replies());
    renderWithApp(<LedgerPage trial={activeTrial({ myRoles: ['collaborator'], mySiteIds: [32] })} />, { route: '/trials/3/ledger?site=31&round=21' });
    expect(screen.getByText(/you enter values at your own sites/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Lock the trial' })).not.toBeInTheDocument();
  });
});

describe('HistoryDrawer', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists who changed the value, when, from what to what and how, newest first', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/observations/500/history': {
        status: 200,
        body: [
          { at: '2027-03-15T10:00:00.000Z', by: 'Ines Marlow', source: 'upload', before: null, after: '412' },
          { at: '2027-03-16T08:30:00.000Z', by: 'Tom Reyes', source: 'edit', before: '412', after: '>600' },
        ],
      },
    });
    renderWithApp(<HistoryDrawer trialId={3} observationId={500} title="History of HL-101 · DRAIN" onClose={() => {}} />);
    const table = await screen.findByRole('table', { name: 'History of this value' });
    const rows = within(table).getAllByRole('row').slice(1).map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent));
    expect(rows[0]).toEqual([expect.stringContaining('16 Mar 2027'), 'Tom Reyes', '412', '>600', 'by edit']);
    expect(rows[1]).toEqual([expect.stringContaining('15 Mar 2027'), 'Ines Marlow', '—', '412', 'by upload']);
  });
});
