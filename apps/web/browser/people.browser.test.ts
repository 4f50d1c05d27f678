import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, signIn } from './support';

describe('the instance administrator manages accounts', () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());
  beforeEach(async () => {
    context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    page = await context.newPage();
  });
  afterEach(() => context.close());

  it('adds an account that can sign in, deactivates it, and the sign-in is then refused', async () => {
    const email = `people-${Date.now()}@example.org`;
    await signIn(page, 'admin@example.org');
    await page.getByRole('link', { name: 'People' }).click();
    await page.getByRole('heading', { name: 'People' }).waitFor();
    await page.getByLabel('Name').fill('Browser Grower');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('a long enough passphrase');
    await page.getByRole('button', { name: 'Add account' }).click();
    await page.getByText(`Browser Grower (${email}) can now sign in.`).waitFor();
    const row = page.getByRole('row').filter({ hasText: email });
    await row.getByText('Active').waitFor();
    await screenshot(page, 'people-admin');

    const login = await page.request.post(`${baseUrl()}/api/auth/login`, { data: { email, password: 'a long enough passphrase' } });
    expect(login.status()).toBe(200);

    await row.getByRole('button', { name: 'Deactivate Browser Grower' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Deactivate' }).click();
    await row.getByText('Deactivated').waitFor();
    const refused = await page.request.post(`${baseUrl()}/api/auth/login`, { data: { email, password: 'a long enough passphrase' } });
    expect(refused.status()).toBe(401);
  });

  it('shows no People link to someone who is not an administrator', async () => {
    await signIn(page, 'investigator@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    expect(await page.getByRole('link', { name: 'People' }).count()).toBe(0);
  });
});
