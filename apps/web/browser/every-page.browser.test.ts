import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { paths } from '../src/config/paths';
import { baseUrl, demoTrialId, everyPage, screenshot, signIn, useBrowserSession } from './support';

const sizes = [
  { name: 'laptop', viewport: { width: 1280, height: 800 } },
  { name: 'phone', viewport: { width: 390, height: 844 } },
] as const;

/** The pages only an administrator opens, and the ones opened signed out. */
const ADMIN_PAGES = new Set(['people', 'outbox']);
const SIGNED_OUT_PAGES = new Set(['signIn', 'acceptInvitation']);
const MADE_UP_TOKEN = 'not-a-real-invitation-token';

/** What the page says on the console at the error level, and what it throws, while it is open. */
function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() !== 'error') return;
    const text = message.text();
    const where = message.location().url;
    // The invitation page of a made-up token: the API rightly answers 404 and the page says the link is not valid.
    if (/status of 404/.test(text) && where.includes(`/api/invitations`) && page.url().includes(MADE_UP_TOKEN)) return;
    // A plot's photo: the API answers 404 for "no photo yet" (lib/api/plot-photo.ts reads it so), and the
    // Round walk asks for the shown plot's. Until the plots' answer says which have one, Chromium logs it.
    if (/status of 404/.test(text) && /\/api\/trials\/\d+\/plots\/\d+\/rounds\/\d+\/photo$/.test(where)) return;
    errors.push(`${new URL(page.url()).pathname}: ${text}${where ? ` (${where})` : ''}`);
  });
  page.on('pageerror', (error) => errors.push(`${new URL(page.url()).pathname}: uncaught ${error.message}`));
  return errors;
}

/** Opens an address and waits for its data and lazy code to settle; fails if the page could not show itself. */
async function open(page: Page, path: string, name: string, size: string): Promise<void> {
  await page.goto(`${baseUrl()}${path}`, { waitUntil: 'networkidle' });
  await page.locator('.fr-state[role="status"]').first().waitFor({ state: 'detached', timeout: 30_000 }).catch(() => undefined);
  await expect.poll(() => page.locator('body').innerText(), { message: `${path} at ${size} size` }).not.toMatch(/This page ran into a problem|Friable was updated|Nothing at this address/);
  await screenshot(page, `every-page-${size}-${name}`);
}

describe.each(sizes)('every page at $name size, with no console error', ({ name: size, viewport }) => {
  const session = useBrowserSession({ viewport });

  it('signed out: sign-in and an invitation link', async () => {
    const errors = watchErrors(session.page);
    await open(session.page, paths.signIn.href(), 'signIn', size);
    await session.page.getByRole('button', { name: 'Sign in' }).waitFor();
    await open(session.page, paths.acceptInvitation.href(MADE_UP_TOKEN), 'acceptInvitation', size);
    expect(errors).toEqual([]);
  });

  it('as the investigator: every page of the demo trial and the app', async () => {
    const trialId = await demoTrialId();
    const errors = watchErrors(session.page);
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const opened: string[] = [];
    for (const { name, path } of everyPage(trialId, MADE_UP_TOKEN)) {
      if (SIGNED_OUT_PAGES.has(name) || ADMIN_PAGES.has(name)) continue;
      await open(session.page, path, name, size);
      opened.push(path);
    }
    expect(opened).toContain(`/trials/${trialId}/findings`);
    expect(opened.length).toBe(Object.keys(paths).length - SIGNED_OUT_PAGES.size - ADMIN_PAGES.size);
    expect(errors).toEqual([]);
  }, 300_000);

  it('as the administrator: People and the Outbox', async () => {
    const errors = watchErrors(session.page);
    await signIn(session.page, 'admin@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    for (const name of ADMIN_PAGES) await open(session.page, paths[name as 'people' | 'outbox'].href(), name, size);
    expect(errors).toEqual([]);
  }, 120_000);
});
