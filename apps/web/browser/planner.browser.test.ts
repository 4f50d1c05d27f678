import type { ActivityEntry } from '@friable/contracts';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { forbidOutsideRequests, launchBrowser, screenshot, signIn } from './support';

const demoTitle = 'Heavy-clay amendments across three Fernwick gardens';
const viewports = [
  { name: 'desktop', width: 1280, height: 800 },
  { name: 'phone', width: 390, height: 844 },
];

/** Calls the API as the signed-in person of this page (the token the app keeps). */
async function api<T>(page: Page, path: string, json?: unknown): Promise<T> {
  return page.evaluate(
    async ({ address, body }) => {
      const headers: Record<string, string> = { 'X-Friable-CSRF': '1' };
      if (body !== undefined) headers['Content-Type'] = 'application/json';
      const response = await fetch(`/api${address}`, { method: body === undefined ? 'GET' : 'POST', headers, body: body === undefined ? undefined : JSON.stringify(body) });
      if (!response.ok) throw new Error(`${address}: ${response.status} ${await response.text()}`);
      return response.json();
    },
    { address: path, body: json },
  ) as Promise<T>;
}

async function setBox(page: Page, label: string, text: string) {
  await page.getByLabel(label, { exact: true }).fill(text);
}

/** The page is no wider than its window (nothing scrolls sideways on a phone). */
async function expectNoSidewaysScroll(page: Page) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
}

describe('the investigator plans blocks and reads the trial’s activity', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());

  for (const viewport of viewports) {
    it(`Planner: the recommended blocks are the API's answer, with a drawn curve (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height }, isMobile: viewport.name === 'phone' });
      const page = await context.newPage();
      const outside: string[] = [];
      forbidOutsideRequests(page, outside);
      await signIn(page, 'investigator@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      await page.getByRole('link', { name: 'Planner', exact: true }).click();
      await page.getByRole('heading', { name: 'Planner', exact: true }).waitFor();

      // The person's trials are offered as sources of a CV (the demo keeps no saved analyses, so it is typed here).
      await expect.poll(() => page.getByLabel('Earlier trial').locator('option').count()).toBeGreaterThan(1);
      await setBox(page, 'Treatments', '5');
      await setBox(page, 'CV', '20');
      await setBox(page, 'Difference', '25');
      await setBox(page, 'Target power', '0.8');
      await page.getByRole('button', { name: 'Work out the blocks' }).click();

      const answer = page.locator('.fr-planner__answer strong');
      await answer.waitFor();
      const expected = await api<{ blocks: number; power: number }>(page, '/stats/power', { treatments: 5, cv: 20, difference: 25, alpha: 0.05, sites: 1, targetPower: 0.8 });
      expect(await answer.textContent()).toBe(String(expected.blocks));
      expect(await page.locator('.fr-result-card').innerText()).toContain(`Power ${Math.round(expected.power * 100)}% with ${expected.blocks} blocks at one site`);

      // The curve is drawn by Plotly (loaded with this page only): one line through every point from 2 blocks.
      const plot = page.locator('.fr-planner__plot .main-svg').first();
      await plot.waitFor();
      await expect.poll(() => page.locator('.fr-planner__plot .scatterlayer .trace path.js-line').count()).toBeGreaterThan(0);
      const rows = page.getByRole('table', { name: 'Power at each number of blocks' }).locator('tbody tr');
      await expect.poll(() => rows.count()).toBeGreaterThanOrEqual(expected.blocks - 1);
      expect(await rows.filter({ hasText: '(recommended)' }).innerText()).toContain(String(expected.blocks));

      await expectNoSidewaysScroll(page);
      await screenshot(page, `planner-${viewport.name}`);
      expect(outside).toEqual([]);
      await context.close();
    });

    it(`Activity: the demo trial's trail, filtered by a site (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height }, isMobile: viewport.name === 'phone' });
      const page = await context.newPage();
      await signIn(page, 'investigator@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      await page.getByRole('link', { name: demoTitle }).click();
      await page.getByRole('heading', { name: demoTitle }).waitFor();
      await page.getByRole('navigation', { name: 'Trial sections' }).getByRole('link', { name: 'Activity', exact: true }).click();
      const list = page.getByRole('list', { name: 'Changes, newest first' });
      await list.waitFor();
      expect(await list.getByRole('listitem').count()).toBeGreaterThan(5);

      const trialId = Number(new URL(page.url()).pathname.split('/')[2]);
      const site = 'Hollow Lane Community Garden';
      const asked = page.waitForRequest((request) => request.url().includes(`/api/trials/${trialId}/activity?siteId=`));
      await page.getByLabel('Site', { exact: true }).selectOption({ label: site });
      const siteId = Number(new URL((await asked).url()).searchParams.get('siteId'));
      const fromApi = await api<ActivityEntry[]>(page, `/trials/${trialId}/activity?siteId=${siteId}`);
      expect(fromApi.length).toBeGreaterThan(0);
      await expect.poll(() => list.getByRole('listitem').count()).toBe(fromApi.length);
      // Every entry shown is about that site, and reads as the API's sentence.
      const metas = await list.locator('.fr-activity__meta').allInnerTexts();
      expect(metas.every((meta) => meta.includes(`at ${site}`))).toBe(true);
      expect(await list.locator('.fr-activity__summary').allInnerTexts()).toEqual(fromApi.map((e) => e.summary));

      await expectNoSidewaysScroll(page);
      await screenshot(page, `activity-${viewport.name}`);
      await context.close();
    });
  }
});
