import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { api, openHollowLaneIntake, screenshot, useBrowserSession } from './support';

const ROWS = 300_000;

/**
 * A long file for Hollow Lane's Day 28: the template's header, then 300,000 rows of plots the site
 * does not have (as when a whole season's export is sent to one site by mistake). The server
 * checks every row, so its "checking rows" stage lasts long enough to be seen and followed.
 */
function longFile(header: string): Buffer {
  const width = header.split(',').length;
  const lines = [header];
  for (let index = 1; index <= ROWS; index += 1) lines.push([`HL-X${index}`, ...Array.from({ length: width - 1 }, () => '')].join(','));
  return Buffer.from(`${lines.join('\n')}\n`);
}

const noSideScroll = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('Intake shows a long upload’s progress: sending, then the server’s stages with counts, also after a reload', () => {
  const session = useBrowserSession();

  async function openIntake(viewport: { width: number; height: number }) {
    const { page } = session;
    await page.setViewportSize(viewport);
    const { template } = await openHollowLaneIntake(page);
    const file = longFile(template.split(/\r?\n/)[0]!);
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'whole-season.csv', mimeType: 'text/csv', buffer: file });
    await page.getByRole('table', { name: 'Preview of the file' }).waitFor();
    return page;
  }

  it('on a laptop: the upload bar, then "checking rows" with a growing count, then every problem by row', async () => {
    const page = await openIntake({ width: 1280, height: 800 });
    // Only the file's head is read in the browser.
    await page.getByText(/whole-season\.csv · [\d.]+ MB · the first [\d,]+ rows shown/).waitFor();
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('progressbar', { name: 'Upload progress' }).waitFor();
    const server = page.getByRole('status', { name: 'Progress on the server' });
    await server.getByText(/^Checking rows: [\d,]+ rows? checked so far$/).waitFor({ timeout: 60_000 });
    await expect(server.locator('[aria-current="step"]').textContent()).resolves.toBe('Checking rows');
    await screenshot(page, 'intake-progress-desktop');
    // Other pages keep answering while the server reads the file.
    const started = Date.now();
    await api(page, '/health');
    expect(Date.now() - started).toBeLessThan(5_000);
    const problems = page.getByRole('table', { name: 'Problems in the file' });
    await problems.waitFor({ timeout: 120_000 });
    expect(await problems.innerText()).toContain('HL-X1');
    await page.getByText(`Nothing was written: the file has ${ROWS.toLocaleString('en')} problems; the first 500 rows with one are listed.`, { exact: false }).first().waitFor();
    expect(await noSideScroll(page)).toBeLessThanOrEqual(0);
    expect(session.outside).toEqual([]);
  }, 240_000);

  it('on a phone: a page reloaded while the server checks the file shows that upload, follows it, and says how it ended', async () => {
    const page = await openIntake({ width: 390, height: 844 });
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('status', { name: 'Progress on the server' }).getByText(/^Checking rows: /).waitFor({ timeout: 60_000 });
    await page.reload();
    const followed = page.getByRole('status', { name: 'whole-season.csv from Tobin Reyes (a check only)' });
    const ended = page.getByText(/Nothing was written: the file has [\d,]+ problems/).first();
    // Either it is still being checked (then it is followed to its end), or it ended while the page loaded.
    await Promise.race([followed.getByText(/^Checking rows: [\d,]+ rows? checked so far$/).waitFor({ timeout: 60_000 }), ended.waitFor({ timeout: 60_000 })]);
    if (await followed.isVisible()) await screenshot(page, 'intake-progress-phone');
    await ended.waitFor({ timeout: 120_000 });
    expect(await noSideScroll(page)).toBeLessThanOrEqual(0);
    expect(session.outside).toEqual([]);
  }, 240_000);
});
