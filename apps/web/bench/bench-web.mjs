// bench:web — what the built web app costs a person: the gzipped JavaScript of the first page load
// (sign-in, then the trials list) against a 400 kB target, and the time from navigating to the demo
// trial's Findings page until its first table shows (target 1 s). Starts the built API (which serves
// the built app) on a free port against the test database, drives Debian's Chromium headless, prints
// a table of figures and exits 0: a benchmark, not a test.
//
// Usage: npm run build && npm run bench:web
//   Database: BENCH_DB_NAME, else DB_TEST_NAME (it needs the migrations and the demo scenario).
//   WEB_DIST_DIR (optional) serves another build of the app than apps/web/dist.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { loadEnvironment, repoRoot } from '../../devstack/src/env.mjs';

const JS_TARGET_BYTES = 400_000;
const FINDINGS_TARGET_MS = 1000;
const TIMED_RUNS = 9;
const DEMO_CODE = 'FW-CLAY-26';
const INVESTIGATOR = 'investigator@example.org';

function freePort() {
  return new Promise((done, fail) => {
    const server = createServer();
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => done(port));
    });
  });
}

async function startApi(base, port) {
  const main = resolve(repoRoot, 'apps/api/dist/main.js');
  const webDist = base.WEB_DIST_DIR ?? resolve(repoRoot, 'apps/web/dist');
  if (!existsSync(main) || !existsSync(resolve(webDist, 'index.html'))) throw new Error(`Build the API and the web app first (npm run build): ${main} and ${webDist}/index.html are needed.`);
  const env = {
    ...base,
    DB_NAME: base.BENCH_DB_NAME ?? base.DB_TEST_NAME,
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    NODE_ENV: 'test',
    WEB_DIST_DIR: webDist,
    JWT_SECRET: base.JWT_SECRET || 'bench-web-only-secret-0123456789abcdef012345',
  };
  const api = spawn(process.execPath, [main], { env, stdio: ['ignore', 'ignore', 'inherit'] });
  for (let attempt = 0; attempt < 120; attempt += 1) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return { api, database: env.DB_NAME, webDist };
    } catch {
      // not listening yet
    }
    if (api.exitCode !== null) throw new Error(`the API exited with ${api.exitCode} before it was ready`);
    await sleep(250);
  }
  api.kill('SIGTERM');
  throw new Error(`the API did not answer on port ${port}`);
}

/** Records every JavaScript response of a page: its URL, its size as sent, and its gzipped size. */
function recordScripts(page) {
  const scripts = new Map();
  const pending = new Set();
  page.on('response', (response) => {
    const reading = readScript(response);
    pending.add(reading);
    void reading.finally(() => pending.delete(reading));
  });
  /** Every script answered so far, once their bodies are read. */
  return async () => {
    while (pending.size) await Promise.all([...pending]);
    return [...scripts.values()];
  };

  async function readScript(response) {
    const url = response.url();
    const type = response.headers()['content-type'] ?? '';
    if (!/\.m?js(\?|$)/.test(new URL(url).pathname) && !type.includes('javascript')) return;
    try {
      const body = await response.body();
      const encoding = response.headers()['content-encoding'];
      // Sent compressed: count what travelled; sent plain: gzip it as a server would.
      const sizes = encoding ? await response.request().sizes() : null;
      scripts.set(url, { url, bytes: body.length, gzip: sizes ? sizes.responseBodySize : gzipSync(body).length, encoding: encoding ?? 'none' });
    } catch {
      // a redirect or an aborted response has no body
    }
  }
}

const sum = (items, key) => items.reduce((total, item) => total + item[key], 0);
const kB = (bytes) => `${(bytes / 1000).toFixed(1)} kB`;
const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

/** Network quiet, then quiet again a moment later: Blueprint fetches its icon shapes a little after the first paint. */
async function settle(page) {
  await page.waitForLoadState('networkidle');
  await sleep(1500);
  await page.waitForLoadState('networkidle');
}

async function apiAs(page, path) {
  return page.evaluate(async (address) => {
    const response = await fetch(`/api${address}`, { headers: { Authorization: `Bearer ${localStorage.getItem('friable.accessToken')}` } });
    return response.ok ? response.json() : null;
  }, path);
}

/** Navigates and waits for the first of: a visible table (the figure), the not-found page, or an error. */
async function timeToFirstTable(page, address, tableSelector) {
  const calls = [];
  const onFinished = (request) => {
    if (new URL(request.url()).pathname.startsWith('/api/')) calls.push({ path: new URL(request.url()).pathname, ms: request.timing().responseEnd });
  };
  page.on('requestfinished', onFinished);
  const started = performance.now();
  await page.goto(address, { waitUntil: 'commit' });
  const table = page.locator(tableSelector).first();
  const notFound = page.getByText('Nothing at this address');
  const failed = page.locator('.bp6-non-ideal-state .bp6-heading');
  const outcome = await Promise.race([
    table.waitFor({ state: 'visible', timeout: 20_000 }).then(() => 'table'),
    notFound.waitFor({ state: 'visible', timeout: 20_000 }).then(() => 'not found'),
    failed.first().waitFor({ state: 'visible', timeout: 20_000 }).then(async () => `said “${await failed.first().innerText()}”`),
  ]).catch(() => 'no table within 20 s');
  const ms = performance.now() - started;
  page.off('requestfinished', onFinished);
  return { outcome, ms, calls };
}

async function measure(base) {
  const port = await freePort();
  const { api, database, webDist } = await startApi(base, port);
  const origin = `http://127.0.0.1:${port}`;
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    const scriptsSoFar = recordScripts(page);

    await page.goto(`${origin}/sign-in`);
    await settle(page);
    const signInScripts = await scriptsSoFar();
    await page.getByLabel('E-mail').fill(INVESTIGATOR);
    await page.getByLabel('Password').fill(base.DEMO_PASSWORD ?? 'friable-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await settle(page);
    const firstLoad = await scriptsSoFar();
    const afterSignIn = firstLoad.slice(signInScripts.length);

    const trials = (await apiAs(page, '/trials')) ?? [];
    const demo = trials.find((trial) => trial.code === DEMO_CODE);
    const timings = { page: null, runs: [], calls: [], outcome: 'the demo trial is not in this database (node apps/api/dist/cli.js demo load)' };
    if (demo) {
      const findings = `${origin}/trials/${demo.id}/findings`;
      const probe = await timeToFirstTable(page, findings, 'main table');
      const ledger = probe.outcome !== 'table';
      timings.page = ledger ? `/trials/${demo.id}/ledger (its grid), because the Findings page ${probe.outcome}` : `/trials/${demo.id}/findings (its first table)`;
      const address = ledger ? `${origin}/trials/${demo.id}/ledger` : findings;
      const selector = ledger ? '.fr-ledger-grid .bp6-table-cell' : 'main table';
      // The probe loaded the page's code once: every timed run is a fresh navigation with a warm browser cache, as for a person coming back.
      for (let run = 0; run < TIMED_RUNS; run += 1) {
        const result = await timeToFirstTable(page, address, selector);
        timings.outcome = result.outcome;
        if (result.outcome !== 'table') break;
        timings.runs.push(result.ms);
        timings.calls.push(result.calls);
      }
      // And once with an empty cache (a new browser context, signed in by its token).
      const token = await page.evaluate(() => localStorage.getItem('friable.accessToken'));
      const cold = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      await cold.addInitScript((value) => localStorage.setItem('friable.accessToken', value), token);
      const coldPage = await cold.newPage();
      const coldResult = await timeToFirstTable(coldPage, address, selector);
      timings.cold = coldResult.outcome === 'table' ? coldResult.ms : null;
      await cold.close();
    }
    return { database, webDist, signInScripts, afterSignIn, firstLoad, timings };
  } finally {
    await browser.close();
    api.kill('SIGTERM');
    await new Promise((done) => (api.exitCode !== null ? done() : api.once('exit', done)));
  }
}

function report({ database, webDist, signInScripts, afterSignIn, firstLoad, timings }) {
  const encodings = [...new Set(firstLoad.map((s) => s.encoding))].join(', ');
  const total = sum(firstLoad, 'gzip');
  const rows = [
    ['JavaScript on /sign-in', `${signInScripts.length} files`, kB(sum(signInScripts, 'bytes')), kB(sum(signInScripts, 'gzip')), ''],
    ['JavaScript added by /trials', `${afterSignIn.length} files`, kB(sum(afterSignIn, 'bytes')), kB(sum(afterSignIn, 'gzip')), ''],
    ['First page load, in all', `${firstLoad.length} files`, kB(sum(firstLoad, 'bytes')), kB(total), `${kB(JS_TARGET_BYTES)} ${total <= JS_TARGET_BYTES ? 'met' : 'MISSED'}`],
  ];
  const { runs } = timings;
  const ms = (value) => (value === null || value === undefined ? '—' : `${Math.round(value)} ms`);
  const timingRows = runs.length
    ? [
        ['To first table, median', `${runs.length} runs`, ms(median(runs)), `${Math.round(Math.min(...runs))}–${Math.round(Math.max(...runs))} ms`, `1 s ${median(runs) <= FINDINGS_TARGET_MS ? 'met' : 'MISSED'}`],
        ['To first table, empty cache', '1 run', ms(timings.cold), '', `1 s ${timings.cold !== null && timings.cold <= FINDINGS_TARGET_MS ? 'met' : 'MISSED'}`],
      ]
    : [['To first table', '—', '—', '', timings.outcome]];
  const table = [['figure', 'count', 'size / time', 'gzip / range', 'target'], ...rows, ...timingRows];
  const widths = table[0].map((_, column) => Math.max(...table.map((row) => String(row[column]).length)));
  console.log(`bench:web — database ${database}, app ${webDist}; JavaScript sent with Content-Encoding: ${encodings} (sizes gzipped here with node:zlib when none)`);
  console.log(`Timed page: ${timings.page ?? '(none)'}`);
  for (const [index, row] of table.entries()) {
    console.log(row.map((cell, column) => (column === 0 ? String(cell).padEnd(widths[column]) : String(cell).padStart(widths[column]))).join('  '));
    if (index === 0) console.log(widths.map((width) => '-'.repeat(width)).join('  '));
  }
  const largest = [...firstLoad].sort((a, b) => b.gzip - a.gzip).slice(0, 3);
  console.log(`Largest scripts of the first load (gzip): ${largest.map((s) => `${new URL(s.url).pathname.split('/').pop()} ${kB(s.gzip)}`).join(', ')}`);
  if (runs.length) console.log(`Each timed run: ${runs.map((value) => `${Math.round(value)} ms`).join(', ')}`);
  const middle = timings.calls[runs.indexOf(median(runs))] ?? [];
  if (middle.length) console.log(`API calls before the table in the median run: ${middle.map((call) => `${call.path} ${Math.round(call.ms)} ms`).join('; ')}`);
}

try {
  report(await measure(loadEnvironment()));
} catch (error) {
  console.error(`bench:web could not measure: ${error instanceof Error ? error.message : error}`);
  process.exitCode = 1;
}
