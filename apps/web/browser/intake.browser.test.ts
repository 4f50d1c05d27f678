import type { Observation } from '@friable/contracts';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { api, baseUrl, forbidOutsideRequests, launchBrowser, openHollowLaneIntake, screenshot } from './support';

/** Fills the template's measure cells: plausible values that differ on every run, so each commit changes something. */
function fillTemplate(template: string, seed: number): string {
  const [header, ...lines] = template.trim().split(/\r?\n/);
  const columns = header!.split(',');
  const valueFor = (heading: string, row: number): string | undefined => {
    const name = heading.toLowerCase();
    if (name.startsWith('drain time')) return String(60 + ((seed + row * 37) % 500));
    if (name.startsWith('crumble score')) return String(1 + ((seed + row) % 5));
    if (name.startsWith('water retained')) return String(100 + ((seed + row * 13) % 250));
    if (name.startsWith('crust resistance')) return ((5 + ((seed + row * 7) % 35)) / 10).toFixed(2);
    return undefined;
  };
  const filled = lines.map((line, row) =>
    line
      .split(',')
      .map((cell, index) => valueFor(columns[index]!, row) ?? cell)
      .join(','),
  );
  return [header, ...filled].join('\n') + '\n';
}

describe('a site collaborator uploads a round of data through Intake', () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  const outside: string[] = [];

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());
  afterEach(() => context?.close());

  it('fetches the template, sees a broken file refused row by row, fixes it, commits and finds the values in the Ledger', async () => {
    context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    page = await context.newPage();
    forbidOutsideRequests(page, outside);
    const { trialId, site, round, template } = await openHollowLaneIntake(page);
    const good = fillTemplate(template, Date.now() % 997);
    const lines = good.trim().split('\n');
    const firstCells = lines[1]!.split(',');
    const broken = [lines[0], ['HL-ZZ-P99', ...firstCells.slice(1)].join(','), lines[2]!.replace(/^([^,]*,[^,]*,[^,]*,)[^,]*/, '$1abc'), ...lines.slice(3)].join('\n');

    expect(await page.getByLabel('Site', { exact: true }).locator('option').allTextContents()).toEqual(['Hollow Lane Community Garden']);

    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'hollow-lane-day-28.csv', mimeType: 'text/csv', buffer: Buffer.from(broken) });
    await page.getByRole('table', { name: 'Preview of the file' }).waitFor();
    await page.getByRole('button', { name: 'Check the file' }).click();
    const problems = page.getByRole('table', { name: 'Problems in the file' });
    await problems.waitFor();
    const problemText = await problems.innerText();
    expect(problemText).toContain('HL-ZZ-P99');
    expect(problemText).toMatch(/abc/);
    expect(await page.locator('tr[aria-invalid="true"] th').allTextContents()).toEqual(['!2', '!3']);
    await screenshot(page, 'intake-problems');

    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'hollow-lane-day-28.csv', mimeType: 'text/csv', buffer: Buffer.from(good) });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByText(/values would be saved/).waitFor();
    await screenshot(page, 'intake-dry-run');
    await page.getByRole('button', { name: 'Save these values' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved' }).waitFor();

    // The same bytes again: the server says nothing would change.
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'hollow-lane-day-28.csv', mimeType: 'text/csv', buffer: Buffer.from(good) });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByText(/byte for byte the one uploaded last time/).waitFor();

    const stored = await api<Observation[]>(page, `/trials/${trialId}/observations?siteId=${site.id}&roundId=${round.id}`);
    const firstPlot = firstCells[0]!;
    const drain = stored.find((o) => o.plotLabel === firstPlot && o.measureCode === 'DRAIN')!;
    expect(drain.valueText).toBe(good.split('\n')[1]!.split(',')[lines[0]!.split(',').findIndex((h) => h.startsWith('drain time'))]);

    await page.goto(`${baseUrl()}/trials/${trialId}/ledger?site=${site.id}&round=${round.id}`);
    await page.getByText(/values recorded/).waitFor();
    const grid = page.locator('.bp6-table-quadrant-main');
    await expect(grid.getByText(drain.valueText!, { exact: true }).first().isVisible()).resolves.toBe(true);
    await screenshot(page, 'ledger-desktop');

    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${baseUrl()}/trials/${trialId}/intake?site=${site.id}&round=${round.id}`);
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'hollow-lane-day-28.csv', mimeType: 'text/csv', buffer: Buffer.from(broken) });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('table', { name: 'Problems in the file' }).waitFor();
    await screenshot(page, 'intake-phone');
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await page.goto(`${baseUrl()}/trials/${trialId}/ledger?site=${site.id}&round=${round.id}`);
    await page.getByText(/values recorded/).waitFor();
    await screenshot(page, 'ledger-phone');
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    expect(outside).toEqual([]);
  });
});
