import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp } from '../support/test-app';
import { messagesTo, waitForMessages } from '../team/team-support';

describe('E-mail preferences: upload receipts off, and the receipt in the uploader’s locale', () => {
  let t: TestApp;
  let built: IntakeTrial;
  const csvFor = (values: string[]) => {
    const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
    return Buffer.from(`plot label,water retained (mL)\n${labels.map((label, i) => `${label},${values[i]}`).join('\n')}\n`);
  };

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  it('sends no receipt while the uploader has receipts off, and one again once they turn them on', async () => {
    const me = bearer(built.tokens.collaborator);
    const off = await t.http.patch('/api/users/me').set(me).send({ emailReceipts: false });
    expect(off.status).toBe(200);
    expect(off.body).toMatchObject({ emailReceipts: false, emailReminders: true });
    // Invented water-retained values (test data only).
    const quiet = await upload(t, built.tokens.collaborator, intakePath(built), csvFor(['120.5', '98.0', '143.2', '110.0', '101.5', '150.1', '125.3', '96.4', '139.9']), 'quiet.csv');
    expect(quiet.status).toBe(200);

    const on = await t.http.patch('/api/users/me').set(me).send({ emailReceipts: true, locale: 'de-DE' });
    expect(on.body).toMatchObject({ emailReceipts: true, locale: 'de-DE' });
    const loud = await upload(t, built.tokens.collaborator, intakePath(built), csvFor(['121.5', '98.0', '143.2', '110.0', '101.5', '150.1', '125.3', '96.4', '139.9']), 'loud.csv');
    expect(loud.status).toBe(200);
    await waitForMessages(built.emails.collaborator, 1);
    // Receipts go in order after each commit; give a stray first one time to land before counting.
    await sleep(500);
    const receipts = messagesTo(built.emails.collaborator);
    expect(receipts).toHaveLength(1);
    expect(receipts[0].text).toContain('your file loud.csv');
    // The time in the uploader's locale: CLDR's full German date ("Mittwoch, 2. Dezember 2026 um 15:40 UTC").
    expect(receipts[0].text).toMatch(/ on (Montag|Dienstag|Mittwoch|Donnerstag|Freitag|Samstag|Sonntag), \d{1,2}\. [A-Za-zä]+ \d{4} um \d{2}:\d{2} UTC\./);
  });
});
