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
