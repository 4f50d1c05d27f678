import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, screenshot, signIn, useBrowserSession } from './support';

/** A call to the API as the signed-in page makes it (its session cookie), answering status and body, refusals included. */
async function api<T = { id: number; version: number }>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const headers: Record<string, string> = { 'X-Friable-CSRF': '1' };
      if (body !== undefined) headers['Content-Type'] = 'application/json';
      const response = await fetch(`/api${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
      return { status: response.status, body: (await response.json().catch(() => null)) as unknown };
    },
    { method, path, body },
  ) as Promise<{ status: number; body: T }>;
}

// Two people edit the same treatment: the second save is refused, both values are shown, and the person chooses.
describe('an edit made while someone else saved the same treatment', () => {
  const session = useBrowserSession();

  for (const size of [
    { name: 'laptop', width: 1280, height: 800 },
    { name: 'phone', width: 390, height: 844 },
  ]) {
    it(`shows theirs beside the stored value and keeps theirs when asked (${size.name})`, async () => {
      const page = session.page;
      await page.setViewportSize({ width: size.width, height: size.height });
      await signIn(page, 'investigator@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const code = `EC-${Date.now().toString(36).toUpperCase()}`;
      const trial = await api(page, 'POST', '/trials', { code, title: 'Browser test: two edits at once', design: 'rcbd', seed: 'conflict' });
      expect(trial.status).toBe(201);
      const treatment = await api(page, 'POST', `/trials/${trial.body.id}/treatments`, { code: 'GYP', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum' });
      expect(treatment.status).toBe(201);

      await page.goto(`${baseUrl()}/trials/${trial.body.id}/protocol`);
      await page.getByRole('button', { name: 'Edit GYP' }).click();
      await page.getByRole('dialog').getByLabel('Name', { exact: true }).fill('Gypsum, fine grade');
      // Someone else saves the same treatment meanwhile (version 1 → 2).
      const theirs = await api(page, 'PATCH', `/trials/${trial.body.id}/treatments/${treatment.body.id}`, { version: treatment.body.version, name: 'Gypsum, coarse grade' });
      expect(theirs.status).toBe(200);
      await page.getByRole('dialog').getByRole('button', { name: 'Save treatment', exact: true }).click();

      const conflict = page.getByRole('dialog', { name: 'Someone else changed treatment GYP' });
      await conflict.waitFor();
      const name = conflict.getByRole('group', { name: 'Name' });
      await name.getByText('Gypsum, fine grade', { exact: true }).waitFor();
      await name.getByText('Gypsum, coarse grade', { exact: true }).waitFor();
      await screenshot(page, `edit-conflict-${size.name}`);
      expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);

      await conflict.getByRole('button', { name: 'Keep mine' }).click();
      await page.getByRole('dialog').first().waitFor({ state: 'detached' });
      const stored = await api<{ treatments: Array<{ code: string; name: string; version: number }> }>(page, 'GET', `/trials/${trial.body.id}`);
      const saved = stored.body.treatments.find((t) => t.code === 'GYP');
      expect(saved).toMatchObject({ name: 'Gypsum, fine grade', version: 3 });
      await page.getByText('Gypsum, fine grade', { exact: true }).first().waitFor();
      expect(session.outside).toEqual([]);
    });
  }
});

// Locking the trial from the Ledger after someone else saved it: the same conflict dialog as an edit, and the lock on purpose.
describe('a lock chosen while someone else saved the trial', () => {
  const session = useBrowserSession();

  for (const size of [
    { name: 'laptop', width: 1280, height: 800 },
    { name: 'phone', width: 390, height: 844 },
  ]) {
    it(`shows the status chosen beside the stored one and locks only when asked (${size.name})`, async () => {
      const page = session.page;
      await page.setViewportSize({ width: size.width, height: size.height });
      await signIn(page, 'investigator@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const code = `LC-${Date.now().toString(36).toUpperCase()}`;
      const trial = await api(page, 'POST', '/trials', { code, title: 'Browser test: a lock and an edit at once', design: 'rcbd', seed: 'lock-conflict', startDate: '2026-05-01' });
      expect(trial.status).toBe(201);
      const base = `/trials/${trial.body.id}`;
      for (const body of [
        { code: 'C', name: 'Control', isControl: true },
        { code: 'G', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum' },
      ]) {
        expect((await api(page, 'POST', `${base}/treatments`, body)).status).toBe(201);
      }
      const measure = await api(page, 'POST', `${base}/measures`, { code: 'DT', name: 'drain time', unit: 's', kind: 'time-with-cutoff', cutoff: 600, decimals: 0, higherIsBetter: false });
      expect(measure.status).toBe(201);
      expect((await api(page, 'POST', `${base}/rounds`, { label: 'Day 0', dayOffset: 0, measureIds: [measure.body.id] })).status).toBe(201);
      const site = await api(page, 'POST', `${base}/sites`, { name: 'Lock Garden', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4, labelPrefix: 'LG' });
      expect(site.status).toBe(201);
      expect((await api(page, 'POST', `${base}/sites/${site.body.id}/randomize`, {})).status).toBe(200);
      const draft = await api<{ version: number }>(page, 'GET', base);
      expect((await api(page, 'PATCH', base, { version: draft.body.version, status: 'active' })).status).toBe(200);

      await page.goto(`${baseUrl()}${base}/ledger`);
      await page.getByRole('button', { name: 'Lock the trial' }).waitFor();
      // Someone else saves the trial after the page read it.
      const opened = await api<{ version: number }>(page, 'GET', base);
      expect((await api(page, 'PATCH', base, { version: opened.body.version, title: 'Renamed by someone else' })).status).toBe(200);
      await page.getByRole('button', { name: 'Lock the trial' }).click();
      await page.getByRole('alertdialog').getByRole('button', { name: 'Lock', exact: true }).click();

      const conflict = page.getByRole('dialog', { name: `Someone else changed trial ${code}` });
      await conflict.waitFor();
      const status = conflict.getByRole('group', { name: 'Status' });
      await status.getByText('Locked for analysis', { exact: true }).waitFor();
      await status.getByText('Open for data', { exact: true }).waitFor();
      await screenshot(page, `lock-conflict-${size.name}`);
      expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
      expect((await api<{ status: string }>(page, 'GET', base)).body.status).toBe('active');

      await conflict.getByRole('button', { name: 'Keep mine' }).click();
      await conflict.waitFor({ state: 'detached' });
      await page.getByRole('button', { name: 'Unlock the trial' }).waitFor();
      const stored = await api<{ status: string; title: string; version: number }>(page, 'GET', base);
      expect(stored.body).toMatchObject({ status: 'locked', title: 'Renamed by someone else', version: opened.body.version + 2 });
      expect(session.outside).toEqual([]);
    });
  }
});
