import { readFileSync } from 'node:fs';
import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, screenshot, signIn, useBrowserSession } from './support';

async function fillIn(scope: Page | Locator, label: string, value: string) {
  await scope.getByLabel(label, { exact: true }).fill(value);
}

async function submitDialog(page: Page, button: string) {
  await page.getByRole('dialog').getByRole('button', { name: button, exact: true }).click();
  await page.getByRole('dialog').waitFor({ state: 'detached' });
}

async function sideways(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

/** The whole plots drawn on a site's map, each with the sub-plot codes inside it, in order. */
async function wholePlotsOn(page: Page, siteName: string): Promise<Array<{ name: string; subPlots: string[] }>> {
  const map = page.getByRole('table', { name: `Plot plan of ${siteName}`, exact: true });
  await map.waitFor();
  const groups = map.getByRole('group', { name: /^Whole plot / });
  const out: Array<{ name: string; subPlots: string[] }> = [];
  for (const group of await groups.all()) {
    const name = (await group.getAttribute('aria-label')) ?? '';
    const subPlots = await group.locator('.fr-plot__code').allTextContents();
    out.push({ name, subPlots });
  }
  return out;
}

const oneDf = 'A split plot with 2 blocks has only 1 degree of freedom for whole-plot error at the site';

describe('an investigator designs a split plot in the browser', () => {
  const session = useBrowserSession({ acceptDownloads: true });

  it('chooses the design, names the whole-plot and sub-plot factors with rates, adds two sites, reads the guardrail, randomizes and sees whole plots outlined (laptop and phone)', async () => {
    const page = session.page;
    const code = `SP-${Date.now().toString(36).toUpperCase()}`;
    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.getByRole('button', { name: 'New trial' }).click();
    const create = page.getByRole('dialog');
    await fillIn(create, 'Code', code);
    await fillIn(create, 'Title', 'Browser test: compost beds, mulch thirds');
    await create.getByLabel('Design', { exact: true }).selectOption({ label: 'Split plot in blocks' });
    await submitDialog(page, 'Create trial');
    await page.getByRole('heading', { name: 'Browser test: compost beds, mulch thirds' }).waitFor();
    const trialId = Number(new URL(page.url()).pathname.split('/')[2]);

    // Factors: compost on whole plots, mulch on sub plots, each level with its own rate.
    await page.getByRole('button', { name: 'Edit factors' }).click();
    const whole = page.getByRole('group', { name: /^Whole-plot factor/ });
    const sub = page.getByRole('group', { name: /^Sub-plot factor/ });
    await expect(whole.getByText('applied on whole plots').isVisible()).resolves.toBe(true);
    await fillIn(whole, 'Factor name', 'Compost');
    await fillIn(whole, 'Level 1 code', 'N');
    await fillIn(whole, 'Level 1 name', 'No compost');
    await fillIn(whole, 'Level 2 code', 'C');
    await fillIn(whole, 'Level 2 name', 'Compost dug in');
    await fillIn(whole, 'Level 2 rate', '2.5');
    await whole.getByLabel('Level 2 rate unit', { exact: true }).selectOption('cm');
    await fillIn(sub, 'Factor name', 'Mulch');
    await sub.getByRole('button', { name: 'Add a level' }).click();
    for (const [index, levelCode, name] of [
      [1, 'B', 'Bare'],
      [2, 'S', 'Straw'],
      [3, 'W', 'Woodchip'],
    ] as const) {
      await fillIn(sub, `Level ${index} code`, levelCode);
      await fillIn(sub, `Level ${index} name`, name);
      if (levelCode !== 'B') {
        await fillIn(sub, `Level ${index} rate`, '5');
        await sub.getByLabel(`Level ${index} rate unit`, { exact: true }).selectOption('cm');
      }
    }
    await screenshot(page, 'split-plot-factors-dialog');
    await submitDialog(page, 'Save factors');
    const factors = page.getByLabel('Factors', { exact: true });
    await factors.getByText('Whole-plot factor: Compost').waitFor();
    await expect(factors.getByText('Sub-plot factor: Mulch').isVisible()).resolves.toBe(true);
    for (const combination of ['NB', 'NS', 'NW', 'CB', 'CS', 'CW']) await page.getByRole('cell', { name: combination, exact: true }).waitFor();

    // A measure and a round, so there is a sheet and a template.
    await page.getByRole('button', { name: 'Add measure' }).click();
    await fillIn(page.getByRole('dialog'), 'Code', 'CRUST');
    await fillIn(page.getByRole('dialog'), 'Name', 'crust resistance');
    // A softer crust is the aim: the dialog asks which way is better and picks neither.
    await page.getByRole('dialog').getByText('Lower is better', { exact: true }).click();
    await submitDialog(page, 'Add measure');
    await page.getByRole('button', { name: 'Add round' }).click();
    await fillIn(page.getByRole('dialog'), 'Label', 'Day 30');
    await fillIn(page.getByRole('dialog'), 'Day', '30');
    await submitDialog(page, 'Add round');
    await page.getByRole('cell', { name: 'Day 30', exact: true }).waitFor();

    // Two sites, 1 m × 1 m sub plots: one with 4 blocks, one with only 2.
    await page.getByRole('link', { name: 'Sites', exact: true }).click();
    for (const [name, prefix, blocks] of [
      ['Tannery Row beds', 'TR', '4'],
      ['Ashgrove plots', 'AG', '2'],
    ]) {
      await page.getByRole('button', { name: 'Add site' }).click();
      const dialog = page.getByRole('dialog');
      await fillIn(dialog, 'Name', name);
      await fillIn(dialog, 'Label prefix', prefix);
      await fillIn(dialog, 'Length', '1');
      await fillIn(dialog, 'Width', '1');
      await fillIn(dialog, 'Blocks', blocks);
      await submitDialog(page, 'Add site');
    }
    const small = page.getByLabel('Site Ashgrove plots');
    await small.waitFor();
    // Whole-plot error (2 blocks − 1) × (2 compost levels − 1) = 1, said plainly before anything is laid out.
    await small.getByText(oneDf, { exact: false }).waitFor();
    await expect(page.getByRole('list', { name: 'Error strata at Ashgrove plots' }).getByText('Whole-plot error: 1 df').isVisible()).resolves.toBe(true);
    await expect(page.getByRole('list', { name: 'Error strata at Tannery Row beds' }).getByText('Whole-plot error: 3 df').isVisible()).resolves.toBe(true);
    // A whole plot is its 3 sub plots side by side: 3 × 1 m².
    await expect(small.getByText('3 plots side by side, 3 m²', { exact: false }).isVisible()).resolves.toBe(true);

    for (const name of ['Tannery Row beds', 'Ashgrove plots']) {
      await page.getByRole('button', { name: `Randomize ${name}`, exact: true }).click();
      await submitDialog(page, 'Randomize');
      await page.getByRole('button', { name: `Randomize again ${name}` }).waitFor();
    }
    await screenshot(page, 'split-plot-sites');

    // The guardrail stands on the Protocol before the trial starts.
    await page.getByRole('link', { name: 'Protocol', exact: true }).click();
    await page.getByRole('list', { name: 'Design warnings' }).getByText(`Ashgrove plots: ${oneDf}`, { exact: false }).waitFor();
    // Each level's amount per unit it goes on, at each site: 2.5 cm over 3 m² = 75 L per whole plot.
    await page.getByLabel('Factors', { exact: true }).getByText('at Tannery Row beds: 75 L (19.8 gal) per whole plot', { exact: false }).waitFor();
    await screenshot(page, 'split-plot-protocol');

    // Plot plan: whole plots outlined, each holding one sub plot of every mulch under one compost level.
    await page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    const tannery = await wholePlotsOn(page, 'Tannery Row beds');
    expect(tannery.map((w) => w.name.split(':')[0])).toEqual(['B1', 'B2', 'B3', 'B4'].flatMap((b) => [`Whole plot TR-${b}-W1`, `Whole plot TR-${b}-W2`]));
    for (const wholePlot of tannery) {
      expect(new Set(wholePlot.subPlots.map((c) => c[0])).size).toBe(1);
      expect(wholePlot.subPlots.map((c) => c[1]).sort()).toEqual(['B', 'S', 'W']);
      expect(wholePlot.name).toMatch(wholePlot.subPlots[0]![0] === 'C' ? /: C · Compost dug in$/ : /: N · No compost$/);
    }
    // Compost 2.5 cm on a whole plot of 3 sub plots × 1 m² = 3 m²: 75 L (1 cm over 1 m² = 10 L, DOMAIN.md);
    // straw 5 cm on one 1 m² sub plot: 50 L.
    const amounts = page.getByRole('table', { name: 'Amounts per unit at Tannery Row beds' });
    const compostRow = amounts.getByRole('row').filter({ hasText: 'Compost dug in' });
    await expect(compostRow.textContent()).resolves.toMatch(/each whole plot \(3 plots, 3(\.00)? m²/);
    await expect(compostRow.textContent()).resolves.toMatch(/75(\.0)? L/);
    await expect(compostRow.textContent()).resolves.toMatch(/4 whole plots/);
    await expect(amounts.getByRole('row').filter({ hasText: 'Straw' }).textContent()).resolves.toMatch(/each sub plot.*50(\.0)? L.*8 sub plots/);
    await screenshot(page, 'split-plot-plan');

    // The template carries whole plot and sub plot; so do the data sheet and every label.
    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'CSV template — Day 30' }).click();
    const csv = readFileSync((await (await downloading).path())!, 'utf8').split('\r\n').filter(Boolean);
    expect(csv[0]!.split(',').slice(0, 5)).toEqual(['plot label', 'block', 'whole plot', 'sub plot', 'treatment code']);
    expect(csv).toHaveLength(25);
    await page.getByRole('button', { name: 'Show Sheets' }).click();
    await page.getByText('Data sheet — Day 30', { exact: false }).waitFor();
    await expect(page.getByRole('columnheader', { name: 'Whole plot' }).count()).resolves.toBe(1);
    await expect(page.getByText(/^whole plot TR-B1-W1 · sub plot \d$/).count()).resolves.toBe(3);
    await screenshot(page, 'split-plot-sheets');
    expect(session.outside).toEqual([]);

    // The same plan on a phone: whole plots still outlined, nothing to scroll sideways.
    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'investigator@example.org');
    await phonePage.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await phonePage.goto(`${baseUrl()}/trials/${trialId}/plot-plan`);
    const onPhone = await wholePlotsOn(phonePage, 'Tannery Row beds');
    expect(onPhone).toEqual(tannery);
    expect(await sideways(phonePage)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'split-plot-plan-phone');
    await phonePage.goto(`${baseUrl()}/trials/${trialId}/protocol`);
    await phonePage.getByRole('list', { name: 'Design warnings' }).waitFor();
    expect(await sideways(phonePage)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'split-plot-protocol-phone');
    await phone.close();
    // The whole design by hand, twice over (laptop and phone): more than the default minute on a loaded machine.
  }, 150_000);

  it('shows the demo split plot FW-MULCH-27 to its reviewer, whole plots outlined at both gardens', async () => {
    await signIn(session.page, 'reviewer@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.getByRole('link', { name: 'Compost on whole beds, mulch on bed thirds: a split plot on clay' }).click();
    await session.page.getByText('Whole-plot factor: Compost').waitFor();
    await session.page.getByRole('list', { name: 'Design warnings' }).getByText(`Larkspur Close Allotments: ${oneDf}`, { exact: false }).waitFor();
    await session.page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    expect(await wholePlotsOn(session.page, 'Cinder Path Beds')).toHaveLength(8);
    await screenshot(session.page, 'demo-split-plot-plan');
    await session.page.getByLabel('Site', { exact: true }).selectOption({ label: 'Larkspur Close Allotments' });
    expect(await wholePlotsOn(session.page, 'Larkspur Close Allotments')).toHaveLength(4);

    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'reviewer@example.org');
    await phonePage.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await phonePage.getByRole('link', { name: 'Compost on whole beds, mulch on bed thirds: a split plot on clay' }).click();
    await phonePage.getByRole('link', { name: 'Plot plan', exact: true }).click();
    expect(await wholePlotsOn(phonePage, 'Cinder Path Beds')).toHaveLength(8);
    expect(await sideways(phonePage)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'demo-split-plot-plan-phone');
    await phone.close();
  });
});
