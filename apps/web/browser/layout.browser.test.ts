import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { paths } from '../src/config/paths';
import { baseUrl, drawCharts, screenshot, signIn, useBrowserSession } from './support';

const sizes = [
  { name: 'phone', viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true },
  { name: 'laptop', viewport: { width: 1280, height: 800 }, isMobile: false, hasTouch: false },
] as const;

/** What is wrong with the page's layout at this size, in words (empty when nothing is). */
async function layoutProblems(page: Page, touch: boolean): Promise<string[]> {
  return page.evaluate((touchTargets) => {
    const problems: string[] = [];
    const width = window.innerWidth;
    const overflow = document.documentElement.scrollWidth - width;
    if (overflow > 0) problems.push(`scrolls sideways by ${overflow} px`);
    // Every menu item is in sight (not behind a hidden scrollbar) and, on a phone, big enough for a thumb.
    const links = [...document.querySelectorAll<HTMLElement>('.fr-topbar a, .fr-topbar button, nav[aria-label="Trial sections"] a')];
    for (const link of links) {
      const box = link.getBoundingClientRect();
      const name = link.textContent?.trim() || link.getAttribute('aria-label') || link.tagName;
      if (box.width === 0 || box.left < 0 || box.right > width + 0.5) problems.push(`menu item “${name}” is out of sight (${Math.round(box.left)}–${Math.round(box.right)} px)`);
      else if (touchTargets && box.height < 44) problems.push(`menu item “${name}” is ${Math.round(box.height)} px high, under 44`);
    }
    // A chart's tool bar never covers its title.
    for (const figure of document.querySelectorAll('figure.fr-findings-plot')) {
      const title = figure.querySelector('figcaption')?.getBoundingClientRect();
      const bar = figure.querySelector('.modebar')?.getBoundingClientRect();
      if (title && bar && bar.width > 0 && !(bar.bottom <= title.top || bar.top >= title.bottom || bar.right <= title.left || bar.left >= title.right)) {
        problems.push(`the tool bar covers the title “${figure.querySelector('figcaption')?.textContent}”`);
      }
    }
    return problems;
  }, touch);
}

async function demoTrialId(page: Page): Promise<number> {
  await page.getByRole('link', { name: 'Heavy-clay amendments across three Fernwick gardens' }).click();
  await page.waitForURL(/\/trials\/\d+\//);
  return Number(new URL(page.url()).pathname.split('/')[2]);
}

for (const size of sizes) {
  describe(`every page at ${size.viewport.width} × ${size.viewport.height}`, () => {
    const session = useBrowserSession({ viewport: size.viewport, isMobile: size.isMobile, hasTouch: size.hasTouch });

    it('no sideways scrolling, every menu item in sight, touch targets of 44 px on a phone, chart tool bars clear of titles', async () => {
      const { page } = session;
      await signIn(page, 'investigator@example.org');
      await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
      const trialId = await demoTrialId(page);
      const problems: string[] = [];
      for (const [name, route] of Object.entries(paths)) {
        if (['signIn', 'acceptInvitation', 'people', 'outbox', 'home', 'trial'].includes(name)) continue;
        await page.goto(`${baseUrl()}${route.path.replace(':trialId', String(trialId))}`, { waitUntil: 'networkidle' });
        if (name === 'trialFindings') await drawCharts(page, 1, 60_000);
        await page.locator('.fr-state').first().waitFor({ state: 'detached', timeout: 30_000 }).catch(() => undefined);
        if (name === 'trialFindings') await page.locator('figure.fr-findings-plot').first().hover();
        for (const problem of await layoutProblems(page, size.isMobile)) problems.push(`${name}: ${problem}`);
        await screenshot(page, `layout-${size.name}-${name}`);
      }
      expect(problems).toEqual([]);
    }, 300_000);
  });
}
