import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, screenshot, signIn, useBrowserSession } from './support';

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
  const session = useBrowserSession({ acceptDownloads: true });

  it('creates the trial, adds treatments, a measure, a round and two sites, randomizes both and downloads a template', async () => {
    const code = `BT-${Date.now().toString(36).toUpperCase()}`;
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();

    await session.page.getByRole('button', { name: 'New trial' }).click();
    await fill(session.page, 'Code', code);
    await fill(session.page, 'Title', 'Browser test: gypsum and compost on clay');
    await screenshot(session.page, 'new-trial-dialog');
    await submitDialog(session.page, 'Create trial');
    await session.page.getByRole('heading', { name: 'Browser test: gypsum and compost on clay' }).waitFor();
    expect(new URL(session.page.url()).pathname).toMatch(/^\/trials\/\d+\/protocol$/);
    const trialId = Number(new URL(session.page.url()).pathname.split('/')[2]);

    // Three treatments, one of them the untreated control.
    await session.page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(session.page, 'Code', 'CTL');
    await fill(session.page, 'Name', 'Untreated');
    await session.page.getByRole('dialog').getByText('Untreated control (nothing applied)').click();
    await submitDialog(session.page, 'Add treatment');

    await session.page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(session.page, 'Code', 'GYP');
    await fill(session.page, 'Name', 'Gypsum');
    await fill(session.page, 'Rate', '40');
    await session.page.getByRole('dialog').getByLabel('Material', { exact: true }).selectOption('gypsum');
    await screenshot(session.page, 'treatment-dialog');
    await submitDialog(session.page, 'Add treatment');

    await session.page.getByRole('button', { name: 'Add treatment' }).click();
    await fill(session.page, 'Code', 'CMP');
    await fill(session.page, 'Name', 'Compost, 1 in layer');
    await fill(session.page, 'Rate', '1');
    await session.page.getByRole('dialog').getByLabel('Unit', { exact: true }).selectOption('in');
    await submitDialog(session.page, 'Add treatment');

    // A measure with a cut-off, and a round that reads it.
    await session.page.getByRole('button', { name: 'Add measure' }).click();
    await fill(session.page, 'Code', 'DRAIN');
    await fill(session.page, 'Name', 'drain time');
    await session.page.getByRole('dialog').getByLabel('Unit', { exact: true }).selectOption('s');
    await session.page.getByRole('dialog').getByLabel('Kind', { exact: true }).selectOption('time-with-cutoff');
    await fill(session.page, 'Cut-off', '600');
    await fill(session.page, 'Decimals', '0');
    // A time with a cut-off: "lower is better" is offered already; the person confirms it.
    await session.page.getByRole('dialog').getByText('Lower is better').click();
    await submitDialog(session.page, 'Add measure');

    await session.page.getByRole('button', { name: 'Add round' }).click();
    await fill(session.page, 'Label', 'Day 0');
    await fill(session.page, 'Day', '0');
    await submitDialog(session.page, 'Add round');
    await session.page.getByRole('cell', { name: 'Day 0', exact: true }).waitFor();

    // Two sites.
    await session.page.getByRole('link', { name: 'Sites', exact: true }).click();
    for (const [name, prefix] of [
      ['Hollow Lane beds', 'HB'],
      ['Millbrook plots', 'MP'],
    ]) {
      await session.page.getByRole('button', { name: 'Add site' }).click();
      await fill(session.page, 'Name', name);
      await fill(session.page, 'Label prefix', prefix);
      await fill(session.page, 'Length', '1.2');
      await fill(session.page, 'Width', '1.2');
      await fill(session.page, 'Blocks', '4');
      await session.page.getByRole('dialog').getByText('1.44 m² (15.5 ft²)').waitFor();
      if (prefix === 'HB') await screenshot(session.page, 'site-dialog');
      await submitDialog(session.page, 'Add site');
    }
    await session.page.getByLabel('Site Millbrook plots').waitFor();
    // Guardrail: 3 treatments × 4 blocks leaves (3 − 1)(4 − 1) = 6 error degrees of freedom, below 12 (DOMAIN.md).
    await expect(session.page.getByLabel('Site Millbrook plots').getByText('Worth a second look').isVisible()).resolves.toBe(true);

    for (const name of ['Hollow Lane beds', 'Millbrook plots']) {
      await session.page.getByRole('button', { name: `Randomize ${name}`, exact: true }).click();
      await session.page.getByRole('dialog').getByText('Leave empty to use the trial’s seed', { exact: false }).waitFor();
      await submitDialog(session.page, 'Randomize');
      await session.page.getByRole('button', { name: `Randomize again ${name}` }).waitFor();
    }
    await expect(session.page.getByText('12 plots, randomized', { exact: false }).count()).resolves.toBe(2);
    await screenshot(session.page, 'sites-investigator');

    // The protocol now shows the amount per plot at each site: 40 lb/1000 ft² × 1.44 m² = 281 g (DOMAIN.md factors).
    await session.page.getByRole('link', { name: 'Protocol', exact: true }).click();
    await session.page.getByText('Hollow Lane beds: 281 g (9.92 oz)').waitFor();
    await screenshot(session.page, 'protocol-investigator');

    // The plot plan map and a template download.
    await session.page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    const map = session.page.getByRole('table', { name: 'Plot plan of Hollow Lane beds', exact: true });
    await map.waitFor();
    await expect(map.getByRole('row').count()).resolves.toBe(4);
    await expect(map.getByText('GYP', { exact: true }).count()).resolves.toBe(4);
    await screenshot(session.page, 'plot-plan-investigator');

    const downloading = session.page.waitForEvent('download');
    await session.page.getByRole('button', { name: 'CSV template — Day 0' }).click();
    const download = await downloading;
    expect(download.suggestedFilename()).toMatch(new RegExp(`^${code}-HB-Day-0\\.csv$`));
    const csv = readFileSync((await download.path())!, 'utf8').split('\r\n').filter(Boolean);
    expect(csv[0]).toBe('plot label,block,treatment code,drain time (s),missing reason,notes');
    expect(csv).toHaveLength(13);
    const rows = csv.slice(1).map((line) => line.split(','));
    expect(rows.every((cells) => /^HB-/.test(cells[0]) && ['CTL', 'GYP', 'CMP'].includes(cells[2]) && cells.slice(3).every((c) => c === ''))).toBe(true);
    for (let block = 1; block <= 4; block += 1) {
      expect(rows.filter((cells) => cells[1] === String(block)).map((cells) => cells[2]).sort()).toEqual(['CMP', 'CTL', 'GYP']);
    }

    // Sheets, as they print.
    await session.page.getByRole('button', { name: 'Show Sheets' }).click();
    await session.page.getByText('Data sheet — Day 0', { exact: false }).waitFor();
    await screenshot(session.page, 'plot-plan-sheets');
    await session.page.emulateMedia({ media: 'print' });
    await expect(session.page.getByRole('navigation', { name: 'Trial sections' }).isVisible()).resolves.toBe(false);
    await screenshot(session.page, 'plot-plan-print');
    await session.page.emulateMedia({ media: 'screen' });

    // Activation: every check passes now.
    await session.page.getByRole('link', { name: 'Protocol', exact: true }).click();
    await session.page.getByRole('button', { name: 'Activate trial' }).click();
    // It asks once, saying what changes with it.
    await session.page.getByRole('alertdialog').getByRole('button', { name: 'Activate now', exact: true }).click();
    await session.page.getByText('Active', { exact: true }).first().waitFor();
    const status = await session.page.evaluate(async (id) => {
      const response = await fetch(`/api/trials/${id}`, { headers: { 'X-Friable-CSRF': '1' } });
      return ((await response.json()) as { status: string }).status;
    }, trialId);
    expect(status).toBe('active');
    expect(session.outside).toEqual([]);
  });

  it('shows the server’s messages beside the fields they name', async () => {
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.getByRole('button', { name: 'New trial' }).click();
    await fill(session.page, 'Code', 'x');
    await fill(session.page, 'Title', 'ab');
    await session.page.getByRole('dialog').getByRole('button', { name: 'Create trial' }).click();
    await session.page.getByRole('dialog').getByText('code must be 2 to 20 letters, digits or dashes').waitFor();
    await session.page.getByRole('dialog').getByText('title must be at least 3 characters long').waitFor();
    await screenshot(session.page, 'new-trial-errors');
  });

  it('works out doses in the Rate calculator, with the cautions beside the result', async () => {
    await signIn(session.page, 'millbrook@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.goto(`${baseUrl()}/rate-calculator`);
    await session.page.getByRole('heading', { name: 'Rate calculator' }).waitFor();
    // DOMAIN.md: 40 lb/1000 ft² on a 1.2 m × 1.2 m plot = 195.3 g/m² × 1.44 m² = 281 g.
    await session.page.getByText('281 g', { exact: true }).waitFor();
    await session.page.getByText('Checked with Friable’s server.').waitFor();
    await session.page.getByText('Round (inside diameter)', { exact: true }).click();
    await session.page.getByLabel('Inside diameter', { exact: true }).fill('30');
    // DOMAIN.md worked example: 13.8 g for a pot of 30 cm inside diameter.
    await session.page.getByText('13.8 g', { exact: true }).waitFor();
    await expect(session.page.getByText(/dust mask and eye protection/).isVisible()).resolves.toBe(true);
    await screenshot(session.page, 'rate-calculator');

    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
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
