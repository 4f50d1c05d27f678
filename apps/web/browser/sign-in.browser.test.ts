import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, forbidOutsideRequests, launchBrowser, screenshot, signIn } from './support';

describe('signing in to the built app', () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  let outside: string[];

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());
  beforeEach(async () => {
    context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    page = await context.newPage();
    outside = [];
    forbidOutsideRequests(page, outside);
  });
  afterEach(() => context.close());

  it('signs in the demo investigator, shows the Trials page, and signs out', async () => {
    await page.goto(`${baseUrl()}/`);
    await page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await screenshot(page, 'sign-in');

    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    expect(page.url()).toBe(`${baseUrl()}/trials`);
    await expect(page.getByText('Heavy-clay amendments across three Fernwick gardens').isVisible()).resolves.toBe(true);
    await expect(page.getByText('Ines Marlow').isVisible()).resolves.toBe(true);
    await expect(page.getByText('FW-CLAY-26').isVisible()).resolves.toBe(true);
    await screenshot(page, 'trials-investigator');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await page.goto(`${baseUrl()}/trials`);
    await page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    expect(outside).toEqual([]);
  });

  it('says in words when the password is wrong', async () => {
    await signIn(page, 'investigator@example.org', 'not-the-password');
    await page.getByText('The e-mail or password is not right.').waitFor();
    await screenshot(page, 'sign-in-wrong-password');
  });

  it('sends a signed-out visitor to sign-in and back to the page they asked for', async () => {
    await page.goto(`${baseUrl()}/trials/1`);
    await page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    expect(new URL(page.url()).searchParams.get('returnTo')).toBe('/trials/1');
    await page.getByLabel('E-mail').fill('reviewer@example.org');
    await page.getByLabel('Password').fill('friable-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Heavy-clay amendments across three Fernwick gardens' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/trials/1/protocol');
    await expect(page.getByText('Reviewer').first().isVisible()).resolves.toBe(true);
  });

  it('signs the person out when the API stops accepting their token', async () => {
    await signIn(page, 'hollow.lane@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.evaluate(() => window.localStorage.setItem('friable.accessToken', 'expired.or.revoked'));
    await page.reload();
    await page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await page.getByText('Your session has ended. Please sign in again.').waitFor();
  });

  it('stays usable on a phone-sized screen', async () => {
    const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'millbrook@example.org');
    await phonePage.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const overflow = await phonePage.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'trials-phone');
    await phone.close();
  });
});
