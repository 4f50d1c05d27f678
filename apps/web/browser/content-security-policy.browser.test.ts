import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { paths } from '../src/config/paths';
import { baseUrl, demoTrialId, drawCharts, everyPage, screenshot, signIn, useBrowserSession } from './support';

/** Opens a page and lets it settle: its data fetched, lazy chunks (Plotly) loaded, charts drawn. */
async function visit(page: Page, path: string): Promise<string | undefined> {
  const response = await page.goto(`${baseUrl()}${path}`, { waitUntil: 'networkidle' });
  return response?.headers()['content-security-policy'];
}

describe('every page under the Content-Security-Policy', () => {
  const session = useBrowserSession();

  it('the policy is enforced and its violations are seen (an injected inline script does not run)', async () => {
    const policy = await visit(session.page, paths.signIn.href());
    expect(policy).toMatch(/script-src 'self'/);
    const ran = await session.page.evaluate(() => {
      const script = document.createElement('script');
      script.textContent = 'window.__inlineRan = true;';
      document.head.appendChild(script);
      return (window as unknown as { __inlineRan?: boolean }).__inlineRan === true;
    });
    expect(ran).toBe(false);
    await expect.poll(() => session.cspViolations.length).toBeGreaterThan(0);
    expect(session.cspViolations[0]).toMatch(/inline script/);
    session.cspViolations.length = 0; // seen on purpose: the test's own probe, not the app's
  });

  it('signed out: every page loads with no violation', async () => {
    for (const page of [paths.signIn.href(), paths.acceptInvitation.href('not-a-real-invitation-token'), paths.forgotPassword.href(), paths.resetPassword.href('not-a-real-reset-token')]) {
      expect(await visit(session.page, page)).toContain("frame-ancestors 'none'");
    }
    expect(session.cspViolations).toEqual([]);
  });

  it('as the investigator: every page, Findings charts included, with no violation', async () => {
    const trialId = await demoTrialId();
    await signIn(session.page, 'investigator@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    const visited: string[] = [];
    for (const { name, path } of everyPage(trialId)) {
      if (['signIn', 'acceptInvitation', 'people', 'outbox'].includes(name)) continue;
      await visit(session.page, path);
      visited.push(path);
      if (name === 'trialFindings') {
        await drawCharts(session.page, 1, 60_000);
        await screenshot(session.page, 'csp-findings');
      }
    }
    expect(visited).toContain(`/trials/${trialId}/findings`);
    expect(session.cspViolations).toEqual([]);
  }, 240_000);

  it('as the administrator: People and the Outbox with no violation', async () => {
    await signIn(session.page, 'admin@example.org');
    await session.page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    for (const path of [paths.people.href(), paths.outbox.href()]) await visit(session.page, path);
    await session.page.getByRole('heading', { name: 'Outbox' }).waitFor();
    expect(session.cspViolations).toEqual([]);
  });
});
