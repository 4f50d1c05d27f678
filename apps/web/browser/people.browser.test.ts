import { describe, expect, it } from 'vitest';
import { baseUrl, screenshot, signIn, useBrowserSession } from './support';

describe('the instance administrator manages accounts', () => {
  const session = useBrowserSession();

  it('adds an account that can sign in, deactivates it, and the sign-in is then refused', async () => {
    const email = `people-${Date.now()}@example.org`;
    await signIn(session.page, 'admin@example.org');
    await session.page.getByRole('link', { name: 'People' }).click();
    await session.page.getByRole('heading', { name: 'People' }).waitFor();
    await session.page.getByLabel('Name').fill('Browser Grower');
    await session.page.getByLabel('E-mail').fill(email);
    await session.page.getByLabel('Password').fill('a long enough passphrase');
    await session.page.getByRole('button', { name: 'Add account' }).click();
    await session.page.getByText(`Browser Grower (${email}) can now sign in.`).waitFor();
    const row = session.page.getByRole('row').filter({ hasText: email });
    await row.getByText('Active').waitFor();
    await screenshot(session.page, 'people-admin');

    // Signing in from elsewhere (not this browser, whose cookie is the administrator's session).
    const signInElsewhere = () =>
      fetch(`${baseUrl()}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: 'a long enough passphrase' }) });
    // Last sign-in: "never" until the new account signs in, then today's date (day-month-year: no locale set).
    await expect(row.getByRole('cell', { name: 'never', exact: true }).isVisible()).resolves.toBe(true);
    expect((await signInElsewhere()).status).toBe(200);
    await session.page.reload();
    const today = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' }).format(new Date());
    await row.getByText('Active').waitFor();
    expect(await row.getByRole('cell', { name: 'never', exact: true }).count()).toBe(0);
    expect(await row.getByRole('cell', { name: today, exact: true }).count()).toBe(2); // since, and last sign-in

    await row.getByRole('button', { name: 'Deactivate Browser Grower' }).click();
    await session.page.getByRole('alertdialog').getByRole('button', { name: 'Deactivate' }).click();
    await row.getByText('Deactivated').waitFor();
    expect((await signInElsewhere()).status).toBe(401);

    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const page = await phone.newPage();
    await signIn(page, 'admin@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.goto(`${baseUrl()}/people`);
    await page.getByRole('row').filter({ hasText: email }).getByText('Deactivated').waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(page, 'people-admin-phone');
    await phone.close();
  });

  it('shows no People link to someone who is not an administrator', async () => {
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    expect(await session.page.getByRole('link', { name: 'People' }).count()).toBe(0);
  });
});
