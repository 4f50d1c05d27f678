import type { IntakeResult } from '@friable/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ExcelJS from 'exceljs';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, person } from '../../../test/trial-fixture';
import { IntakePage } from './intake-page';

type Reply = { status: number; body: unknown };

/** Stands in for XMLHttpRequest: records each upload, reports half then all of it sent, then answers. */
class FakeUpload {
  static sent: FakeUpload[] = [];
  static replies: Reply[] = [];
  upload: { onprogress: ((event: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
  status = 0;
  statusText = '';
  responseText = '';
  url = '';
  headers: Record<string, string> = {};
  form: FormData | null = null;
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  open(_method: string, url: string) {
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(form: FormData) {
    this.form = form;
    FakeUpload.sent.push(this);
    const reply = FakeUpload.replies.shift() ?? { status: 500, body: { message: 'no reply prepared' } };
    setTimeout(() => {
      this.upload.onprogress?.({ lengthComputable: true, loaded: 50, total: 100 });
      this.status = reply.status;
      this.responseText = JSON.stringify(reply.body);
      this.onload?.();
    }, 0);
  }
}

const template = 'plot label,block,treatment code,drain time (s),notes\nHL-101,1,G40,412,\nHL-102,1,CTRL,>600,standing water\n\nHL-103,1,C2,abc,\n';
const csv = (text: string, name = 'hollow-lane-week-2.csv') => new File([text], name, { type: 'text/csv' });

const dryRun = (extra: Partial<IntakeResult> = {}): IntakeResult => ({
  dryRun: true,
  created: 2,
  updated: 1,
  unchanged: 0,
  warnings: [],
  changes: [
    { plotLabel: 'HL-101', measureCode: 'DRAIN', kind: 'new', before: null, after: '412' },
    { plotLabel: 'HL-102', measureCode: 'DRAIN', kind: 'changed', before: '580', after: '>600' },
    { plotLabel: 'HL-103', measureCode: 'DRAIN', kind: 'new', before: null, after: '95' },
  ],
  changesOmitted: 0,
  identicalToPrevious: false,
  message: '3 values checked.',
  ticket: 'test-ticket-0001',
  ...extra,
});

const activeTrial = (extra = {}) => makeTrial({ status: 'active', ...extra });

async function chooseFile(text = template) {
  await userEvent.upload(screen.getByLabelText('CSV file'), csv(text));
  return screen.findByRole('table', { name: 'Preview of the file' });
}

describe('IntakePage', () => {
  beforeEach(() => {
    window.localStorage.setItem('friable.signedIn', '1');
    FakeUpload.sent = [];
    FakeUpload.replies = [];
    vi.stubGlobal('XMLHttpRequest', FakeUpload);
    mockApi({ 'GET /api/auth/me': { status: 200, body: person } });
  });
  afterEach(() => vi.unstubAllGlobals());

  it('offers a collaborator only their own site, previews the file with its columns matched, and keeps blank rows’ numbers', async () => {
    renderWithApp(<IntakePage trial={activeTrial({ myRoles: ['collaborator'], mySiteIds: [31] })} />);
    const site = screen.getByLabelText('Site');
    expect(within(site).getAllByRole('option').map((o) => o.textContent)).toEqual(['Hollow Lane']);
    expect(screen.getByText(/gloves/)).toBeInTheDocument();
    expect(screen.getByText(/dust mask/)).toBeInTheDocument();
    expect(screen.getByText(/5-gallon bucket of wet clay/)).toBeInTheDocument();
    const preview = await chooseFile();
    expect(screen.getByLabelText('Column “plot label” holds')).toHaveValue('plotLabel');
    expect(screen.getByLabelText('Column “treatment code” holds')).toHaveValue('treatment');
    expect(screen.getByLabelText('Column “drain time (s)” holds')).toHaveValue('DRAIN');
    expect(screen.getByLabelText('Column “notes” holds')).toHaveValue('notes');
    // Row 4 is blank in the file; the last plot is on row 5, as a spreadsheet numbers it.
    const rows = within(preview).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getByRole('rowheader').textContent)).toEqual(['2', '3', '5']);
    expect(screen.getByText('hollow-lane-week-2.csv')).toBeInTheDocument();
  });

  it('reads a column named after a measure and “note” as that measure’s own notes, and offers that choice for any column', async () => {
    renderWithApp(<IntakePage trial={activeTrial()} />);
    await chooseFile('plot label,drain time (s),drain time note,remarks on drainage\nHL-101,412,poured twice,\n');
    expect(screen.getByLabelText('Column “drain time note” holds')).toHaveValue('notes:DRAIN');
    expect(within(screen.getByLabelText('Column “drain time note” holds')).getByRole('option', { selected: true })).toHaveTextContent('Notes of Drain time — DRAIN');
    const other = screen.getByLabelText('Column “remarks on drainage” holds');
    expect(other).toHaveValue('');
    expect(within(within(other).getByRole('group', { name: 'Notes of one measure' })).getAllByRole('option').map((o) => o.textContent)).toEqual(['Notes of Drain time — DRAIN']);
  });

  it('opens a workbook: lists its sheets, starts on the first one with a plot label column, previews the sheet chosen and sends its name', async () => {
    const book = new ExcelJS.Workbook();
    book.addWorksheet('Instructions').addRow(['Type one value a cell.']);
    const week1 = book.addWorksheet('Week 1');
    week1.addRow(['Hollow Lane, week 1']);
    week1.addRow([]);
    week1.addRow(['plot label', 'drain time (s)']);
    week1.addRow(['HL-101', 412]);
    const week2 = book.addWorksheet('Week 2');
    week2.addRow(['plot label', 'drain time (s)', 'sampled on']);
    week2.addRow(['HL-101', { formula: '200+12', result: 212 }, new Date(Date.UTC(2026, 4, 14))]);
    week2.addRow(['HL-102', 305.5, null]);
    book.addWorksheet('Lists', { state: 'hidden' }).addRow(['plot label']);
    book.addWorksheet('Spare');
    const file = new File([await book.xlsx.writeBuffer()], 'hollow-lane.xlsx', { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
    FakeUpload.replies.push({ status: 200, body: dryRun() });
    renderWithApp(<IntakePage trial={activeTrial()} />);
    await userEvent.upload(screen.getByLabelText('CSV file'), file);

    const sheet = await screen.findByLabelText('Sheet');
    expect(within(sheet).getAllByRole('option').map((o) => o.textContent)).toEqual(['Instructions', 'Week 1', 'Week 2', 'Lists · hidden', 'Spare · empty']);
    expect(sheet).toHaveValue('Week 1');
    // Week 1's header row is row 3, below a title: its one plot is on row 4.
    let preview = screen.getByRole('table', { name: 'Preview of the file' });
    expect(within(preview).getAllByRole('row').slice(1).map((row) => within(row).getByRole('rowheader').textContent)).toEqual(['4']);
    expect(screen.getByText(/sheet “Week 1” · header in row 3 · 1 row ·/)).toBeInTheDocument();

    await userEvent.selectOptions(sheet, 'Week 2');
    preview = screen.getByRole('table', { name: 'Preview of the file' });
    const rows = within(preview).getAllByRole('row').slice(1);
    expect(rows.map((row) => row.textContent)).toEqual(['2HL-1012122026-05-14', '3HL-102305.5']);
    expect(screen.getByLabelText('Column “drain time (s)” holds')).toHaveValue('DRAIN');
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    await screen.findByText('values would be saved.', { exact: false });
    expect(FakeUpload.sent[0]!.form?.get('sheet')).toBe('Week 2');
    expect((FakeUpload.sent[0]!.form?.get('file') as File).name).toBe('hollow-lane.xlsx');
  });

  it('lists the sheets of a workbook too large to open here, and sends the one chosen without a preview', async () => {
    const book = new ExcelJS.Workbook();
    book.addWorksheet('Lists', { state: 'hidden' }).addRow(['plot label']);
    book.addWorksheet('Week 1').addRow(['plot label', 'drain time (s)']);
    book.addWorksheet('Week 2').addRow(['plot label', 'drain time (s)']);
    const file = new File([await book.xlsx.writeBuffer()], 'whole-season.xlsx');
    // Counted as 30 MB, over the 20 MB the browser opens whole: only its list of sheets is read.
    Object.defineProperty(file, 'size', { value: 30 * 1_048_576 });
    FakeUpload.replies.push({ status: 200, body: dryRun() });
    renderWithApp(<IntakePage trial={activeTrial()} />);
    await userEvent.upload(screen.getByLabelText('CSV file'), file);

    const sheet = await screen.findByLabelText('Sheet');
    expect(within(sheet).getAllByRole('option').map((o) => o.textContent)).toEqual(['Lists · hidden', 'Week 1', 'Week 2']);
    expect(sheet).toHaveValue('Week 1');
    await userEvent.selectOptions(sheet, 'Week 2');
    expect(screen.getByText(/too large to preview here: the server reads the sheet “Week 2”/)).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Preview of the file' })).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    await screen.findByText('values would be saved.', { exact: false });
    expect(FakeUpload.sent[0]!.form?.get('sheet')).toBe('Week 2');
  });

  it('lists every problem of a refused file by row and column and marks those rows in the preview', async () => {
    FakeUpload.replies.push({
      status: 422,
      body: {
        statusCode: 422,
        error: 'Unprocessable Entity',
        message: 'The file has 2 problems; nothing was saved.',
        errors: [
          { row: 2, column: 'plot label', message: 'Row 2, plot label: "HL-999" is not a plot of Hollow Lane.' },
          { row: 5, column: 'drain time (s)', message: 'Row 5, drain time (s): "abc" is not a number.' },
        ],
      },
    });
    renderWithApp(<IntakePage trial={activeTrial()} />);
    const preview = await chooseFile();
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    const problems = await screen.findByRole('table', { name: 'Problems in the file' });
    const lines = within(problems).getAllByRole('row').slice(1).map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent));
    expect(lines).toEqual([
      ['2', 'plot label', 'Row 2, plot label: "HL-999" is not a plot of Hollow Lane.'],
      ['5', 'drain time (s)', 'Row 5, drain time (s): "abc" is not a number.'],
    ]);
    expect(screen.getByText(/Nothing was saved/)).toBeInTheDocument();
    const marked = within(preview).getAllByRole('row').filter((row) => row.getAttribute('aria-invalid') === 'true');
    expect(marked.map((row) => within(row).getByRole('rowheader').textContent)).toEqual(['!2', '!5']);
    expect(screen.queryByRole('button', { name: 'Save these values' })).not.toBeInTheDocument();
  });

  it('dry-runs first, then saves only once the unusual values are accepted; sends the changed column mapping', async () => {
    FakeUpload.replies.push(
      { status: 200, body: dryRun({ warnings: [{ row: 6, column: 'drain time (s)', message: 'Row 6, drain time (s): 3 is below the plausible 5 s.' }] }) },
      { status: 200, body: { ...dryRun(), dryRun: false, message: '2 new and 1 changed value saved.' } },
    );
    renderWithApp(<IntakePage trial={activeTrial()} />, { route: '/trials/3/intake?site=31&round=21' });
    await chooseFile();
    await userEvent.selectOptions(screen.getByLabelText('Column “notes” holds'), '');
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    expect(await screen.findByText('values would be saved.', { exact: false })).toHaveTextContent('2 new, 1 changed and 0 unchanged values would be saved.');
    const changes = screen.getByRole('table', { name: 'Values this upload would write' });
    expect(within(changes).getByText('580').closest('tr')).toHaveTextContent('HL-102DRAINChanged580>600');
    expect(screen.getByText('Row 6, drain time (s): 3 is below the plausible 5 s.')).toBeInTheDocument();

    const first = FakeUpload.sent[0]!;
    expect(first.url).toBe('/api/trials/3/sites/31/rounds/21/intake?dryRun=true');
    expect(first.headers['X-Friable-CSRF']).toBe('1');
    expect(first.form?.get('mapping')).toBe(JSON.stringify({ notes: null }));
    expect(first.form?.get('acceptWarnings')).toBe('false');
    expect((first.form?.get('file') as File).name).toBe('hollow-lane-week-2.csv');

    const save = screen.getByRole('button', { name: 'Save these values' });
    expect(save).toBeDisabled();
    await userEvent.click(screen.getByLabelText(/I have checked these values/));
    await userEvent.click(save);
    expect(await screen.findByText('2 new and 1 changed value saved.')).toBeInTheDocument();
    const second = FakeUpload.sent[1]!;
    expect(second.url).toBe('/api/trials/3/sites/31/rounds/21/intake');
    expect(second.form?.get('acceptWarnings')).toBe('true');
    expect(screen.getByRole('link', { name: 'Open these values in the Ledger' })).toHaveAttribute('href', '/trials/3/ledger?site=31&round=21');
  });

  it('sends the missing reason chosen for the whole file, tapped from the common reasons, only when one is chosen', async () => {
    FakeUpload.replies.push({ status: 200, body: dryRun() }, { status: 200, body: dryRun() });
    renderWithApp(<IntakePage trial={activeTrial()} />, { route: '/trials/3/intake?site=31&round=21' });
    await chooseFile('plot label,drain time (s)\nHL-101,NA\n');
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    await screen.findByText('values would be saved.', { exact: false });
    expect(FakeUpload.sent[0]!.form?.has('missingReason')).toBe(false);
    await userEvent.click(within(screen.getByRole('group', { name: 'Missing reason for the whole file: common reasons' })).getByRole('button', { name: 'plot flooded' }));
    expect(screen.getByLabelText('Missing reason for the whole file')).toHaveValue('plot flooded');
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    await waitFor(() => expect(FakeUpload.sent).toHaveLength(2));
    expect(FakeUpload.sent[1]!.form?.get('missingReason')).toBe('plot flooded');
  });

  it('says a byte-identical file changes nothing and offers no save', async () => {
    FakeUpload.replies.push({ status: 200, body: dryRun({ created: 0, updated: 0, unchanged: 3, identicalToPrevious: true }) });
    renderWithApp(<IntakePage trial={activeTrial()} />);
    await chooseFile();
    await userEvent.click(screen.getByRole('button', { name: 'Check the file' }));
    expect(await screen.findByText(/byte for byte the one uploaded last time/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save these values' })).toBeDisabled();
    expect(FakeUpload.sent[0]!.form?.get('mapping')).toBeNull();
  });

  it('gives reviewers and locked trials a note instead of an upload', () => {
    const { unmount } = renderWithApp(<IntakePage trial={activeTrial({ myRoles: ['reviewer'] })} />);
    expect(screen.getByText(/only its investigator and site collaborators upload data/)).toBeInTheDocument();
    expect(screen.queryByLabelText('CSV file')).not.toBeInTheDocument();
    unmount();
    renderWithApp(<IntakePage trial={activeTrial({ status: 'locked' })} />);
    expect(screen.getByText('This trial is locked for analysis; the investigator can unlock it.')).toBeInTheDocument();
  });

  it('follows an upload already running on the server for the site and round (after a reload), stage by stage with its count, to its end', async () => {
    const running = {
      ticket: 'earlier-upload-0001',
      siteId: 31,
      roundId: 21,
      fileName: 'hollow-lane-week-2.csv',
      sizeBytes: 2_000_000,
      format: 'csv',
      dryRun: false,
      stage: 'checking',
      rowsChecked: 12_000,
      bytesRead: 500_000,
      valuesTotal: null,
      valuesDone: 0,
      message: 'Checking every row…',
      userName: 'Ada Field',
      startedAt: '2026-12-02T10:00:00.000Z',
      updatedAt: '2026-12-02T10:00:01.000Z',
      finishedAt: null,
      result: null,
      refusal: null,
    };
    const imports = 'GET /api/trials/3/intake-imports?siteId=31&roundId=21';
    const replies = [
      [running],
      [{ ...running, stage: 'writing', rowsChecked: 40_000, valuesTotal: 120_000, valuesDone: 60_000 }],
      [{ ...running, stage: 'done', rowsChecked: 40_000, valuesDone: 120_000, finishedAt: '2026-12-02T10:00:09.000Z', message: 'Saved hollow-lane-week-2.csv for Hollow Lane, Week 2: 120,000 new values.' }],
    ];
    const calls = mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials/3/intake-columns': { status: 200, body: [] }, [imports]: () => ({ status: 200, body: replies.length > 1 ? replies.shift() : replies[0] }) });
    renderWithApp(<IntakePage trial={activeTrial()} />);
    const server = await screen.findByRole('status', { name: 'hollow-lane-week-2.csv from Ada Field' });
    expect(within(server).getByText('Checking rows: 12,000 rows checked so far')).toBeInTheDocument();
    expect(within(server).getByText('Checking rows')).toHaveAttribute('aria-current', 'step');
    expect(await screen.findByText('Writing 120,000 values and their history', {}, { timeout: 3000 })).toBeInTheDocument();
    expect(screen.getByText('Writing')).toHaveAttribute('aria-current', 'step');
    expect(await screen.findByText('Saved hollow-lane-week-2.csv for Hollow Lane, Week 2: 120,000 new values.', {}, { timeout: 3000 })).toBeInTheDocument();
    expect(calls.filter((call) => call.path === '/api/trials/3/intake-imports?siteId=31&roundId=21').length).toBeGreaterThanOrEqual(3);
  });
});
