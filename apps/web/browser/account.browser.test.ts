import { readdirSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { beforeAll, describe, expect, it } from 'vitest';
import { repoRoot } from '../../devstack/src/env.mjs';
import { baseUrl, demoPassword, screenshot, signIn, useBrowserSession } from './support';

const tag = Math.random().toString(36).slice(2, 8);
const email = `account-${tag}@example.org`;
const firstPassword = `first walk ${tag} in the rain`;
const newPassword = `second walk ${tag} by the river`;

/** The reset link e-mailed to the address, read from the SMTP sink's folder (the Outbox page shows the same). */
async function resetLink(): Promise<string> {
  const outbox = resolve(repoRoot, process.env.MAIL_OUTBOX_DIR ?? '.data/test-outbox');
  for (let attempt = 0; attempt < 100; attempt += 1) {
    for (const name of readdirSync(outbox).filter((n) => n.endsWith('.json'))) {
      const message = JSON.parse(readFileSync(resolve(outbox, name), 'utf8')) as { to: string[]; text: string };
      const link = message.to.includes(email) ? /https?:\/\/\S+\/reset-password\/[A-Za-z0-9_-]+/.exec(message.text)?.[0] : undefined;
      if (link) return link;
    }
    await sleep(100);
  }
  throw new Error(`no reset link to ${email} in ${outbox}`);
}

describe('one’s own account: settings, a forgotten password, signing out everywhere', () => {
  const session = useBrowserSession();

  beforeAll(async () => {
    const login = await fetch(`${baseUrl()}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'admin@example.org', password: demoPassword }),
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const created = await fetch(`${baseUrl()}/api/users`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${accessToken}` },
      body: JSON.stringify({ email, name: `Ash ${tag}`, password: firstPassword }),
    });
    expect(created.status).toBe(201);
  });

  it('resets a forgotten password from the e-mailed link, which works once', async () => {
    await session.page.goto(`${baseUrl()}/sign-in`);
    await session.page.getByRole('link', { name: 'Forgot your password?' }).click();
    // The page loads with its route; the sign-in form (with its own E-mail box) stays until it has.
    await session.page.getByRole('heading', { name: 'Forgotten password' }).waitFor();
    await session.page.getByLabel('E-mail').fill(email);
    await session.page.getByRole('button', { name: 'E-mail me a link' }).click();
    await session.page.getByRole('status').waitFor();
    const link = await resetLink();
    expect(link.startsWith(`${baseUrl()}/reset-password/`)).toBe(true);
    await session.page.goto(link);
    await session.page.getByRole('heading', { name: 'Set a new password' }).waitFor();
    await session.page.getByLabel('New password', { exact: true }).fill(newPassword);
    await session.page.getByLabel('New password again').fill(newPassword);
    await session.page.getByRole('button', { name: 'Set the new password' }).click();
    await session.page.getByText(/Your new password is set/).waitFor();
    await screenshot(session.page, 'reset-password-done');
    // Used once: the same link now says it is spent.
    await session.page.goto(link);
    await session.page.getByRole('heading', { name: 'Set a new password' }).waitFor();
    await session.page.getByLabel('New password', { exact: true }).fill(`${newPassword} again`);
    await session.page.getByLabel('New password again').fill(`${newPassword} again`);
    await session.page.getByRole('button', { name: 'Set the new password' }).click();
    await session.page.getByRole('link', { name: 'Ask for a new link' }).waitFor();
    await signIn(session.page, email, newPassword);
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
  });

  it('changes the display name and locale, then signs out everywhere', async () => {
    await signIn(session.page, email, newPassword);
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.getByRole('link', { name: /^Your account/ }).click();
    await session.page.getByRole('heading', { name: 'Your account' }).waitFor();
    await session.page.getByLabel('Display name').fill(`Ash Willow ${tag}`);
    await session.page.getByLabel('Numbers and dates').selectOption('de-DE');
    await session.page.getByText('E-mail me a receipt after each upload').click();
    await session.page.getByRole('button', { name: 'Save', exact: true }).click();
    await session.page.getByRole('status').getByText('Saved.').waitFor();
    await session.page.locator('.fr-person__name').getByText(`Ash Willow ${tag}`).waitFor();
    const me = await session.page.evaluate(async () => (await fetch('/api/auth/me')).json());
    expect(me).toMatchObject({ name: `Ash Willow ${tag}`, locale: 'de-DE', emailReceipts: false, emailReminders: true });

    // A wrong current password is refused in words.
    await session.page.getByLabel('Current password').fill('not my password at all');
    await session.page.getByLabel('New password', { exact: true }).fill(`third walk ${tag} uphill`);
    await session.page.getByLabel('New password again').fill(`third walk ${tag} uphill`);
    await session.page.getByRole('button', { name: 'Change the password' }).click();
    await session.page.getByText(/current password/i).first().waitFor();
    await screenshot(session.page, 'account');

    await session.page.getByRole('button', { name: 'Sign out everywhere' }).click();
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await session.page.getByText('You signed out on every device.').waitFor();
    expect((await session.page.evaluate(async () => (await fetch('/api/auth/me')).status))).toBe(401);
  });
});
