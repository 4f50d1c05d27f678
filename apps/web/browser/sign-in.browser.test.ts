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

  it('signs the person out when the API stops accepting their token', async () => {
    await signIn(session.page, 'hollow.lane@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.evaluate(() => window.localStorage.setItem('friable.accessToken', 'expired.or.revoked'));
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
