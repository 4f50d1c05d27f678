import type { Observation } from '@friable/contracts';
import ExcelJS from 'exceljs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { api, openHollowLaneIntake, screenshot, useBrowserSession } from './support';

/** A measure cell's value for a row: plausible, typed as a number, different for each sheet and run. */
function valueFor(heading: string, row: number, seed: number): number | undefined {
  const name = heading.toLowerCase();
  if (name.startsWith('drain time')) return 60 + ((seed + row * 37) % 500);
  if (name.startsWith('crumble score')) return 1 + ((seed + row) % 5);
  if (name.startsWith('water retained')) return 100 + ((seed + row * 13) % 250);
  if (name.startsWith('crust resistance')) return Number(((5 + ((seed + row * 7) % 35)) / 10).toFixed(2));
  return undefined;
}

/**
 * The site's template as a collaborator's workbook of two rounds: "Day 14" first (older values),
 * then "Day 28" under a title row, with its own values and a note on its first plot.
 */
async function twoSheetWorkbook(template: string, seed: number): Promise<{ bytes: Buffer; headers: string[]; rows: Array<Array<string | number>> }> {
  const [header, ...lines] = template.trim().split(/\r?\n/);
  const headers = header!.split(',');
  const sheetRows = (sheetSeed: number) =>
    lines.map((line, row) => line.split(',').map((cell, index) => valueFor(headers[index]!, row, sheetSeed) ?? cell));
  const day28 = sheetRows(seed);
  day28[0]![headers.indexOf('notes')] = 'from the Day 28 sheet';
  const book = new ExcelJS.Workbook();
  const day14 = book.addWorksheet('Day 14');
  day14.addRow(headers);
  for (const row of sheetRows(seed + 101)) day14.addRow(row);
  const second = book.addWorksheet('Day 28');
  second.addRow(['Hollow Lane Community Garden, Day 28']);
  second.addRow(headers);
  for (const row of day28) second.addRow(row);
  return { bytes: Buffer.from(await book.xlsx.writeBuffer()), headers, rows: day28 };
}

const noSideScroll = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('a collaborator uploads the second sheet of a workbook through Intake', () => {
  const session = useBrowserSession();

  async function uploadSecondSheet(viewport: { width: number; height: number }, name: string) {
    const { page } = session;
    await page.setViewportSize(viewport);
    const { trialId, site, round, template } = await openHollowLaneIntake(page);
    const { bytes, headers, rows } = await twoSheetWorkbook(template, Date.now() % 997);
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'hollow-lane-rounds.xlsx', mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', buffer: bytes });
    const sheet = page.getByLabel('Sheet', { exact: true });
    await sheet.waitFor();
    expect(await sheet.locator('option').allTextContents()).toEqual(['Day 14', 'Day 28']);
    // The first sheet holding data is read unless another is chosen.
    await expect(sheet.inputValue()).resolves.toBe('Day 14');
    await sheet.selectOption('Day 28');
    await page.getByText(`sheet “Day 28” · header in row 2 · ${rows.length} rows`).waitFor();
    const preview = page.getByRole('table', { name: 'Preview of the file' });
    const firstRow = preview.locator('tbody tr').first();
    // The plot label column is shown first; row 3 is the sheet's first plot (below the title and the header).
    await expect(firstRow.locator('th').textContent()).resolves.toBe('3');
    const drainAt = headers.findIndex((heading) => heading.startsWith('drain time'));
    await expect(firstRow.innerText()).resolves.toContain('from the Day 28 sheet');
    await expect(firstRow.innerText()).resolves.toContain(String(rows[0]![drainAt]));
    await screenshot(page, `${name}-preview`);
    expect(await noSideScroll(page)).toBeLessThanOrEqual(0);

    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByText(/values would be saved/).waitFor();
    await page.getByRole('button', { name: 'Save these values' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved' }).waitFor();
    await screenshot(page, `${name}-saved`);
    expect(await noSideScroll(page)).toBeLessThanOrEqual(0);

    // What was stored is the Day 28 sheet's, value for value.
    const stored = await api<Observation[]>(page, `/trials/${trialId}/observations?siteId=${site.id}&roundId=${round.id}`);
    for (const row of rows) {
      const drain = stored.find((o) => o.plotLabel === row[0] && o.measureCode === 'DRAIN');
      expect(drain?.valueText, String(row[0])).toBe(String(row[drainAt]));
    }
    expect(stored.find((o) => o.plotLabel === rows[0]![0] && o.measureCode === 'DRAIN')?.notes).toBe('from the Day 28 sheet');
    expect(session.outside).toEqual([]);
  }

  it('on a laptop: chooses the second sheet, sees its rows, checks and saves them', async () => {
    await uploadSecondSheet({ width: 1280, height: 800 }, 'intake-workbook-desktop');
  });

  it('on a phone: the same, without sideways scrolling', async () => {
    await uploadSecondSheet({ width: 390, height: 844 }, 'intake-workbook-phone');
  });
});
