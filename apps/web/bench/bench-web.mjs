// bench:web — what the built web app costs a person, measured by Debian's Chromium on loopback:
//  - the first screen (sign-in, then the trials list): its JavaScript and CSS as brotli-compressed at
//    build (the .br files the API serves), against 160 kB; and whether the charting library came with it
//    (it must not: it loads with the first chart);
//  - the demo trial's Findings page with an empty cache (a new browser context each run): when its first
//    table and its first chart show, by the browser's own clock (performance.now() from the start of the
//    navigation, read in the page at the first frame where they are there), against 1 s and 2 s; opened
//    by its address (the whole app loads) and by its tab from the trial's Protocol page; with, per run,
//    when the values' summary, the analysis and the charting library arrived, and the machine's load.
// Starts the built API (which serves the built app) on a free port against the test database, prints a
// table of figures and exits 0: a benchmark, not a test.
//
// Usage: npm run build && npm run bench:web
//   Database: BENCH_DB_NAME, else DB_TEST_NAME (it needs the migrations and the demo scenario).
//   WEB_DIST_DIR (optional) serves another build of the app than apps/web/dist.
/* global window, document, requestAnimationFrame -- functions below run inside the page, in Chromium */
import { spawn } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { createServer } from 'node:net';
import { cpus, loadavg } from 'node:os';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { brotliCompressSync, constants } from 'node:zlib';
import { chromium } from 'playwright-core';
import { loadEnvironment, repoRoot } from '../../devstack/src/env.mjs';

const FIRST_SCREEN_TARGET_BYTES = 160_000;
const TABLE_TARGET_MS = 1000;
const CHART_TARGET_MS = 2000;
const TIMED_RUNS = 5;
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

/** Records the JavaScript and CSS files a page loads from /assets: their size in the build, as brotli, and as sent. */
function recordAssets(page, webDist) {
  const assets = new Map();
  const pending = new Set();
  page.on('requestfinished', (request) => {
    const reading = readAsset(request);
    pending.add(reading);
    void reading.finally(() => pending.delete(reading));
  });
  /** Every asset loaded so far. */
  return async () => {
    while (pending.size) await Promise.all([...pending]);
    return [...assets.values()];
  };

  async function readAsset(request) {
    const path = new URL(request.url()).pathname;
    if (!/^\/assets\/.+\.(js|css)$/.test(path) || assets.has(path)) return;
    const file = resolve(webDist, `.${path}`);
    if (!existsSync(file)) return;
    const response = await request.response();
    const sizes = await request.sizes();
    const brotliFile = `${file}.br`;
    const brotli = existsSync(brotliFile)
      ? statSync(brotliFile).size
      : brotliCompressSync(readFileSync(file), { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }).length;
    assets.set(path, {
      path,
      kind: path.endsWith('.css') ? 'CSS' : 'JS',
      bytes: statSync(file).size,
      brotli,
      sent: sizes.responseBodySize,
      encoding: response?.headers()['content-encoding'] ?? 'none',
    });
  }
}

const sum = (items, key) => items.reduce((total, item) => total + item[key], 0);
const kB = (bytes) => `${(bytes / 1000).toFixed(1)} kB`;
const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const isChartingLibrary = (asset) => /plotly/i.test(asset.path) || asset.bytes > 1_000_000;

/** Network quiet, then quiet again a moment later (late lazy loads). */
async function settle(page) {
  await page.waitForLoadState('networkidle');
  await sleep(1000);
  await page.waitForLoadState('networkidle');
}

/**
 * Installed in every page of a context: watches each frame for the Findings page's first table (with a
 * row) and first chart (a drawn Plotly trace), noting performance.now() when each is first there.
 * window.__friableWatch() starts a new watch from now (for a navigation inside the app).
 */
function installMarks() {
  const watch = (from) => {
    const marks = { from, table: null, chart: null };
    window.__friableMarks = marks;
    const look = () => {
      if (window.__friableMarks !== marks) return;
      if (marks.table === null) {
        const table = document.querySelector('.fr-findings table');
        if (table && table.getClientRects().length > 0 && table.querySelector('tbody tr')) marks.table = performance.now() - from;
      }
      if (marks.chart === null && document.querySelector('.fr-findings .js-plotly-plot .trace')) marks.chart = performance.now() - from;
      if (marks.table === null || marks.chart === null) requestAnimationFrame(look);
    };
    requestAnimationFrame(look);
  };
  window.__friableWatch = () => watch(performance.now());
  watch(0);
}

async function readMarks(page, timeoutMs = 30_000) {
  try {
    await page.waitForFunction(() => window.__friableMarks?.table !== null && window.__friableMarks?.chart !== null, null, { timeout: timeoutMs, polling: 100 });
  } catch {
    // reported as missing below
  }
  return page.evaluate(() => {
    const marks = window.__friableMarks;
    // When the values' summary, the analysis and the charting library arrived (responseEnd), on the same clock.
    const arrived = (pattern) => {
      const entry = performance.getEntriesByType('resource').find((e) => pattern.test(e.name) && e.startTime >= (marks?.from ?? 0));
      return entry ? entry.responseEnd - (marks?.from ?? 0) : null;
    };
    return {
      table: marks?.table ?? null,
      chart: marks?.chart ?? null,
      summary: arrived(/\/findings\/summary\?/),
      analysis: arrived(/\/findings\?/),
      plotly: arrived(/\/assets\/plotly[^/]*\.js$/),
    };
  });
}

/** A new context (empty cache) holding the signed-in session: its cookie and the page's marker (storageState). */
async function signedInContext(browser, signedIn) {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 }, storageState: signedIn });
  await context.addInitScript(installMarks);
  return context;
}

/** The demo trial's Findings page by its address, in a new context (empty cache): the whole app loads. */
async function findingsByAddress(browser, signedIn, origin, trialId) {
  const context = await signedInContext(browser, signedIn);
  try {
    const page = await context.newPage();
    await page.goto(`${origin}/trials/${trialId}/findings`, { waitUntil: 'commit' });
    return await readMarks(page);
  } finally {
    await context.close();
  }
}

/** The Findings tab clicked from the trial's Protocol page, in a new context (the Findings code not yet loaded). */
async function findingsByTab(browser, signedIn, origin, trialId) {
  const context = await signedInContext(browser, signedIn);
  try {
    const page = await context.newPage();
    await page.goto(`${origin}/trials/${trialId}/protocol`);
    await page.getByRole('link', { name: 'Findings', exact: true }).waitFor();
    await settle(page);
    await page.evaluate(() => {
      window.__friableWatch();
      [...document.querySelectorAll('nav a')].find((link) => link.textContent?.trim() === 'Findings')?.click();
    });
    return await readMarks(page);
  } finally {
    await context.close();
  }
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
    const assetsSoFar = recordAssets(page, webDist);

    await page.goto(`${origin}/sign-in`);
    await settle(page);
    const signIn = await assetsSoFar();
    await page.getByLabel('E-mail').fill(INVESTIGATOR);
    await page.getByLabel('Password').fill(base.DEMO_PASSWORD ?? 'friable-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await settle(page);
    const firstScreen = await assetsSoFar();

    const signedIn = await context.storageState();
    const trials = await page.evaluate(async () => (await fetch('/api/trials')).json());
    await context.close();
    const demo = Array.isArray(trials) ? trials.find((trial) => trial.code === DEMO_CODE) : undefined;
    const runs = { address: [], tab: [] };
    if (demo) {
      for (let run = 0; run < TIMED_RUNS; run += 1) {
        runs.address.push(await findingsByAddress(browser, signedIn, origin, demo.id));
        runs.tab.push(await findingsByTab(browser, signedIn, origin, demo.id));
      }
    }
    return { database, webDist, signIn, firstScreen, demo, runs };
  } finally {
    await browser.close();
    api.kill('SIGTERM');
    await new Promise((done) => (api.exitCode !== null ? done() : api.once('exit', done)));
  }
}

function printTable(table) {
  const widths = table[0].map((_, column) => Math.max(...table.map((row) => String(row[column]).length)));
  for (const [index, row] of table.entries()) {
    console.log(row.map((cell, column) => (column === 0 ? String(cell).padEnd(widths[column]) : String(cell).padStart(widths[column]))).join('  '));
    if (index === 0) console.log(widths.map((width) => '-'.repeat(width)).join('  '));
  }
}

function report({ database, webDist, signIn, firstScreen, demo, runs }) {
  const encodings = [...new Set(firstScreen.map((asset) => asset.encoding))].join(', ');
  console.log(`bench:web — database ${database}, app ${webDist}; Chromium got the files with Content-Encoding: ${encodings}`);
  // Timings on a shared machine depend on what else runs: the load average says how busy it was.
  console.log(`Machine: ${cpus().length} cores, load average ${loadavg().map((value) => value.toFixed(2)).join(' / ')} (1 / 5 / 15 min) at the end of the runs`);
  const verdict = (value, target) => (value === null || value === undefined ? 'MISSED (not seen)' : value <= target ? 'met' : 'MISSED');
  const trialsAdded = firstScreen.filter((asset) => !signIn.some((seen) => seen.path === asset.path));
  const js = firstScreen.filter((asset) => asset.kind === 'JS');
  const css = firstScreen.filter((asset) => asset.kind === 'CSS');
  const total = sum(firstScreen, 'brotli');
  const charting = firstScreen.filter(isChartingLibrary);
  const ms = (value) => (value === null || value === undefined ? '—' : `${Math.round(value)} ms`);
  const spread = (values) => (values.some((v) => v === null) ? `${values.filter((v) => v === null).length} not seen` : `${Math.round(Math.min(...values))}–${Math.round(Math.max(...values))} ms`);
  const timing = (label, list, key, target) => {
    const values = list.map((run) => run[key]);
    const seen = values.filter((v) => v !== null);
    const middle = seen.length === values.length ? median(values) : null;
    return [label, `${values.length} runs`, ms(middle), spread(values), `${target / 1000} s ${verdict(middle, target)}`];
  };
  printTable([
    ['figure', 'files', 'built / median', 'brotli / range', 'target'],
    ['/sign-in: JS + CSS', `${signIn.length}`, kB(sum(signIn, 'bytes')), kB(sum(signIn, 'brotli')), ''],
    ['/trials adds', `${trialsAdded.length}`, kB(sum(trialsAdded, 'bytes')), kB(sum(trialsAdded, 'brotli')), ''],
    ['First screen: JavaScript', `${js.length}`, kB(sum(js, 'bytes')), kB(sum(js, 'brotli')), ''],
    ['First screen: CSS', `${css.length}`, kB(sum(css, 'bytes')), kB(sum(css, 'brotli')), ''],
    ['First screen: JS + CSS', `${firstScreen.length}`, kB(sum(firstScreen, 'bytes')), kB(total), `${kB(FIRST_SCREEN_TARGET_BYTES)} ${verdict(total, FIRST_SCREEN_TARGET_BYTES)}`],
    ['Charting library on the first screen', `${charting.length}`, charting.length ? kB(sum(charting, 'bytes')) : 'none', '', `none ${charting.length ? 'MISSED' : 'met'}`],
    ...(demo
      ? [
          timing('Findings by address: first table', runs.address, 'table', TABLE_TARGET_MS),
          timing('Findings by address: first chart', runs.address, 'chart', CHART_TARGET_MS),
          timing('Findings by its tab: first table', runs.tab, 'table', TABLE_TARGET_MS),
          timing('Findings by its tab: first chart', runs.tab, 'chart', CHART_TARGET_MS),
        ]
      : [['Findings', '—', '—', '', `the demo trial ${DEMO_CODE} is not in this database (node apps/api/dist/cli.js demo load)`]]),
  ]);
  const largest = [...firstScreen].sort((a, b) => b.brotli - a.brotli).slice(0, 5);
  console.log(`Largest files of the first screen (brotli): ${largest.map((asset) => `${asset.path.split('/').pop()} ${kB(asset.brotli)}`).join(', ')}`);
  if (demo) {
    console.log(`Each run by address (table / chart): ${runs.address.map((run) => `${ms(run.table)} / ${ms(run.chart)}`).join('; ')}`);
    console.log(`Each run by tab (table / chart): ${runs.tab.map((run) => `${ms(run.table)} / ${ms(run.chart)}`).join('; ')}`);
    const arrivals = (list) => list.map((run) => `${ms(run.summary)} / ${ms(run.analysis)} / ${ms(run.plotly)}`).join('; ');
    console.log(`Arrived by address (values' summary / analysis / charting library): ${arrivals(runs.address)}`);
    console.log(`Arrived by tab (values' summary / analysis / charting library): ${arrivals(runs.tab)}`);
  }
}

try {
  report(await measure(loadEnvironment()));
} catch (error) {
  console.error(`bench:web could not measure: ${error instanceof Error ? error.message : error}`);
  process.exitCode = 1;
}
