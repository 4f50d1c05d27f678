import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, signIn, useBrowserSession } from './support';

const demoTitle = 'Heavy-clay amendments across three Fernwick gardens';

async function openDemoTrial(page: Page): Promise<number> {
  await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
  await page.getByRole('link', { name: demoTitle }).click();
  await page.getByRole('heading', { name: demoTitle }).waitFor();
  return Number(new URL(page.url()).pathname.split('/')[2]);
}

describe('a collaborator of the demo trial', () => {
  const session = useBrowserSession({ acceptDownloads: true });

  it('finds their own site’s plot plan, amounts per plot and template', async () => {
    await signIn(session.page, 'hollow.lane@example.org');
    await openDemoTrial(session.page);
    await session.page.getByRole('link', { name: 'Plot plan', exact: true }).click();
    // They start on their own site.
    await expect(session.page.getByLabel('Site', { exact: true }).inputValue()).resolves.not.toBe('');
    await expect(session.page.getByLabel('Site', { exact: true }).locator('option:checked').textContent()).resolves.toBe('Hollow Lane Community Garden (your site)');
    const map = session.page.getByRole('table', { name: 'Plot plan of Hollow Lane Community Garden', exact: true });
    await map.waitFor();
    // Five blocks of the five demo treatments.
    await expect(map.getByRole('row').count()).resolves.toBe(5);
    await expect(map.getByText('GYP', { exact: true }).count()).resolves.toBe(5);

    // 40 lb/1000 ft² of gypsum on a 1.2 m × 1.2 m bed: 4.88243 g/m² per lb/1000 ft² × 40 × 1.44 m² = 281 g (DOMAIN.md factors).
    const amounts = session.page.getByRole('table', { name: 'Amounts per plot at Hollow Lane Community Garden' });
    await amounts.waitFor();
    const gypsum = amounts.getByRole('row').filter({ hasText: 'GYP' });
    await expect(gypsum.getByText('281 g · 9.92 oz').isVisible()).resolves.toBe(true);
    // A 1 in compost layer: 25.4 L/m² × 1.44 m² = 36.6 L = 9.66 US gal.
    await expect(amounts.getByRole('row').filter({ hasText: 'CMP' }).getByText('36.6 L · 9.66 gal').isVisible()).resolves.toBe(true);
    // The cautions stand beside the amounts (and again on every printed sheet, hidden until printing).
    await expect(session.page.getByText(/dust mask and eye protection/).filter({ visible: true }).count()).resolves.toBe(1);
    await screenshot(session.page, 'plot-plan-collaborator');

    const downloading = session.page.waitForEvent('download');
    await session.page.getByRole('button', { name: 'CSV template — Day 0' }).click();
    const download = await downloading;
    expect(download.suggestedFilename()).toBe('FW-CLAY-26-HL-Day-0.csv');
    const lines = readFileSync((await download.path())!, 'utf8').split('\r\n').filter(Boolean);
    expect(lines[0].split(',').slice(0, 3)).toEqual(['plot label', 'block', 'treatment code']);
    expect(lines[0].split(',').at(-1)).toBe('notes');
    // 5 treatments × 5 blocks.
    expect(lines).toHaveLength(26);
    expect(lines.slice(1).every((line) => /^HL-[^,]+,[1-5],(CTL|GYP|CMP|SHL|LFM),/.test(line))).toBe(true);

    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'hollow.lane@example.org');
    await openDemoTrial(phonePage);
    await phonePage.getByRole('link', { name: 'Plot plan', exact: true }).click();
    await phonePage.getByRole('table', { name: 'Plot plan of Hollow Lane Community Garden', exact: true }).waitFor();
    expect(await phonePage.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'plot-plan-phone');
    await phonePage.getByRole('link', { name: 'Protocol', exact: true }).click();
    // Wait for the Protocol page itself: until it replaces the plot plan, "GYP" stands on every plot.
    await phonePage.waitForURL(/\/protocol$/);
    await phonePage.getByRole('heading', { name: 'Treatments', exact: true }).waitFor();
    await phonePage.getByText('GYP', { exact: true }).waitFor();
    expect(await phonePage.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'protocol-phone');
    await phone.close();
    expect(session.outside).toEqual([]);
  });

  it('cannot change the protocol: no edit controls, and a direct PATCH answers 403', async () => {
    await signIn(session.page, 'hollow.lane@example.org');
    const trialId = await openDemoTrial(session.page);
    await session.page.getByText('only its investigator can change it', { exact: false }).waitFor();
    await session.page.getByText('GYP', { exact: true }).first().waitFor();
    await expect(session.page.getByRole('button', { name: /^(Edit|Add|Remove|Activate)/ }).count()).resolves.toBe(0);
    await screenshot(session.page, 'protocol-collaborator');
    await session.page.getByRole('link', { name: 'Sites', exact: true }).click();
    await session.page.getByText('Hollow Lane Community Garden', { exact: false }).first().waitFor();
    await expect(session.page.getByRole('button', { name: /^(Edit|Add|Remove|Randomize)/ }).count()).resolves.toBe(0);

    const answer = await session.page.evaluate(async (id) => {
      const response = await fetch(`/api/trials/${id}`, {
        method: 'PATCH',
        headers: { 'Content-Type': 'application/json', 'X-Friable-CSRF': '1' },
        body: JSON.stringify({ title: 'Changed by a collaborator' }),
      });
      return response.status;
    }, trialId);
    expect(answer).toBe(403);
    await session.page.reload();
    await session.page.getByRole('heading', { name: demoTitle }).waitFor();
  });
});
