import { readFileSync } from 'node:fs';
import type { TrialSummary } from '@friable/contracts';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, drawCharts, launchBrowser, screenshot, signIn } from './support';

// Montgomery, Design and Analysis of Experiments: hardness-testing tips (4 tips × 4 coupons as blocks),
// datasets/reference/STATISTICS.md B.1. Expected: F(tips) = 14.44 (NDSU SAS listing; R: F = 14.438),
// Tukey groups {1, 2, 3} and {4} (multcomp::cld, R 4.2.2, as listed there: 1 a, 2 a, 3 a, 4 b).
const hardness = [
  'tip,coupon,hardness',
  ...[
    [9.3, 9.4, 9.6, 10.0],
    [9.4, 9.3, 9.8, 9.9],
    [9.2, 9.4, 9.5, 9.7],
    [9.7, 9.6, 10.0, 10.2],
  ].flatMap((row, tip) => row.map((value, coupon) => `${tip + 1},${coupon + 1},${value.toFixed(1)}`)),
].join('\n');

async function trialId(page: Page, code: string): Promise<number> {
  const trials = await page.evaluate(async () => {
    const response = await fetch('/api/trials', { headers: { 'X-Friable-CSRF': '1' } });
    return response.json();
  });
  return (trials as TrialSummary[]).find((t) => t.code === code)!.id;
}

/** The letters column of the means table, by treatment code. */
async function lettersByTreatment(page: Page): Promise<Record<string, string>> {
  const rows = page.getByRole('table', { name: 'Treatment means' }).locator('tbody tr');
  const out: Record<string, string> = {};
  for (let i = 0; i < (await rows.count()); i++) {
    const code = (await rows.nth(i).locator('th .fr-code').innerText()).trim();
    out[code] = (await rows.nth(i).locator('.fr-findings-letters').innerText()).trim();
  }
  return out;
}

describe('Findings and Quick analysis', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());

  it('a reviewer saves an analysis and comments on it; sign-off waits for the lock, in words, and the investigator may ask the reviewers instead; the report prints', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await signIn(page, 'reviewer@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const id = await trialId(page, 'FW-CLAY-26');
    await page.goto(`${baseUrl()}/trials/${id}/findings?model=anova`);
    await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
    const title = `Reviewer check ${Date.now()}`;
    await page.getByLabel('Title of the saved analysis').fill(title);
    await page.getByRole('button', { name: 'Save this analysis' }).click();
    await page.getByRole('button', { name: `Open the saved analysis ${title}` }).click();
    await page.getByRole('heading', { name: `Saved analysis: ${title}` }).waitFor();
    await page.getByText('The data have not changed since this analysis was saved.').waitFor();
    await page.getByLabel('Your comment').fill('Check the two Hollow Lane plots flooded in Day 14.');
    await page.getByRole('button', { name: 'Add the comment' }).click();
    await page.getByRole('list', { name: 'Comments' }).getByText('Check the two Hollow Lane plots flooded in Day 14.').waitFor();
    // Sign-off is not offered to the reviewer while the trial is unlocked; the page says when it will be.
    await page.getByText('Sign-off opens once the investigator locks the trial').waitFor();
    expect(await page.getByRole('button', { name: 'Sign off with this statement' }).count()).toBe(0);
    await screenshot(page, 'findings-saved-analysis-wide');
    const address = page.url();
    await context.close();

    const investigator = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    await signIn(investigator, 'investigator@example.org');
    await investigator.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await investigator.goto(address);
    // The trial has reviewers: its investigator may ask them to review, and signs off nothing.
    await investigator.getByRole('button', { name: 'Ask the reviewers to review' }).waitFor();
    expect(await investigator.getByRole('button', { name: 'Sign off with this statement' }).count()).toBe(0);

    await investigator.goto(`${baseUrl()}/trials/${id}/report`);
    await investigator.getByRole('heading', { name: 'What these statistics show, and what they do not' }).waitFor();
    await investigator.locator('.js-plotly-plot .trace').first().waitFor({ timeout: 30_000 });
    await screenshot(investigator, 'findings-report-wide');
    await investigator.emulateMedia({ media: 'print' });
    expect(await investigator.getByRole('navigation', { name: 'Trial sections' }).isVisible()).toBe(false);
    expect(await investigator.getByRole('button', { name: 'Print the report' }).isVisible()).toBe(false);
    await screenshot(investigator, 'findings-report-print');
    await investigator.context().close();
  });

  for (const viewport of [
    { name: 'wide', width: 1280, height: 800 },
    { name: 'phone', width: 390, height: 844 },
  ]) {
    it(`a reviewer reads the demo trial's Findings, switches measure and scope, and downloads the workbook (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport, acceptDownloads: true });
      const page = await context.newPage();
      await signIn(page, 'reviewer@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const id = await trialId(page, 'FW-CLAY-26');
      await page.goto(`${baseUrl()}/trials/${id}/findings?model=anova`);
      await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
      expect(await page.getByRole('group', { name: 'Analysis choices' }).getByLabel('Scope').inputValue()).toBe('');
      expect(await page.getByRole('table', { name: 'Analysis of variance' }).innerText()).toContain('Site × treatment');
      await page.getByLabel('Significance marks').first().getByText('p < 0.001').waitFor();
      const letters = await lettersByTreatment(page);
      expect(Object.values(letters).every((l) => /^[a-z]+$/.test(l))).toBe(true);
      // The plots load lazily and draw their traces as SVG.
      await drawCharts(page, 4);
      await screenshot(page, `findings-combined-${viewport.name}`);
      const width = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(width).toBeLessThanOrEqual(viewport.width);

      // Another measure, one site.
      const measure = page.getByLabel('Measure');
      const options = await measure.locator('option').allInnerTexts();
      await measure.selectOption({ label: options[1]! });
      // A score gets its own model by default; the classical ANOVA is one click away.
      await page.getByRole('button', { name: 'Classical ANOVA' }).click();
      const scope = page.getByLabel('Scope');
      const siteLabel = (await scope.locator('option').allInnerTexts())[1]!;
      await scope.selectOption({ label: siteLabel });
      // The caption names the answer on screen; while a new choice is analysed the previous answer stays, marked
      // "updating…", and a combined caption lists every site, so wait for the one-site answer itself.
      const literal = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
      const oneSite = new RegExp(`^${literal(options[1]!)}.*· ${literal(siteLabel)}$`, 's');
      await expect.poll(() => page.locator('.fr-findings-caption').first().innerText(), { timeout: 30_000 }).toMatch(oneSite);
      expect(await page.getByRole('table', { name: 'Analysis of variance' }).innerText()).not.toContain('Site × treatment');
      await drawCharts(page);
      await screenshot(page, `findings-site-${viewport.name}`);

      const downloading = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Workbook' }).click();
      const download = await downloading;
      expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
      const bytes = readFileSync((await download.path())!);
      expect(bytes.subarray(0, 2).toString('latin1')).toBe('PK');
      await context.close();
    });

    it(`Quick analysis of the pasted hardness-tips RCBD gives F ≈ 14.44 and Tukey's letters (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      await signIn(page, 'reviewer@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      await page.getByRole('link', { name: 'Quick analysis' }).click();
      await page.getByLabel('Data to analyse').fill(hardness);
      await page.getByRole('table', { name: 'Preview' }).waitFor();
      expect(await page.getByLabel('Design').inputValue()).toBe('rcbd');
      await page.getByRole('button', { name: 'Analyse' }).click();
      const anova = page.getByRole('table', { name: 'Analysis of variance' });
      await anova.waitFor();
      const treatmentRow = anova.locator('tr', { hasText: 'Treatments' });
      expect(await treatmentRow.innerText()).toContain('14.44'); // F, STATISTICS.md B.1 (4 significant digits shown)
      expect(await treatmentRow.innerText()).toContain('0.000871'); // p, R: 0.0008713
      // R's cld groups tips 1–3 together and tip 4 alone; Friable gives "a" to the highest mean, so the names swap.
      expect(await lettersByTreatment(page)).toEqual({ '1': 'b', '2': 'b', '3': 'b', '4': 'a' });
      await drawCharts(page);
      await screenshot(page, `quick-analysis-${viewport.name}`);
      const width = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(width).toBeLessThanOrEqual(viewport.width);

      // A design the data cannot carry is refused in words.
      await page.getByLabel('Design').selectOption('crd');
      await page.getByLabel('Data to analyse').fill('tip,hardness\n1,9.3\n2,9.4');
      await page.getByRole('button', { name: 'Analyse' }).click();
      await page.getByText('These data could not be analysed').waitFor();
      await context.close();
    });
  }
});
