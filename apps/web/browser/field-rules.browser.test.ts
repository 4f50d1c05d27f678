import type { LayoutImpact, Plot, TrialDetail } from '@friable/contracts';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { api, baseUrl, screenshot, signIn, useBrowserSession } from './support';

const sizes = [
  { name: 'laptop', viewport: { width: 1280, height: 800 }, isMobile: false, hasTouch: false },
  { name: 'phone', viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true },
] as const;

const sideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

/**
 * A one-site trial of the demo investigator, made through the API: control, gypsum and compost, a drain time in s
 * (lower is better), one round, one randomized site of 4 blocks; with `values`, activated and every drain time
 * recorded (made-up numbers: the control slowest).
 */
async function oneSiteTrial(page: Page, tag: string, values: boolean, activate = values): Promise<{ trial: TrialDetail; plots: Plot[] }> {
  const code = `BR-${tag}-${Date.now().toString(36).toUpperCase().slice(-5)}`;
  const trial = await api<TrialDetail>(page, '/trials', { method: 'POST', json: { code, title: `Browser ${tag}`, design: 'rcbd', seed: `seed-${tag}`, startDate: '2026-05-01' } });
  const base = `/trials/${trial.id}`;
  for (const body of [
    { code: 'CTL', name: 'Untreated', isControl: true },
    { code: 'GYP', name: 'Gypsum', rateValue: 40, rateUnit: 'lb/1000ft2', materialKind: 'gypsum' },
    { code: 'CMP', name: 'Compost', rateValue: 1, rateUnit: 'in' },
  ]) await api(page, `${base}/treatments`, { method: 'POST', json: body });
  const measure = await api<{ id: number }>(page, `${base}/measures`, { method: 'POST', json: { code: 'DRAIN', name: 'drain time', unit: 's', kind: 'continuous', decimals: 0, higherIsBetter: false } });
  const round = await api<{ id: number }>(page, `${base}/rounds`, { method: 'POST', json: { label: 'Day 0', dayOffset: 0, measureIds: [measure.id] } });
  const site = await api<{ id: number }>(page, `${base}/sites`, { method: 'POST', json: { name: 'Quarry Lane', shape: 'rectangle', lengthM: 1.2, widthM: 1.2, blocks: 4, labelPrefix: 'QL' } });
  await api(page, `${base}/sites/${site.id}/randomize`, { method: 'POST', json: {} });
  const plots = await api<Plot[]>(page, `${base}/plots`);
  if (activate) {
    const detail = await api<TrialDetail>(page, base);
    await api(page, base, { method: 'PATCH', json: { version: detail.version, status: 'active' } });
  }
  if (values) {
    const times: Record<string, number> = { CTL: 420, GYP: 250, CMP: 330 };
    for (const plot of plots) {
      const value = String(times[plot.treatmentCode]! + plot.block * 9 + (plot.id % 3) * 4);
      await api(page, `${base}/observations`, { method: 'POST', json: { plotId: plot.id, roundId: round.id, measureId: measure.id, value } });
    }
  }
  return { trial: await api<TrialDetail>(page, base), plots };
}

/** Signs the demo investigator in and makes them a one-site trial (see `oneSiteTrial`). */
async function signedInWithTrial(page: Page, tag: string, values: boolean, activate = values) {
  await signIn(page, 'investigator@example.org');
  await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
  return oneSiteTrial(page, tag, values, activate);
}

describe('Safety rails and words at laptop and phone size', () => {
  for (const size of sizes) {
    describe(`${size.name} (${size.viewport.width} × ${size.viewport.height})`, () => {
      const session = useBrowserSession({ viewport: size.viewport, isMobile: size.isMobile, hasTouch: size.hasTouch });

      it('removing a treatment says what it clears and waits for the trial code to be typed', async () => {
        const { page } = session;
        const { trial } = await signedInWithTrial(page, `RM${size.name[0]}`, false);
        await page.goto(`${baseUrl()}/trials/${trial.id}/protocol`);
        await page.getByRole('button', { name: 'Remove CMP' }).click();
        const dialog = page.getByRole('dialog', { name: 'Remove treatment CMP (Compost)' });
        await dialog.getByText('Clears the layout of Quarry Lane, 12 plots: the site must be randomized again, and printed sheets and plot labels made anew.').waitFor();
        const confirm = dialog.getByRole('button', { name: 'Remove treatment' });
        expect(await confirm.isDisabled()).toBe(true);
        await dialog.getByLabel(`Type the trial code ${trial.code} to confirm`).fill('BR-WRONG');
        expect(await confirm.isDisabled()).toBe(true);
        await screenshot(page, `remove-treatment-confirm-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);
        await dialog.getByLabel(`Type the trial code ${trial.code} to confirm`).fill(trial.code.toLowerCase());
        expect(await confirm.isDisabled()).toBe(false);
        await confirm.click();
        await page.getByRole('button', { name: 'Remove CMP' }).waitFor({ state: 'detached' });
        const after = await api<TrialDetail>(page, `/trials/${trial.id}`);
        expect(after.treatments.map((t) => t.code)).toEqual(['CTL', 'GYP']);
        expect(after.sites[0]!.plotCount).toBe(0);
        expect((await api<LayoutImpact>(page, `/trials/${trial.id}/layout-impact`)).layouts).toBe(0);
      }, 120_000);

      it('removing a measure with values says how many it archives and waits for the trial code to be typed', async () => {
        const { page } = session;
        const { trial } = await signedInWithTrial(page, `RV${size.name[0]}`, true);
        const base = `/trials/${trial.id}`;
        // A second measure in the round, so drain time is not the round's only measure.
        const crumble = await api<{ id: number }>(page, `${base}/measures`, { method: 'POST', json: { code: 'CRUMB', name: 'crumble score', unit: 'score', kind: 'score', scaleMin: 1, scaleMax: 5, decimals: 0, higherIsBetter: true } });
        const round = trial.rounds[0]!;
        await api(page, `${base}/rounds/${round.id}`, { method: 'PATCH', json: { version: round.version, measureIds: [trial.measures[0]!.id, crumble.id] } });
        await page.goto(`${baseUrl()}${base}/protocol`);
        await page.getByRole('button', { name: 'Remove DRAIN' }).click();
        const dialog = page.getByRole('dialog', { name: 'Remove measure DRAIN (drain time)' });
        await dialog
          .getByText('Removes 12 recorded values of drain time at Quarry Lane. They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports.')
          .waitFor();
        expect(await dialog.getByRole('list', { name: 'What it archives, site by site' }).innerText()).toBe('Quarry Lane: 12 values');
        const confirm = dialog.getByRole('button', { name: 'Remove measure' });
        expect(await confirm.isDisabled()).toBe(true);
        await dialog.getByLabel(`Type the trial code ${trial.code} to confirm`).fill('BR-WRONG');
        expect(await confirm.isDisabled()).toBe(true);
        await screenshot(page, `remove-measure-confirm-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);
        await dialog.getByLabel(`Type the trial code ${trial.code} to confirm`).fill(trial.code.toLowerCase());
        await confirm.click();
        await page.getByRole('button', { name: 'Remove DRAIN' }).waitFor({ state: 'detached' });
        const after = await api<TrialDetail>(page, base);
        expect(after.measures.map((m) => m.code)).toEqual(['CRUMB']);
        expect(await api<unknown[]>(page, `${base}/observations`)).toEqual([]);
        const log = await api<Array<{ kind: string; summary: string }>>(page, `${base}/activity`);
        expect(log.find((entry) => entry.kind === 'measure.archived')?.summary).toBe('Archived measure DRAIN (drain time) with its 12 recorded values at Quarry Lane; it leaves the protocol and stays on record.');
      }, 120_000);

      it('the round walk asks why a value is missing, offers the common reasons, and stores the one tapped', async () => {
        const { page } = session;
        const { trial, plots } = await signedInWithTrial(page, `WK${size.name[0]}`, false, true);
        const [site, round] = [trial.sites[0]!, trial.rounds[0]!];
        await page.goto(`${baseUrl()}/trials/${trial.id}/walk?site=${site.id}&round=${round.id}&plot=${plots[0]!.id}`);
        await page.getByRole('heading', { name: plots[0]!.label, exact: true }).waitFor();
        const box = page.getByRole('textbox', { name: 'drain time (s)', exact: true });
        await box.fill('NA');
        await box.press('Enter');
        await page.getByRole('alert').filter({ hasText: 'A missing value needs a reason: choose one below or type why it is missing.' }).waitFor();
        const reasons = page.getByRole('group', { name: 'Why drain time is missing: common reasons' });
        await screenshot(page, `walk-missing-reason-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);
        await reasons.getByRole('button', { name: 'plot flooded' }).click();
        await expect
          .poll(async () => (await api<Array<{ plotId: number; valueText: string | null; missingReason: string | null }>>(page, `/trials/${trial.id}/observations`)).map((o) => [o.plotId, o.valueText, o.missingReason]), { timeout: 20_000 })
          .toEqual([[plots[0]!.id, null, 'plot flooded']]);
      }, 120_000);

      it('a measure asks which way is better and refuses a name already taken, in words', async () => {
        const { page } = session;
        const { trial } = await signedInWithTrial(page, `MS${size.name[0]}`, false);
        await page.goto(`${baseUrl()}/trials/${trial.id}/protocol`);
        await page.getByRole('button', { name: 'Add measure' }).click();
        const dialog = page.getByRole('dialog', { name: 'Add measure' });
        await dialog.getByLabel('Code', { exact: true }).fill('WATER');
        await dialog.getByLabel('Name', { exact: true }).fill('Drain Time');
        await dialog.getByLabel('Unit', { exact: true }).selectOption('mL');
        // Neither answer is ticked for a new measure.
        expect(await dialog.getByRole('radio', { name: 'Higher is better' }).isChecked()).toBe(false);
        expect(await dialog.getByRole('radio', { name: 'Lower is better' }).isChecked()).toBe(false);
        await dialog.getByRole('button', { name: 'Add measure' }).click();
        await dialog.getByText('higher is better must be answered: say whether higher or lower values are better').waitFor();
        await dialog.getByText('Higher is better', { exact: true }).click();
        await dialog.getByRole('button', { name: 'Add measure' }).click();
        await dialog.getByText('name “Drain Time” is already used by measure DRAIN of this trial; give each measure its own name').waitFor();
        await screenshot(page, `measure-rules-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);
        await dialog.getByLabel('Name', { exact: true }).fill('water retained (second pour)');
        await dialog.getByRole('button', { name: 'Add measure' }).click();
        await dialog.waitFor({ state: 'detached' });
        const after = await api<TrialDetail>(page, `/trials/${trial.id}`);
        expect(after.measures.find((m) => m.code === 'WATER')).toMatchObject({ name: 'water retained (second pour)', higherIsBetter: true });
      }, 120_000);

      it('Findings of a one-site trial never says "combined", shows the LSD only with LSD, and the report follows the choices', async () => {
        const { page } = session;
        const { trial } = await signedInWithTrial(page, `FD${size.name[0]}`, true);
        await page.goto(`${baseUrl()}/trials/${trial.id}/findings`);
        await page.getByRole('table', { name: 'Comparisons' }).waitFor();
        const caption = await page.locator('.fr-findings-caption').innerText();
        expect(caption).toContain('Quarry Lane');
        expect(await page.getByLabel('Scope').locator('option').allTextContents()).toEqual(['Quarry Lane']);
        // Tukey (the default): no LSD line or column; the verdicts follow "lower is better" for drain time.
        await page.getByText('Lower values are better for this measure.').waitFor();
        expect(await page.getByText('Least significant difference', { exact: false }).count()).toBe(0);
        const verdicts = await page.getByRole('table', { name: 'Comparisons' }).locator('tbody tr td:last-child').allTextContents();
        expect(verdicts).toContain('GYP better');
        await page.getByLabel('Mean separation').selectOption('lsd');
        await page.getByText('Least significant difference (LSD) at α = 0.05', { exact: false }).waitFor();
        expect(await page.locator('body').innerText()).not.toMatch(/combined/i);
        await screenshot(page, `findings-one-site-lsd-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);

        await page.getByRole('link', { name: 'Printable report' }).click();
        await page.waitForURL(/\/report\?/);
        expect(new URL(page.url()).searchParams.get('method')).toBe('lsd');
        const choices = page.getByLabel('Choices of this report');
        await choices.waitFor();
        expect(await choices.innerText()).toMatch(/Round: Day 0 · Scope: Quarry Lane · Means compared by Fisher's protected LSD at α = 0\.05/);
        await page.getByRole('heading', { name: /drain time \(s\) — Day 0, Quarry Lane/ }).waitFor();
        expect(await page.locator('body').innerText()).not.toMatch(/combined/i);
        await screenshot(page, `report-choices-${size.name}`);
        expect(await sideways(page)).toBeLessThanOrEqual(0);
      }, 120_000);
    });
  }

  describe('the Intake preview at 1280 × 800', () => {
    const session = useBrowserSession();

    it('shows every column of a wide file inside the table, the plot label frozen, and refuses an NA without its reason', async () => {
      const { page } = session;
      const { trial, plots } = await signedInWithTrial(page, 'IP', true);
      const site = trial.sites[0]!;
      const round = trial.rounds[0]!;
      const extra = ['weather', 'observer', 'soil moisture', 'bed notes', 'ring diameter', 'water temperature', 'start time'];
      const header = ['block', 'treatment code', 'plot label', 'drain time (s)', ...extra].join(',');
      const lines = plots.map((plot, index) => [plot.block, plot.treatmentCode, plot.label, index === 1 ? 'NA' : String(300 + index), 'overcast', 'R. Vale', 'moist', 'none', '15.2 cm', '14 °C', '09:30'].join(','));
      await page.goto(`${baseUrl()}/trials/${trial.id}/intake?site=${site.id}&round=${round.id}`);
      await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'wide.csv', mimeType: 'text/csv', buffer: Buffer.from([header, ...lines].join('\n') + '\n') });
      const table = page.getByRole('table', { name: 'Preview of the file' });
      await table.waitFor();
      expect(await sideways(page)).toBeLessThanOrEqual(0);
      // The plot label column comes first after the row number, whatever its place in the file.
      const headings = await table.locator('thead th .fr-intake-preview__header').allTextContents();
      expect(headings).toEqual(['plot label', 'block', 'treatment code', 'drain time (s)', ...extra]);
      const box = page.locator('.fr-intake-preview');
      const frozenBefore = await table.locator('tbody tr').first().locator('td').first().boundingBox();
      await box.evaluate((element) => element.scrollTo({ left: element.scrollWidth }));
      const lastHeading = await table.locator('thead th').last().boundingBox();
      const boxRect = await box.boundingBox();
      expect(lastHeading!.x + lastHeading!.width).toBeLessThanOrEqual(boxRect!.x + boxRect!.width + 1);
      const frozenAfter = await table.locator('tbody tr').first().locator('td').first().boundingBox();
      expect(Math.round(frozenAfter!.x)).toBe(Math.round(frozenBefore!.x));
      expect(await table.locator('tbody tr').first().locator('td').first().innerText()).toBe(plots[0]!.label);
      await screenshot(page, 'intake-preview-wide-laptop');

      await page.getByRole('button', { name: 'Check the file' }).click();
      await page.getByText(`Row 3, drain time (s): drain time is NA (missing) without a reason: add a “missing reason” column saying why (for example “bed flooded”).`).first().waitFor();
      expect(await sideways(page)).toBeLessThanOrEqual(0);
      // Making the trial and its twelve values through the API takes its time on a busy machine.
    }, 150_000);
  });
});
