import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { mkdirSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { screenshot, screenshotDir, signIn, useBrowserSession } from './support';

/** Every page's text of a PDF, read with PDF.js. */
async function pdfText(bytes: Uint8Array): Promise<string[]> {
  const document = await getDocument({ data: bytes, useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: string[] = [];
  for (let number = 1; number <= document.numPages; number += 1) {
    const content = await (await document.getPage(number)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' ').replace(/\s+/g, ' '));
  }
  return pages;
}

describe('printed Sheets', () => {
  const session = useBrowserSession();

  it('print to a PDF with the plot plan first, each plot’s amount in both unit systems, the cut-off rule and the cautions', async () => {
    const { page } = session;
    await signIn(page, 'hollow.lane@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.getByRole('link', { name: 'Heavy-clay amendments across three Fernwick gardens' }).click();
    await page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    await page.getByRole('table', { name: 'Plot plan of Hollow Lane Community Garden', exact: true }).waitFor();
    await page.getByLabel('Sheets for').selectOption({ label: 'Day 14' });
    await page.getByRole('button', { name: 'Show Sheets' }).click();
    const sheet = page.getByRole('table', { name: 'Data sheet Day 14 at Hollow Lane Community Garden' });
    await sheet.waitFor();
    // One QR code per plot on the data sheet, drawn before printing.
    await expect.poll(() => sheet.getByRole('img', { name: /^QR code: open HL-.* in the Round walk$/ }).count()).toBe(25);
    await screenshot(page, 'sheets-screen');

    const pdf = await page.pdf({ format: 'A4', landscape: true, printBackground: true });
    mkdirSync(screenshotDir, { recursive: true });
    writeFileSync(resolve(screenshotDir, 'sheets-hollow-lane-day-14.pdf'), pdf);
    const pages = await pdfText(new Uint8Array(pdf));
    const all = pages.join('\n');
    // The plot plan comes first, with the amounts: 40 lb/1000 ft² of gypsum on 1.44 m² = 281 g = 9.92 oz,
    // a 1 in compost layer = 36.6 L = 9.66 US gal (DOMAIN.md factors, as on the screen's amounts table).
    expect(pages[0]).toContain('Plot plan');
    expect(pages[0]).toContain('281 g (9.92 oz)');
    expect(pages[0]).toContain('36.6 L (9.66 gal)');
    expect(all).toContain('Data sheet — Day 14');
    expect(all).toContain('cut-off 600');
    expect(all).toMatch(/written “>600”, not 600/);
    // Each plot row carries its amount; every data sheet page carries the cautions.
    expect(all.split('281 g (9.92 oz)').length - 1).toBeGreaterThanOrEqual(6);
    expect(all).toMatch(/dust mask and eye protection/);
    expect(all).toMatch(/wash your hands/);
    expect(all).toContain('HL-B5-P05');
    expect(all).not.toContain('Data sheet — Day 0');
    expect(session.outside).toEqual([]);
  });
});
