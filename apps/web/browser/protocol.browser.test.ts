import { readFileSync } from 'node:fs';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, forbidOutsideRequests, launchBrowser, screenshot, signIn } from './support';

/** Fills a field of the open dialog by its exact label. */
async function fill(page: Page, label: string, value: string) {
  await page.getByRole('dialog').getByLabel(label, { exact: true }).fill(value);
}

async function submitDialog(page: Page, button: string) {
  await page.getByRole('dialog').getByRole('button', { name: button, exact: true }).click();
  await page.getByRole('dialog').waitFor({ state: 'detached' });
}

async function noSideways(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

describe('an investigator designs a two-site trial in the browser', () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  let outside: string[];

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());
  beforeEach(async () => {
    context = await browser.newContext({ viewport: { width: 1280, height: 800 }, acceptDownloads: true });
    page = await context.newPage();
    outside = [];
    forbidOutsideRequests(page, outside);
  });
  afterEach(() => context.close());

  it('creates the trial, adds treatments, a measure, a round and two sites, randomizes both and downloads a template', async () => {
    const code = `BT-${Date.now().toString(36).toUpperCase()}`;
    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();

    await page.getByRole('button', { name: 'New trial' }).click();
    await fill(page, 'Code', code);
    await fill(page, 'Title', 'Browser test: gypsum and compost on clay');
    await screenshot(page, 'new-trial-dialog');
    await submitDialog(page, 'Create trial');
    await page.getByRole('heading', { name: 'Browser test: gypsum and compost on clay' }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/trials\/\d+\/protocol$/);
    const trialId = Number(new URL(page.url()).pathname.split('/')[2]);

    // Three treatments, one of them the untreated control.
    await page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(page, 'Code', 'CTL');
    await fill(page, 'Name', 'Untreated');
    await page.getByRole('dialog').getByText('Untreated control (nothing applied)').click();
    await submitDialog(page, 'Add treatment');

    await page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(page, 'Code', 'GYP');
    await fill(page, 'Name', 'Gypsum');
    await fill(page, 'Rate', '40');
    await page.getByRole('dialog').getByLabel('Material', { exact: true }).selectOption('gypsum');
    await screenshot(page, 'treatment-dialog');
    await submitDialog(page, 'Add treatment');

    await page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(page, 'Code', 'CMP');
    await fill(page, 'Name', 'Compost, 1 in layer');
    await fill(page, 'Rate', '1');
    await page.getByRole('dialog').getByLabel('Unit', { exact: true }).selectOption('in');
    await submitDialog(page, 'Add treatment');

    // A measure with a cut-off, and a round that reads it.
    await page.getByRole('button', { name: 'Add measure' }).click();
    await fill(page, 'Code', 'DRAIN');
    await fill(page, 'Name', 'drain time');
    await page.getByRole('dialog').getByLabel('Unit', { exact: true }).selectOption('s');
    await page.getByRole('dialog').getByLabel('Kind', { exact: true }).selectOption('time-with-cutoff');
    await fill(page, 'Cut-off', '600');
    await fill(page, 'Decimals', '0');
    await page.getByRole('dialog').getByText('Higher is better').click();
    await submitDialog(page, 'Add measure');

    await page.getByRole('button', { name: 'Add round' }).click();
    await fill(page, 'Label', 'Day 0');
    await fill(page, 'Day', '0');
    await submitDialog(page, 'Add round');
    await page.getByRole('cell', { name: 'Day 0', exact: true }).waitFor();

    // Two sites.
    await page.getByRole('link', { name: 'Sites', exact: true }).click();
    for (const [name, prefix] of [
      ['Hollow Lane beds', 'HB'],
      ['Millbrook plots', 'MP'],
    ]) {
      await page.getByRole('button', { name: 'Add site' }).click();
      await fill(page, 'Name', name);
      await fill(page, 'Label prefix', prefix);
      await fill(page, 'Length', '1.2');
      await fill(page, 'Width', '1.2');
      await fill(page, 'Blocks', '4');
      await page.getByRole('dialog').getByText('1.44 m² (15.5 ft²)').waitFor();
      if (prefix === 'HB') await screenshot(page, 'site-dialog');
      await submitDialog(page, 'Add site');
    }
    await page.getByLabel('Site Millbrook plots').waitFor();
    // Guardrail: 3 treatments × 4 blocks leaves (3 − 1)(4 − 1) = 6 error degrees of freedom, below 12 (DOMAIN.md).
    await expect(page.getByLabel('Site Millbrook plots').getByText('Worth a second look').isVisible()).resolves.toBe(true);

    for (const name of ['Hollow Lane beds', 'Millbrook plots']) {
      await page.getByRole('button', { name: `Randomize ${name}`, exact: true }).click();
      await page.getByRole('dialog').getByText('Leave empty to use the trial’s seed', { exact: false }).waitFor();
      await submitDialog(page, 'Randomize');
      await page.getByRole('button', { name: `Randomize again ${name}` }).waitFor();
    }
    await expect(page.getByText('12 plots, randomized', { exact: false }).count()).resolves.toBe(2);
    await screenshot(page, 'sites-investigator');

    // The protocol now shows the amount per plot at each site: 40 lb/1000 ft² × 1.44 m² = 281 g (DOMAIN.md factors).
    await page.getByRole('link', { name: 'Protocol', exact: true }).click();
    await page.getByText('Hollow Lane beds: 281 g (9.92 oz)').waitFor();
    await screenshot(page, 'protocol-investigator');

    // The plot plan map and a template download.
    await page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    const map = page.getByRole('table', { name: 'Plot plan of Hollow Lane beds', exact: true });
    await map.waitFor();
    await expect(map.getByRole('row').count()).resolves.toBe(4);
    await expect(map.getByText('GYP', { exact: true }).count()).resolves.toBe(4);
    await screenshot(page, 'plot-plan-investigator');

    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'CSV template — Day 0' }).click();
    const download = await downloading;
    expect(download.suggestedFilename()).toMatch(new RegExp(`^${code}-HB-Day-0\\.csv$`));
    const csv = readFileSync((await download.path())!, 'utf8').split('\r\n').filter(Boolean);
    expect(csv[0]).toBe('plot label,block,treatment code,drain time (s),notes');
    expect(csv).toHaveLength(13);
    const rows = csv.slice(1).map((line) => line.split(','));
    expect(rows.every((cells) => /^HB-/.test(cells[0]) && ['CTL', 'GYP', 'CMP'].includes(cells[2]) && cells.slice(3).every((c) => c === ''))).toBe(true);
    for (let block = 1; block <= 4; block += 1) {
      expect(rows.filter((cells) => cells[1] === String(block)).map((cells) => cells[2]).sort()).toEqual(['CMP', 'CTL', 'GYP']);
    }

    // Sheets, as they print.
    await page.getByRole('button', { name: 'Show Sheets' }).click();
    await page.getByText('Data sheet — Day 0', { exact: false }).waitFor();
    await screenshot(page, 'plot-plan-sheets');
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByRole('navigation', { name: 'Trial sections' }).isVisible()).resolves.toBe(false);
    await screenshot(page, 'plot-plan-print');
    await page.emulateMedia({ media: 'screen' });

    // Activation: every check passes now.
    await page.getByRole('link', { name: 'Protocol', exact: true }).click();
    await page.getByRole('button', { name: 'Activate trial' }).click();
    await page.getByText('Active', { exact: true }).first().waitFor();
    const status = await page.evaluate(async (id) => {
      const response = await fetch(`/api/trials/${id}`, { headers: { Authorization: `Bearer ${localStorage.getItem('friable.accessToken')}` } });
      return ((await response.json()) as { status: string }).status;
    }, trialId);
    expect(status).toBe('active');
    expect(outside).toEqual([]);
  });

  it('shows the server’s messages beside the fields they name', async () => {
    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.getByRole('button', { name: 'New trial' }).click();
    await fill(page, 'Code', 'x');
    await fill(page, 'Title', 'ab');
    await page.getByRole('dialog').getByRole('button', { name: 'Create trial' }).click();
    await page.getByRole('dialog').getByText('code must be 2 to 20 letters, digits or dashes').waitFor();
    await page.getByRole('dialog').getByText('title must be at least 3 characters long').waitFor();
    await screenshot(page, 'new-trial-errors');
  });

  it('works out doses in the Rate calculator, with the cautions beside the result', async () => {
    await signIn(page, 'millbrook@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.goto(`${baseUrl()}/rate-calculator`);
    await page.getByRole('heading', { name: 'Rate calculator' }).waitFor();
    // DOMAIN.md: 40 lb/1000 ft² on a 1.2 m × 1.2 m plot = 195.3 g/m² × 1.44 m² = 281 g.
    await page.getByText('281 g', { exact: true }).waitFor();
    await page.getByText('Checked with Friable’s server.').waitFor();
    await page.getByText('Round (inside diameter)', { exact: true }).click();
    await page.getByLabel('Inside diameter', { exact: true }).fill('30');
    // DOMAIN.md worked example: 13.8 g for a pot of 30 cm inside diameter.
    await page.getByText('13.8 g', { exact: true }).waitFor();
    await expect(page.getByText(/dust mask and eye protection/).isVisible()).resolves.toBe(true);
    await screenshot(page, 'rate-calculator');

    const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'millbrook@example.org');
    await phonePage.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await phonePage.goto(`${baseUrl()}/rate-calculator`);
    await phonePage.getByText('281 g', { exact: true }).waitFor();
    expect(await noSideways(phonePage)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'rate-calculator-phone');
    await phone.close();
  });
});
