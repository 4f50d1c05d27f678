import type { TrialDetail, TrialSummary } from '@friable/contracts';
import { mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, beforeEach } from 'vitest';
import { repoRoot } from '../../devstack/src/env.mjs';
import { paths } from '../src/config/paths';

export const baseUrl = () => process.env.FRIABLE_BROWSER_BASE_URL ?? 'http://127.0.0.1:3999';
export const demoPassword = 'friable-demo';
export const screenshotDir = resolve(repoRoot, 'apps/web/screenshots');

/** Debian's Chromium, never a downloaded browser; flags that keep it off the closed network. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: resolve(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Calls the API as the signed-in person of this page (its session cookie, with the header writes need): JSON answers parsed, others as text. */
export async function api<T>(page: Page, path: string, init?: { method: string; json: unknown }): Promise<T> {
  return page.evaluate(
    async ({ address, request }) => {
      const headers: Record<string, string> = { 'X-Friable-CSRF': '1' };
      if (request) headers['Content-Type'] = 'application/json';
      const response = await fetch(`/api${address}`, { method: request?.method ?? 'GET', headers, body: request ? JSON.stringify(request.json) : undefined });
      if (!response.ok) throw new Error(`${address}: ${response.status} ${await response.text()}`);
      // JSON answers as values; files (a CSV template) as their text.
      return response.headers.get('Content-Type')?.includes('json') ? response.json() : response.text();
    },
    { address: path, request: init },
  ) as Promise<T>;
}

/**
 * Signs in as Hollow Lane's collaborator and opens Intake on the demo trial's (FW-CLAY-26) Day 28
 * round for Hollow Lane Community Garden; answers the ids and the round's CSV template.
 */
export async function openHollowLaneIntake(page: Page): Promise<{ trialId: number; site: TrialDetail['sites'][number]; round: TrialDetail['rounds'][number]; template: string }> {
  await signIn(page, 'hollow.lane@example.org');
  await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
  const trials = await api<TrialSummary[]>(page, '/trials');
  const trialId = trials.find((t) => t.code === 'FW-CLAY-26')!.id;
  const trial = await api<TrialDetail>(page, `/trials/${trialId}`);
  const site = trial.sites.find((s) => s.name === 'Hollow Lane Community Garden')!;
  const round = trial.rounds.find((r) => r.label === 'Day 28')!;
  const template = await api<string>(page, `/trials/${trialId}/sites/${site.id}/rounds/${round.id}/template.csv`);
  await page.goto(`${baseUrl()}/trials/${trialId}/intake?site=${site.id}&round=${round.id}`);
  await page.getByLabel('CSV file', { exact: true }).waitFor({ state: 'attached' });
  return { trialId, site, round, template };
}

/** Fails the test on any request to a host other than the app's own (no CDN, fonts or analytics). */
export function forbidOutsideRequests(page: Page, seen: string[]): void {
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (!['127.0.0.1', 'localhost'].includes(url.hostname) && url.protocol !== 'data:' && url.protocol !== 'blob:') seen.push(request.url());
  });
}

/**
 * Collects what Chromium reports in the console when the Content-Security-Policy blocks something
 * (an inline script or style, an eval, a request to another origin); it should stay empty.
 */
export function watchContentSecurityPolicy(page: Page, seen: string[]): void {
  page.on('console', (message) => {
    const text = message.text();
    if (/Content Security Policy|Refused to (load|apply|execute|evaluate|connect|frame|create)/i.test(text)) seen.push(`${page.url()}: ${text}`);
  });
}

export interface BrowserSession {
  browser: Browser;
  context: BrowserContext;
  page: Page;
  /** Requests to any host other than the app's own, seen on `page` (should stay empty). */
  outside: string[];
  /** Content-Security-Policy violations reported on `page`: a test fails when there is any. */
  cspViolations: string[];
}

/** One browser for the test file and a fresh laptop-sized context and page per test. */
export function useBrowserSession(contextOptions: BrowserContextOptions = {}): BrowserSession {
  const session = {} as BrowserSession;
  beforeAll(async () => {
    session.browser = await launchBrowser();
  });
  afterAll(() => session.browser.close());
  beforeEach(async () => {
    session.context = await session.browser.newContext({ viewport: { width: 1280, height: 800 }, ...contextOptions });
    session.page = await session.context.newPage();
    session.outside = [];
    session.cspViolations = [];
    forbidOutsideRequests(session.page, session.outside);
    watchContentSecurityPolicy(session.page, session.cspViolations);
  });
  afterEach(async () => {
    await session.context.close();
    if (session.cspViolations.length > 0) throw new Error(`the Content-Security-Policy blocked something:\n${session.cspViolations.join('\n')}`);
  });
  return session;
}

/** The demo trial's id, read through the API as its investigator. */
export async function demoTrialId(): Promise<number> {
  const login = await fetch(`${baseUrl()}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'investigator@example.org', password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const trials = (await (await fetch(`${baseUrl()}/api/trials`, { headers: { Authorization: `Bearer ${accessToken}` } })).json()) as Array<{ id: number; code: string }>;
  return trials.find((trial) => trial.code === 'FW-CLAY-26')!.id;
}

/** Every page of the router (config/paths.ts), with the demo trial and a made-up invitation token filled in. */
export function everyPage(trialId: number, token = 'not-a-real-invitation-token'): Array<{ name: string; path: string }> {
  return Object.entries(paths).map(([name, route]) => ({ name, path: route.path.replace(':trialId', String(trialId)).replace(':token', token) }));
}

/**
 * Charts draw only when they come near the screen (ChartSlot): scrolls each chart's place into view in
 * turn, as a person reading down the page would, until every chart has drawn; then there are at least
 * `traces` Plotly traces.
 */
export async function drawCharts(page: Page, traces = 1, timeout = 30_000): Promise<void> {
  const slots = page.locator('.fr-chart-slot');
  await slots.first().waitFor({ state: 'attached', timeout });
  const total = await slots.count();
  for (let index = 0; index < total; index += 1) {
    await slots.nth(index).scrollIntoViewIfNeeded();
    await slots.nth(index).locator('.js-plotly-plot .trace').first().waitFor({ timeout });
  }
  await page.locator('.js-plotly-plot .trace').nth(traces - 1).waitFor({ state: 'attached', timeout });
}
