import { readFileSync } from 'node:fs';
import type { TrialSummary } from '@friable/contracts';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, drawCharts, launchBrowser, screenshot, signIn, watchContentSecurityPolicy } from './support';

async function trialId(page: Page, code: string): Promise<number> {
  const trials = await page.evaluate(async () => {
    const response = await fetch('/api/trials');
    return response.json();
  });
  return (trials as TrialSummary[]).find((t) => t.code === code)!.id;
}

/** Waits until the charts of the view have drawn at least `count` traces, then checks nothing scrolls sideways. */
async function chartsDrawn(page: Page, width: number, count = 1): Promise<void> {
  await drawCharts(page, count);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
}

describe('Findings: the model made for each measure', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());

  for (const viewport of [
    { name: 'wide', width: 1280, height: 800 },
    { name: 'phone', width: 390, height: 844 },
  ]) {
    it(`a reviewer opens drain time, sees the not-drained curves and time ratios, switches to rounds over time, then to the ANOVA fallback with its caution (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport, acceptDownloads: true });
      const page = await context.newPage();
      const blocked: string[] = [];
      watchContentSecurityPolicy(page, blocked);
      await signIn(page, 'reviewer@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const id = await trialId(page, 'FW-CLAY-26');
      await page.goto(`${baseUrl()}/trials/${id}/findings`);

      // Drain time comes first and is analysed as censored by default, saying why.
      await page.getByRole('heading', { name: 'Share of plots not yet drained' }).waitFor();
      expect(await page.getByLabel('Measure').locator('option:checked').innerText()).toBe('drain time');
      const picker = page.getByRole('region', { name: 'Which analysis' });
      expect(await picker.getByText('Why this analysis').isVisible()).toBe(true);
      expect(await picker.innerText()).toMatch(/cut-off of 600 s/);
      expect(await picker.getByRole('button', { name: 'Not-drained curves and time ratios · made for this measure' }).getAttribute('aria-pressed')).toBe('true');
      const medians = page.getByRole('table', { name: 'Median drain time per treatment' });
      expect(await medians.locator('tbody tr').count()).toBe(5);
      expect(await page.getByRole('table', { name: 'Time ratio' }).locator('tbody tr').count()).toBe(4);
      expect(await page.getByRole('heading', { name: 'Log-rank test' }).isVisible()).toBe(true);
      // The combined curves, one chart per garden, and the time-ratio chart.
      await chartsDrawn(page, viewport.width, 5);
      expect(await page.getByRole('figure', { name: 'All sites combined' }).count()).toBe(1);
      expect(await page.getByRole('figure', { name: 'Time ratio to the control, 95 % interval' }).count()).toBe(1);
      await screenshot(page, `findings-censored-${viewport.name}`);
      // The analysis on screen downloads as a zip with its data and an R script.
      const downloading = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Analysis with R script' }).click();
      const download = await downloading;
      // Named by the round analysed: the latest with data, which other tests of this run may have added to.
      const round = (await page.getByRole('combobox', { name: 'Round' }).locator('option:checked').innerText()).trim();
      expect(round).toMatch(/^Day \d+$/);
      expect(download.suggestedFilename()).toBe(`FW-CLAY-26-DRAIN-${round.replace(' ', '-')}-censored.zip`);
      expect(readFileSync((await download.path())!).subarray(0, 2).toString('latin1')).toBe('PK');

      // Rounds over time, one click away.
      await picker.getByRole('button', { name: 'Rounds over time' }).click();
      await page.getByRole('table', { name: 'Tests of treatment within each round' }).waitFor();
      const byRound = await page.getByRole('table', { name: 'Tests of treatment within each round' }).innerText();
      expect(byRound).toContain('Day 0');
      expect(byRound).toContain('Day 14');
      expect(await page.getByRole('table', { name: 'Covariance structures compared' }).innerText()).toMatch(/Compound symmetry/);
      expect(page.url()).toContain('model=repeated');
      // The combined means over time, then each garden's beside it (drawn as they are scrolled to).
      await chartsDrawn(page, viewport.width, 5);
      expect(await page.getByRole('figure', { name: 'All sites combined' }).count()).toBe(1);
      await screenshot(page, `findings-rounds-over-time-${viewport.name}`);

      // The classical ANOVA, labelled as the biased fallback it is.
      await picker.getByRole('button', { name: 'ANOVA on cut-off values (biased fallback)' }).click();
      await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
      expect(await picker.getByRole('note').innerText()).toMatch(/^Biased: \d+ plots? not drained by the cut-off enter at the cut-off value/);
      expect(await picker.innerText()).toMatch(/The analysis made for this measure is not-drained curves and time ratios/);
      await chartsDrawn(page, viewport.width);
      await screenshot(page, `findings-anova-fallback-${viewport.name}`);

      // Water retained has a day-0 baseline: adjusted for it by default; crumble score by proportional odds.
      await page.getByLabel('Measure').selectOption({ label: 'water retained' });
      await page.getByRole('heading', { name: 'The baseline', exact: true }).waitFor();
      expect(await page.getByText('Equal slopes across treatments').isVisible()).toBe(true);
      await page.getByRole('table', { name: 'Treatment means' }).waitFor();
      expect(await page.getByLabel('Baseline', { exact: true }).locator('option:checked').innerText()).toBe('water retained at Day 0');
      await screenshot(page, `findings-ancova-${viewport.name}`);
      // Any measure's earlier round can be the baseline.
      await page.getByLabel('Baseline', { exact: true }).selectOption({ label: 'crust resistance at Day 0' });
      await page.getByText('The covariate is crust resistance at Day 0: each plot\'s value is adjusted for its own baseline.').waitFor();
      await page.getByLabel('Measure').selectOption({ label: 'crumble score' });
      await page.getByRole('table', { name: 'Predicted share of plots in each score' }).waitFor();
      expect(await page.getByRole('table', { name: 'Odds ratio' }).locator('tbody tr').count()).toBe(4);
      await page.getByRole('heading', { name: 'Rank-based test' }).waitFor();
      await chartsDrawn(page, viewport.width, 2);
      await screenshot(page, `findings-ordinal-${viewport.name}`);
      expect(blocked).toEqual([]);
      await context.close();
    }, 180_000);

    it(`a reviewer saves drain time's log-normal time ratios and reopens them: the same numbers, the same model (${viewport.name})`, async () => {
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      await signIn(page, 'reviewer@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const id = await trialId(page, 'FW-CLAY-26');
      await page.goto(`${baseUrl()}/trials/${id}/findings`);
      await page.getByRole('heading', { name: 'Share of plots not yet drained' }).waitFor();
      await page.getByRole('combobox', { name: 'Time-ratio model' }).selectOption('lognormal');
      await page.getByRole('heading', { name: 'Time ratios to the control (log-normal model)' }).waitFor();
      const live = await page.getByRole('table', { name: 'Time ratio' }).innerText();
      const title = `Log-normal drain times ${viewport.name} ${Date.now()}`;
      await page.getByLabel('Title of the saved analysis').fill(title);
      await page.getByRole('button', { name: 'Save this analysis' }).click();
      await page.getByRole('status').getByText(`Saved as “${title}”.`).waitFor();
      await page.getByRole('button', { name: `Open the saved analysis ${title}` }).click();
      await page.getByRole('heading', { name: `Saved analysis: ${title}` }).waitFor();
      expect(await page.locator('.fr-findings-caption').first().innerText()).toContain('Not-drained curves and time ratios');
      await page.getByRole('heading', { name: 'Time ratios to the control (log-normal model)' }).waitFor();
      expect(await page.getByRole('table', { name: 'Time ratio' }).innerText()).toBe(live);
      expect(await page.getByRole('table', { name: 'Median drain time per treatment' }).locator('tbody tr').count()).toBe(5);
      await page.getByText('The data have not changed since this analysis was saved.').waitFor();
      await chartsDrawn(page, viewport.width);
      await screenshot(page, `findings-saved-censored-${viewport.name}`);
      // The report leads each measure with the model made for it, the classical ANOVA beside it.
      await page.goto(`${baseUrl()}/trials/${id}/report`);
      await page.getByRole('heading', { name: 'Not-drained curves and time ratios' }).waitFor();
      expect(await page.getByRole('table', { name: /^Time ratios to CTL .* — drain time$/ }).locator('tbody tr').count()).toBe(4);
      expect(await page.getByRole('heading', { name: 'Score shares and odds' }).count()).toBe(1);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
      await context.close();
    }, 180_000);
  }
});
