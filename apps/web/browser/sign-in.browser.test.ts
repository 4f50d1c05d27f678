import { describe, expect, it } from 'vitest';
import { baseUrl, screenshot, signIn, useBrowserSession } from './support';

describe('signing in to the built app', () => {
  const session = useBrowserSession();

  it('signs in the demo investigator, shows the Trials page, and signs out', async () => {
    await session.page.goto(`${baseUrl()}/`);
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await screenshot(session.page, 'sign-in');

    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    expect(session.page.url()).toBe(`${baseUrl()}/trials`);
    await expect(session.page.getByText('Heavy-clay amendments across three Fernwick gardens').isVisible()).resolves.toBe(true);
    await expect(session.page.getByText('Ines Marlow').isVisible()).resolves.toBe(true);
    await expect(session.page.getByText('FW-CLAY-26').isVisible()).resolves.toBe(true);
    await screenshot(session.page, 'trials-investigator');

    await session.page.getByRole('button', { name: 'Sign out' }).click();
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await session.page.goto(`${baseUrl()}/trials`);
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    expect(session.outside).toEqual([]);
  });

  it('says in words when the password is wrong', async () => {
    await signIn(session.page, 'investigator@example.org', 'not-the-password');
    await session.page.getByText('The e-mail or password is not right.').waitFor();
    await screenshot(session.page, 'sign-in-wrong-password');
  });

  it('sends a signed-out visitor to sign-in and back to the page they asked for', async () => {
    await session.page.goto(`${baseUrl()}/trials/1`);
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    expect(new URL(session.page.url()).searchParams.get('returnTo')).toBe('/trials/1');
    await session.page.getByLabel('E-mail').fill('reviewer@example.org');
    await session.page.getByLabel('Password').fill('friable-demo');
    await session.page.getByRole('button', { name: 'Sign in' }).click();
    await session.page.getByRole('heading', { name: 'Heavy-clay amendments across three Fernwick gardens' }).waitFor();
    expect(new URL(session.page.url()).pathname).toBe('/trials/1/protocol');
    await expect(session.page.getByText('Reviewer').first().isVisible()).resolves.toBe(true);
  });

  it('keeps the session in an httpOnly cookie, and signs the person out when it is ended elsewhere', async () => {
    await signIn(session.page, 'hollow.lane@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const cookies = await session.context.cookies();
    expect(cookies.find((c) => c.name === 'friable_session')).toMatchObject({ httpOnly: true, sameSite: 'Strict', path: '/api' });
    expect(await session.page.evaluate(() => JSON.stringify(window.localStorage))).not.toMatch(/ey[A-Za-z0-9_-]{10,}\./);
    // The same person signs out everywhere from another device: this browser's session ends on its next request.
    const login = await fetch(`${baseUrl()}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'hollow.lane@example.org', password: 'friable-demo' }),
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const ended = await fetch(`${baseUrl()}/api/auth/logout-all`, { method: 'POST', headers: { Authorization: `Bearer ${accessToken}` } });
    expect(ended.status).toBe(200);
    await session.page.reload();
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await session.page.getByText('Your session has ended. Please sign in again.').waitFor();
  });

  it('stays usable on a phone-sized screen', async () => {
    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const phonePage = await phone.newPage();
    await signIn(phonePage, 'millbrook@example.org');
    await phonePage.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const overflow = await phonePage.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await screenshot(phonePage, 'trials-phone');
    await phone.close();
  });
});
