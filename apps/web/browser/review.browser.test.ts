import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoPassword, forbidOutsideRequests, screenshot, signIn, useBrowserSession } from './support';

const tag = Math.random().toString(36).slice(2, 8);
const title = `Review walk ${tag}`;
const statement = `I read the layout, the values and the model of ${title}; the table follows from them.`;

/** The API as a demo person (bearer token, as another device would). */
async function apiAs(email: string) {
  const login = await fetch(`${baseUrl()}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    const response = await fetch(`${baseUrl()}/api${path}`, {
      method,
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${accessToken}` },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    if (!response.ok) throw new Error(`${method} ${path}: ${response.status} ${await response.text()}`);
    return (response.status === 204 ? undefined : await response.json()) as T;
  };
}

describe('a reviewer reviews a saved analysis from the e-mailed request', () => {
  const session = useBrowserSession({ viewport: { width: 1280, height: 900 } });
  let investigator: Awaited<ReturnType<typeof apiAs>>;
  let trialId: number;
  let analysisId: number;
  let wasLocked = false;

  beforeAll(async () => {
    investigator = await apiAs('investigator@example.org');
    const trials = await investigator<Array<{ id: number; code: string; status: string }>>('GET', '/trials');
    const demo = trials.find((t) => t.code === 'FW-CLAY-26')!;
    trialId = demo.id;
    wasLocked = demo.status === 'locked';
    const detail = await investigator<{ measures: Array<{ id: number; position: number }> }>('GET', `/trials/${trialId}`);
    const measure = [...detail.measures].sort((a, b) => a.position - b.position)[0];
    analysisId = (await investigator<{ id: number }>('POST', `/trials/${trialId}/analyses`, { measureId: measure.id, title })).id;
    if (!wasLocked) await investigator('PATCH', `/trials/${trialId}`, { status: 'locked', version: (await investigator<{ version: number }>('GET', `/trials/${trialId}`)).version });
    await investigator('POST', `/trials/${trialId}/analyses/${analysisId}/review-requests`, { message: `Please look at ${title}.` });
  });

  afterAll(async () => {
    // The demo trial goes back as it was for the other browser tests; the unlock needs a reason now that it is signed.
    if (!wasLocked) {
      const { version } = await investigator<{ version: number }>('GET', `/trials/${trialId}`);
      await investigator('PATCH', `/trials/${trialId}`, { status: 'active', version, reason: `Browser test ${tag} done; reopened for the other tests.` });
    }
  });

  it('finds the request in the Outbox, opens the link, comments, signs off with a statement, and the report shows it', async () => {
    // The request, as caught by the development Outbox (administrators only).
    const administrator = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const adminPage = await administrator.newPage();
    forbidOutsideRequests(adminPage, session.outside);
    await signIn(adminPage, 'admin@example.org');
    await adminPage.getByRole('link', { name: 'Outbox' }).click();
    const card = adminPage.locator('.fr-outbox__message').filter({ hasText: `Review requested: ${title}` }).first();
    await card.waitFor();
    const show = card.getByRole('button', { name: /^Show/ });
    if (await show.count()) await show.click();
    await expect(card.getByText(`Please look at ${title}.`).first().isVisible()).resolves.toBe(true);
    const link = await card.getByRole('link', { name: /findings\?analysis=/ }).first().getAttribute('href');
    expect(link).toBe(`${baseUrl()}/trials/${trialId}/findings?analysis=${analysisId}`);
    await administrator.close();

    // The reviewer follows the link: signed out first, then straight back to the analysis.
    await session.page.goto(link as string);
    await session.page.getByRole('heading', { name: 'Sign in to Friable' }).waitFor();
    await session.page.getByLabel('E-mail').fill('reviewer@example.org');
    await session.page.getByLabel('Password').fill(demoPassword);
    await session.page.getByRole('button', { name: 'Sign in' }).click();
    await session.page.getByRole('heading', { name: `Saved analysis: ${title}` }).waitFor();
    await session.page.getByRole('heading', { name: /^Review/ }).getByText(/^Awaiting \d+ reviewers?$/).waitFor();

    // A comment, then the sign-off: the button opens once a statement is typed.
    await session.page.getByLabel('Your comment').fill(`Block 2 of ${title} looks wetter than the rest.`);
    await session.page.getByRole('button', { name: 'Add the comment' }).click();
    await session.page.getByRole('list', { name: 'Comments' }).getByText(`Block 2 of ${title} looks wetter than the rest.`).waitFor();
    const signButton = session.page.getByRole('button', { name: 'Sign off with this statement' });
    expect(await signButton.isDisabled()).toBe(true);
    await session.page.getByLabel(/Your statement/).fill(statement);
    expect(await signButton.isEnabled()).toBe(true);
    await signButton.click();
    const signOffs = session.page.getByRole('list', { name: 'Sign-offs' });
    await signOffs.getByText(statement).waitFor();
    await expect(signOffs.getByText('Signed', { exact: true }).isVisible()).resolves.toBe(true);
    await session.page.getByRole('heading', { name: /^Review/ }).getByText(/^Signed by (1 of \d+ reviewers|the reviewer)$/).waitFor();
    expect(await session.page.getByRole('button', { name: 'Sign off with this statement' }).count()).toBe(0);
    await screenshot(session.page, 'review-signed');

    // The printable report lists the sign-off with its statement and the open comment.
    await session.page.goto(`${baseUrl()}/trials/${trialId}/report`);
    await session.page.getByRole('heading', { name: 'Review and sign-off' }).waitFor();
    await session.page.getByRole('list', { name: `Sign-offs of ${title}` }).getByText(statement).waitFor();
    await expect(session.page.getByRole('list', { name: `Open comments on ${title}` }).getByText(`Block 2 of ${title} looks wetter than the rest.`).isVisible()).resolves.toBe(true);
    await screenshot(session.page, 'report-review');
    expect(session.outside).toEqual([]);
  });

  it('reads well on a phone', async () => {
    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const page = await phone.newPage();
    await signIn(page, 'reviewer@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.goto(`${baseUrl()}/trials/${trialId}/findings?analysis=${analysisId}`);
    await page.getByRole('list', { name: 'Sign-offs' }).getByText(statement).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(page, 'review-phone');
    await phone.close();
  });

  it('lets the reviewer amend the statement and then withdraw the sign-off with a reason; the report shows it withdrawn', async () => {
    const amended = `${statement} Block 2 checked against the plot notes.`;
    const reason = `The drainage notes for ${title} came after I signed.`;
    await session.page.setViewportSize({ width: 1280, height: 800 });
    await signIn(session.page, 'reviewer@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await session.page.goto(`${baseUrl()}/trials/${trialId}/findings?analysis=${analysisId}`);
    const signOffs = session.page.getByRole('list', { name: 'Sign-offs' });
    await signOffs.getByText(statement).waitFor();
    await signOffs.getByRole('button', { name: 'Amend my statement' }).click();
    const box = session.page.getByRole('textbox', { name: 'Your amended statement' });
    await box.fill(amended);
    await session.page.getByRole('button', { name: 'Save the amended statement' }).click();
    await signOffs.getByText(amended).waitFor();
    await signOffs.getByText(/^Statement amended on /).waitFor();

    // Withdrawing asks why; an empty reason is refused in words before anything is sent.
    await signOffs.getByRole('button', { name: 'Withdraw my sign-off' }).click();
    await session.page.getByRole('button', { name: 'Withdraw my sign-off' }).click();
    await session.page.getByText('Say why you withdraw it.').waitFor();
    await session.page.getByRole('textbox', { name: 'Why you withdraw your sign-off' }).fill(reason);
    await session.page.getByRole('button', { name: 'Withdraw my sign-off' }).click();
    await signOffs.getByText(`Why withdrawn: ${reason}`).waitFor();
    await expect(signOffs.getByText(/^Withdrawn on /).isVisible()).resolves.toBe(true);
    await session.page.getByRole('heading', { name: /^Review/ }).getByText(/^Awaiting \d+ reviewers?$/).waitFor();
    // Withdrawn, the reviewer may sign again.
    await expect(session.page.getByRole('button', { name: 'Sign off with this statement' }).isVisible()).resolves.toBe(true);
    await screenshot(session.page, 'review-withdrawn');

    await session.page.goto(`${baseUrl()}/trials/${trialId}/report`);
    const inReport = session.page.getByRole('list', { name: `Sign-offs of ${title}` });
    await inReport.getByText(`Why withdrawn: ${reason}`).waitFor();
    await expect(inReport.getByText(amended).isVisible()).resolves.toBe(true);

    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const page = await phone.newPage();
    await signIn(page, 'reviewer@example.org');
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await page.goto(`${baseUrl()}/trials/${trialId}/findings?analysis=${analysisId}`);
    await page.getByRole('list', { name: 'Sign-offs' }).getByText(`Why withdrawn: ${reason}`).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(page, 'review-withdrawn-phone');
    await phone.close();
    expect(session.outside).toEqual([]);
  });
});
