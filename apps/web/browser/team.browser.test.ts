import { beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoPassword, forbidOutsideRequests, screenshot, signIn, useBrowserSession } from './support';

const tag = Math.random().toString(36).slice(2, 8);
const trialTitle = `Team trial ${tag}`;
const siteName = `Quarry Row ${tag}`;
const invitee = `quarry-${tag}@example.org`;

/** The API, as the investigator: a fresh trial with one site for this test. */
async function prepareTrial(): Promise<number> {
  const login = await fetch(`${baseUrl()}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'investigator@example.org', password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const call = async (path: string, body: unknown) => {
    const response = await fetch(`${baseUrl()}/api${path}`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${accessToken}` },
      body: JSON.stringify(body),
    });
    if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
    return (await response.json()) as { id: number };
  };
  const trial = await call('/trials', { code: `TB-${tag.toUpperCase()}`, title: trialTitle });
  await call(`/trials/${trial.id}/sites`, {
    name: siteName,
    location: null,
    soilDescription: null,
    shape: 'rectangle',
    lengthM: 1.2,
    widthM: 1,
    diameterCm: null,
    containerDepthCm: null,
    soilVolumeL: null,
    blocks: 4,
    labelPrefix: 'QR',
    leadUserId: null,
  });
  return trial.id;
}

describe('inviting a collaborator from the Team page', () => {
  const session = useBrowserSession({ viewport: { width: 1280, height: 900 } });
  let trialId: number;

  beforeAll(async () => {
    trialId = await prepareTrial();
  });

  it('sends the invitation, shows it in the Outbox, and the new person joins from the link', async () => {
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.goto(`${baseUrl()}/trials/${trialId}/team`);
    await session.page.getByRole('table', { name: 'Members' }).waitFor();
    await session.page.getByLabel('E-mail').fill(invitee);
    await session.page.getByLabel('Site', { exact: true }).selectOption({ label: siteName });
    await session.page.getByRole('button', { name: 'Send invitation' }).click();
    await session.page.getByText(`Invitation sent to ${invitee}.`).waitFor();
    await session.page.getByRole('region', { name: 'Pending invitations' }).getByText(invitee).waitFor();
    await screenshot(session.page, 'team-investigator');

    // The Outbox holds every invitation link, so only an administrator has it (the investigator has no link to it).
    expect(await session.page.getByRole('link', { name: 'Outbox' }).count()).toBe(0);
    const administrator = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const adminPage = await administrator.newPage();
    forbidOutsideRequests(adminPage, session.outside);
    await signIn(adminPage, 'admin@example.org');
    await adminPage.getByRole('link', { name: 'Outbox' }).click();
    const card = adminPage.locator('.fr-outbox__message').filter({ hasText: invitee }).first();
    await card.waitFor();
    const show = card.getByRole('button', { name: /^Show/ });
    if (await show.count()) await show.click();
    await expect(card.getByText(trialTitle).first().isVisible()).resolves.toBe(true);
    await screenshot(adminPage, 'outbox');
    const link = await card.getByRole('link', { name: /\/invitations\// }).getAttribute('href');
    expect(link).toMatch(new RegExp(`^${baseUrl()}/invitations/[A-Za-z0-9_-]{43}$`));
    await administrator.close();

    // The invitee, in a browser of their own, not signed in.
    const theirs = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const theirPage = await theirs.newPage();
    forbidOutsideRequests(theirPage, session.outside);
    await theirPage.goto(link as string);
    await theirPage.getByRole('heading', { name: `Join ${trialTitle}` }).waitFor();
    await expect(theirPage.getByText(siteName).isVisible()).resolves.toBe(true);
    expect(await theirPage.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(theirPage, 'accept-invitation-phone');
    await theirPage.getByLabel('Your name').fill('Quinn Quarry');
    await theirPage.getByLabel('Choose a password').fill('a long passphrase');
    await theirPage.getByRole('button', { name: 'Join the trial' }).click();
    await theirPage.getByRole('heading', { name: trialTitle, exact: true }).waitFor();
    expect(new URL(theirPage.url()).pathname).toBe(`/trials/${trialId}/protocol`);
    await expect(theirPage.getByText('Quinn Quarry').first().isVisible()).resolves.toBe(true);
    await screenshot(theirPage, 'accepted-trial-phone');

    // The same link does not work twice.
    await theirPage.goto(link as string);
    await theirPage.getByText('This invitation has already been used. Sign in to open the trial.').waitFor();
    await theirs.close();

    await session.page.goto(`${baseUrl()}/trials/${trialId}/team`);
    await session.page.getByRole('table', { name: 'Members' }).getByText('Quinn Quarry').waitFor();
    await expect(session.page.getByRole('table', { name: 'Members' }).getByText(siteName).isVisible()).resolves.toBe(true);
    await screenshot(session.page, 'team-after-joining');

    // The investigator makes Quinn a reviewer, then removes her after a question that says what happens.
    await session.page.getByRole('button', { name: 'Change the role and sites of Quinn Quarry' }).click();
    const dialog = session.page.getByRole('dialog');
    await dialog.getByLabel('Role').selectOption('reviewer');
    await dialog.getByRole('button', { name: 'Save the change' }).click();
    const quinn = session.page.getByRole('table', { name: 'Members' }).getByRole('row').filter({ hasText: 'Quinn Quarry' });
    await quinn.getByText('Reviewer').waitFor();
    await session.page.getByRole('button', { name: 'Remove Quinn Quarry from the trial' }).click();
    await session.page.getByText(/They lose access at once and get an e-mail saying so/).waitFor();
    await screenshot(session.page, 'team-remove-question');
    await session.page.getByRole('button', { name: 'Remove Quinn Quarry', exact: true }).click();
    await quinn.waitFor({ state: 'detached' });
    expect(await session.page.getByRole('table', { name: 'Members' }).getByText('Quinn Quarry').count()).toBe(0);
    expect(session.outside).toEqual([]);
  });
});
