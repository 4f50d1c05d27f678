import 'fake-indexeddb/auto';
import type { Observation } from '@friable/contracts';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { dropValue, FieldQueueDatabase, keepMine, keepUnusual, queuePhoto, queueValue, type NewValue } from './field-queue';
import { sendWaiting } from './send-queue';
import { readRequest } from '../../../test/render';

const stored = (extra: Partial<Observation> = {}): Observation => ({
  id: 901,
  plotId: 301,
  plotLabel: 'HL-101',
  siteId: 31,
  siteName: 'Hollow Lane',
  block: 1,
  treatmentCode: 'G40',
  roundId: 21,
  roundLabel: 'Week 2',
  measureId: 11,
  measureCode: 'DRAIN',
  valueText: '380',
  valueNumber: 380,
  censored: false,
  missingReason: null,
  notes: null,
  version: 2,
  recordedById: 2,
  recordedBy: 'Ines Marlow',
  recordedAt: '2027-03-15T10:32:00.000Z',
  ...extra,
});

const value = (extra: Partial<NewValue> = {}): NewValue => ({
  trialId: 3,
  siteId: 31,
  roundId: 21,
  plotId: 301,
  plotLabel: 'HL-101',
  measureId: 11,
  measureName: 'Drain time (s)',
  value: '412',
  notes: null,
  missingReason: null,
  seen: { observationId: 901, version: 1, text: '350' },
  ...extra,
});

type Answer = { status: number; body?: unknown } | 'offline';

/** Answers fetch calls in order; records method, path and body. */
function serverAnswers(...answers: Answer[]) {
  const calls: Array<{ method: string; path: string; body: unknown }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const { method, path, body } = await readRequest(input, init);
      calls.push({ method, path, body });
      const answer = answers.shift();
      if (!answer || answer === 'offline') throw new TypeError('Failed to fetch');
      return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), { status: answer.status, headers: { 'Content-Type': 'application/json' } });
    }),
  );
  return calls;
}

describe('the Round walk’s queue', () => {
  let db: FieldQueueDatabase;
  beforeEach(async () => {
    db = new FieldQueueDatabase(`test-${Math.random()}`);
    await db.open();
  });
  afterEach(async () => {
    vi.unstubAllGlobals();
    await db.delete();
  });

  it('sends a value over the version it was based on and forgets it once the server has it', async () => {
    await queueValue(value(), db);
    const calls = serverAnswers({ status: 200, body: stored({ valueText: '412', version: 2 }) });
    const report = await sendWaiting(db);
    expect(calls).toEqual([{ method: 'PATCH', path: '/api/trials/3/observations/901', body: { version: 1, value: '412', notes: null, missingReason: null } }]);
    expect(report).toMatchObject({ conflicts: 0, refused: 0, stopped: false });
    expect(report.sent).toHaveLength(1);
    expect(await db.values.count()).toBe(0);
  });

  it('posts a value for a cell that had none', async () => {
    await queueValue(value({ seen: { observationId: null, version: 0, text: '' }, value: '>600' }), db);
    const calls = serverAnswers({ status: 201, body: stored({ valueText: '600', censored: true, version: 1 }) });
    await sendWaiting(db);
    expect(calls[0]).toEqual({ method: 'POST', path: '/api/trials/3/observations', body: { plotId: 301, roundId: 21, measureId: 11, value: '>600', notes: null, missingReason: null } });
  });

  it('keeps everything waiting while the server cannot be reached', async () => {
    await queueValue(value(), db);
    await queueValue(value({ plotId: 302, plotLabel: 'HL-102' }), db);
    serverAnswers('offline');
    const report = await sendWaiting(db);
    expect(report.stopped).toBe(true);
    expect(await db.values.where('state').equals('waiting').count()).toBe(2);
  });

  it('keeps the version first seen when the same cell is typed again before it is sent', async () => {
    const id = await queueValue(value({ value: '400' }), db);
    expect(await queueValue(value({ value: '412', seen: { observationId: 901, version: 2, text: '380' } }), db)).toBe(id);
    const [entry] = await db.values.toArray();
    expect(entry).toMatchObject({ value: '412', seen: { version: 1, text: '350' }, state: 'waiting' });
  });

  it('turns a change made meanwhile into a conflict with the value stored now, and writes nothing over it', async () => {
    await queueValue(value(), db);
    const calls = serverAnswers({ status: 409, body: { statusCode: 409, message: 'Someone changed this value since you opened it.' } }, { status: 200, body: [stored()] });
    const report = await sendWaiting(db);
    expect(report.conflicts).toBe(1);
    expect(calls[1].path).toBe('/api/trials/3/observations?siteId=31&roundId=21&measureId=11');
    const [entry] = await db.values.toArray();
    expect(entry).toMatchObject({ state: 'conflict', value: '412', current: { valueText: '380', version: 2, recordedBy: 'Ines Marlow' } });
    // A conflict is not sent again on its own.
    serverAnswers();
    expect((await sendWaiting(db)).sent).toHaveLength(0);
    // Keeping one's own value sends it over the version stored now.
    await keepMine(entry.id!, db);
    const again = serverAnswers({ status: 200, body: stored({ valueText: '412', version: 3 }) });
    await sendWaiting(db);
    expect(again[0]).toMatchObject({ method: 'PATCH', body: { version: 2, value: '412' } });
    expect(await db.values.count()).toBe(0);
  });

  it('lets the value stored meanwhile stand when the person chooses it', async () => {
    const id = await queueValue(value(), db);
    await db.values.update(id, { state: 'conflict', current: stored() });
    await dropValue(id, db);
    expect(await db.values.count()).toBe(0);
  });

  it('keeps the server’s sentence for a refused value, and sends an unusual one again only when kept on purpose', async () => {
    await queueValue(value({ value: '99999' }), db);
    serverAnswers({
      status: 422,
      body: {
        statusCode: 422,
        message: 'Not saved: 99999 s is outside the plausible range of drain time (5 to 3,600 s). If the value is right, confirm it to keep it.',
        errors: [
          { field: 'value', message: 'value 99999 s is outside the plausible range of drain time (5 to 3,600 s).' },
          { field: 'acceptWarnings', message: 'confirm the value is right to keep it' },
        ],
      },
    });
    await sendWaiting(db);
    const [entry] = await db.values.toArray();
    expect(entry).toMatchObject({ state: 'refused', unusual: true, problem: expect.stringContaining('plausible range') });
    await keepUnusual(entry.id!, db);
    const calls = serverAnswers({ status: 200, body: stored({ valueText: '99999', version: 2 }) });
    await sendWaiting(db);
    expect(calls[0].body).toMatchObject({ value: '99999', acceptWarnings: true });
  });

  it('calls a 409 with nothing changed a refusal (a locked trial), not a conflict', async () => {
    await queueValue(value(), db);
    serverAnswers({ status: 409, body: { statusCode: 409, message: 'The trial is locked for analysis.' } }, { status: 200, body: [stored({ version: 1 })] });
    await sendWaiting(db);
    expect((await db.values.toArray())[0]).toMatchObject({ state: 'refused', problem: 'The trial is locked for analysis.' });
  });

  it('uploads a waiting photo after the values, one per plot and round', async () => {
    await queuePhoto({ trialId: 3, siteId: 31, roundId: 21, plotId: 301, plotLabel: 'HL-101', bytes: new TextEncoder().encode('first').buffer as ArrayBuffer, contentType: 'image/jpeg', fileName: 'a.jpg' }, db);
    await queuePhoto({ trialId: 3, siteId: 31, roundId: 21, plotId: 301, plotLabel: 'HL-101', bytes: new TextEncoder().encode('second').buffer as ArrayBuffer, contentType: 'image/jpeg', fileName: 'b.jpg' }, db);
    expect(await db.photos.count()).toBe(1);
    const calls = serverAnswers({ status: 200, body: {} });
    const report = await sendWaiting(db);
    expect(report.photosSent).toBe(1);
    expect(calls[0]).toMatchObject({ method: 'PUT', path: '/api/trials/3/plots/301/rounds/21/photo' });
    // The later photo replaced the earlier one (the file's own name is checked in lib/api-client.test.ts:
    // jsdom's File loses it when Node's Request encodes the form).
    const sent = (calls[0].body as FormData).get('file') as File;
    expect(await sent.text()).toBe('second');
    expect(await db.photos.count()).toBe(0);
  });
});
