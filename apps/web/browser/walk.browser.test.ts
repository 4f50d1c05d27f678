import type { Observation, TrialDetail, TrialSummary } from '@friable/contracts';
import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { api, baseUrl, forbidOutsideRequests, screenshot, signIn, useBrowserSession, watchContentSecurityPolicy } from './support';

interface WalkSetting {
  trialId: number;
  siteId: number;
  roundId: number;
  drainId: number;
  plots: Array<{ id: number; label: string; block: number; position: number }>;
}

/** The demo trial's Hollow Lane site, its Day 14 round and drain time, and its plots in field order. */
async function demoWalk(page: Page): Promise<WalkSetting> {
  await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
  const trialId = (await api<TrialSummary[]>(page, '/trials')).find((t) => t.code === 'FW-CLAY-26')!.id;
  const trial = await api<TrialDetail>(page, `/trials/${trialId}`);
  const site = trial.sites.find((s) => s.name === 'Hollow Lane Community Garden')!;
  const round = trial.rounds.find((r) => r.label === 'Day 14')!;
  const drain = trial.measures.find((m) => m.code === 'DRAIN')!;
  const plots = await api<WalkSetting['plots']>(page, `/trials/${trialId}/plots?siteId=${site.id}`);
  return { trialId, siteId: site.id, roundId: round.id, drainId: drain.id, plots: [...plots].sort((a, b) => a.block - b.block || a.position - b.position) };
}

const storedDrain = async (page: Page, w: WalkSetting, plotId: number) =>
  (await api<Observation[]>(page, `/trials/${w.trialId}/observations?siteId=${w.siteId}&roundId=${w.roundId}`)).find((o) => o.plotId === plotId && o.measureId === w.drainId);

const horizontalOverflow = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('the Round walk on a phone', () => {
  const session = useBrowserSession({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });

  it('walks the plots in field order; two drain timers run at once and stop themselves at the cut-off with >600', async () => {
    const { page } = session;
    // The page's clock is Playwright's: it runs as usual until the test moves it on by ten minutes.
    await page.clock.install({ time: new Date('2027-04-12T09:00:00Z') });
    await signIn(page, 'hollow.lane@example.org');
    const w = await demoWalk(page);
    await page.goto(`${baseUrl()}/trials/${w.trialId}/walk?site=${w.siteId}&round=${w.roundId}`);
    await page.getByText(`1 of ${w.plots.length} plots`).waitFor();
    await page.getByRole('heading', { name: w.plots[0].label, exact: true }).waitFor();
    expect(await horizontalOverflow(page)).toBeLessThanOrEqual(0);
    await screenshot(page, 'walk-phone');

    await page.getByRole('button', { name: 'Next' }).first().click();
    await page.getByText(`2 of ${w.plots.length} plots`).waitFor();
    await page.getByRole('heading', { name: w.plots[1].label, exact: true }).waitFor();
    await page.getByRole('button', { name: 'Start the drain timer' }).click();
    await page.getByRole('button', { name: 'Next' }).first().click();
    await page.getByRole('heading', { name: w.plots[2].label, exact: true }).waitFor();
    await page.clock.fastForward(30_000);
    await page.getByRole('button', { name: 'Start the drain timer' }).click();
    // Both run, side by side, while the person is at the third plot.
    const running = page.getByRole('list', { name: 'Running drain timers' });
    await expect.poll(() => running.getByRole('listitem').count()).toBe(2);
    await screenshot(page, 'walk-phone-two-timers');

    // Ten minutes on: both reach the 600 s cut-off and record a censored value, not 600 as measured.
    await page.clock.fastForward('10:01');
    await running.waitFor({ state: 'detached' });
    await expect.poll(() => page.getByRole('textbox', { name: 'drain time (s)', exact: true }).inputValue()).toBe('>600');
    await page.getByText('Not drained by the cut-off: >600').waitFor();
    for (const plot of [w.plots[1], w.plots[2]]) {
      await expect.poll(async () => (await storedDrain(page, w, plot.id))?.censored, { timeout: 15_000 }).toBe(true);
      expect((await storedDrain(page, w, plot.id))?.valueText).toBe('600');
    }
    await page.getByText('Everything is sent').waitFor();
    await screenshot(page, 'walk-phone-cut-off');

    // Swipe back to the second plot: its value is there.
    const card = page.getByRole('article', { name: `Plot ${w.plots[2].label}` });
    const box = (await card.boundingBox())!;
    await card.dispatchEvent('touchstart', { touches: [{ identifier: 1, clientX: box.x + 40, clientY: box.y + 200 }] });
    await card.dispatchEvent('touchend', { changedTouches: [{ identifier: 1, clientX: box.x + 300, clientY: box.y + 210 }] });
    await page.getByRole('heading', { name: w.plots[1].label, exact: true }).waitFor();
    await expect.poll(() => page.getByRole('textbox', { name: 'drain time (s)', exact: true }).inputValue()).toBe('>600');
    expect(await horizontalOverflow(page)).toBeLessThanOrEqual(0);
    expect(session.outside).toEqual([]);
  }, 120_000);
});

describe('the Round walk without signal', () => {
  const session = useBrowserSession();

  async function investigatorPage(context: BrowserContext): Promise<Page> {
    const page = await context.newPage();
    forbidOutsideRequests(page, session.outside);
    watchContentSecurityPolicy(page, session.cspViolations);
    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    return page;
  }

  it('queues entries offline, sends them when the connection returns, and shows a value changed meanwhile as a conflict', async () => {
    const { page, context } = session;
    await signIn(page, 'hollow.lane@example.org');
    const w = await demoWalk(page);
    const [calm, disputed] = [w.plots[5], w.plots[6]];
    await page.goto(`${baseUrl()}/trials/${w.trialId}/walk?site=${w.siteId}&round=${w.roundId}&plot=${calm.id}`);
    await page.getByRole('heading', { name: calm.label, exact: true }).waitFor();
    // The service worker has taken the app shell before the signal goes.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    const kept = () => page.evaluate(async () => (await (await caches.open('friable-walk-data')).keys()).map((request) => new URL(request.url).pathname));
    await expect.poll(kept, { timeout: 20_000 }).toEqual(expect.arrayContaining(['/api/auth/me', `/api/trials/${w.trialId}/plots`, `/api/trials/${w.trialId}/observations`]));
    const before = await storedDrain(page, w, disputed.id);

    await context.setOffline(true);
    const stamp = 100 + (Date.now() % 300);
    const box = page.getByRole('textbox', { name: 'drain time (s)', exact: true });
    await box.fill(String(stamp));
    await box.press('Enter');
    await page.getByText('1 entry waiting to be sent').waitFor();
    await page.getByText(/No connection/).waitFor();
    await page.getByRole('button', { name: 'Next' }).first().click();
    await page.getByRole('heading', { name: disputed.label, exact: true }).waitFor();
    await box.fill(String(stamp + 1));
    await box.press('Enter');
    await page.getByText('2 entries waiting to be sent').waitFor();
    await screenshot(page, 'walk-offline-waiting');

    // Meanwhile, at the desk, the investigator saves another value in the same cell.
    const desk = await investigatorPage(await session.browser.newContext({ viewport: { width: 1280, height: 800 } }));
    const theirs = String(stamp + 2);
    if (before) await api(desk, `/trials/${w.trialId}/observations/${before.id}`, { method: 'PATCH', json: { version: before.version, value: theirs } });
    else await api(desk, `/trials/${w.trialId}/observations`, { method: 'POST', json: { plotId: disputed.id, roundId: w.roundId, measureId: w.drainId, value: theirs } });

    await context.setOffline(false);
    const conflict = page.getByRole('alert').filter({ hasText: 'changed meanwhile' });
    await conflict.waitFor({ timeout: 20_000 });
    expect(await conflict.innerText()).toContain(theirs);
    expect(await conflict.innerText()).toContain(String(stamp + 1));
    await screenshot(page, 'walk-conflict');
    await page.getByText('1 entry needs you (below)').waitFor();
    // The entry without a conflict went through; the disputed one was not overwritten.
    expect((await storedDrain(page, w, calm.id))?.valueText).toBe(String(stamp));
    expect((await storedDrain(page, w, disputed.id))?.valueText).toBe(theirs);

    await conflict.getByRole('button', { name: `Keep mine (${stamp + 1})` }).click();
    await expect.poll(async () => (await storedDrain(page, w, disputed.id))?.valueText, { timeout: 15_000 }).toBe(String(stamp + 1));
    await conflict.waitFor({ state: 'detached' });
    await page.getByText('Everything is sent').waitFor();

    // Without signal the walk still opens after a reload: the service worker serves the app shell and
    // the last known plots and values, and a new entry waits on the phone.
    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: disputed.label, exact: true }).waitFor();
    await expect.poll(() => box.inputValue()).toBe(String(stamp + 1));
    await box.fill(String(stamp + 3));
    await box.press('Enter');
    await page.getByText('1 entry waiting to be sent').waitFor();
    await screenshot(page, 'walk-offline-reloaded');
    await context.setOffline(false);
    await page.getByText('Everything is sent').waitFor({ timeout: 30_000 });
    expect((await storedDrain(page, w, disputed.id))?.valueText).toBe(String(stamp + 3));
    expect(session.outside).toEqual([]);
  }, 120_000);
});

for (const viewport of [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
]) {
  describe(`the Round walk of a split plot (${viewport.name})`, () => {
    const session = useBrowserSession({ viewport: { width: viewport.width, height: viewport.height }, isMobile: viewport.name === 'phone', hasTouch: viewport.name === 'phone' });

    it('shows what goes on each plot level by level, the whole-plot amendment per whole plot, as the data sheet prints it', async () => {
      const { page } = session;
      await signIn(page, 'reviewer@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const trialId = (await api<TrialSummary[]>(page, '/trials')).find((t) => t.code === 'FW-MULCH-27')!.id;
      const trial = await api<TrialDetail>(page, `/trials/${trialId}`);
      const site = trial.sites[0]!;
      const round = [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset)[0]!;
      // A plot whose whole-plot level is applied at a rate (not the bare control).
      const wholePlotFactor = trial.factors.find((f) => f.appliedTo === 'whole plot')!;
      const plots = await api<Array<{ id: number; label: string; treatmentId: number }>>(page, `/trials/${trialId}/plots?siteId=${site.id}`);
      const levelOf = (plot: { treatmentId: number }) => wholePlotFactor.levels.find((l) => trial.treatments.find((t) => t.id === plot.treatmentId)!.factorLevelIds.includes(l.id))!;
      const plot = plots.find((p) => levelOf(p).rateValue !== null)!;
      await page.goto(`${baseUrl()}/trials/${trialId}/walk?site=${site.id}&round=${round.id}&plot=${plot.id}`);
      const card = page.getByRole('article', { name: `Plot ${plot.label}` });
      const amounts = card.locator('.fr-walk-plot__amounts');
      await amounts.waitFor();
      const label = plot.label;
      const walkText = (await amounts.innerText()).replace(/^Goes on this plot:\s*/, '').trim();
      // The whole-plot factor's amount is per whole plot (its sub plots side by side).
      expect(walkText).toMatch(new RegExp(`(^|· )${levelOf(plot).code} .* per whole plot`));
      // Material is weighed and spread from these amounts: the cautions stand beside them.
      expect(await card.getByText('Compost and manure: wear gloves', { exact: false }).isVisible()).toBe(true);
      expect(await horizontalOverflow(page)).toBeLessThanOrEqual(0);
      await screenshot(page, `walk-split-plot-${viewport.name}`);

      // The data sheet of the same site and round prints the same amounts for that plot.
      await page.goto(`${baseUrl()}/trials/${trialId}/plot-plan`);
      await page.getByLabel('Site', { exact: true }).selectOption({ label: site.name });
      await page.getByLabel('Sheets for').selectOption({ label: round.label });
      await page.getByRole('button', { name: 'Show Sheets' }).click();
      const sheet = page.getByRole('table', { name: `Data sheet ${round.label} at ${site.name}` });
      await sheet.waitFor();
      const row = sheet.getByRole('row').filter({ has: page.getByRole('cell', { name: label, exact: true }) });
      expect((await row.locator('.fr-sheet__amount').innerText()).trim()).toBe(walkText);
      expect(session.outside).toEqual([]);
    }, 180_000);
  });
}
