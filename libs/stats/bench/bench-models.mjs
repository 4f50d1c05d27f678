// Benchmark of the measurement models on the layouts, beside R's time on the same data when Rscript is present.
// Run by `npm run bench -w libs/stats` after `npx tsc -b libs/stats`. Targets (issue #11): the time-ratio (AFT)
// regression on 10,000 plots with 20 treatments and 50 blocks ≤ 200 ms; rounds over time by REML with AR(1) on
// 20 sites × 10 treatments × 4 blocks × 8 rounds (6,400 values) ≤ 1 s and no slower than nlme::gls.
// Friable's figures are whole analyses (the curves, the log-rank test and each term dropped for the censored times;
// Kenward–Roger tests, tests within rounds and the split plot for the rounds), R's the single fit named; the AFT
// regression is also timed alone, on the analysis's own model matrix, for the 200 ms target. Each row shows
// the median wall-clock and CPU time (on a shared machine the CPU time is what the analysis itself costs).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const require = createRequire(import.meta.url);
const { analyseCensoredTimes, analyseRepeatedMeasures, buildModelMatrix, fitAcceleratedFailureTime, modelLayout } = require('../dist/index.js');

/** Deterministic pseudo-random values (mulberry32), so runs are comparable. */
function generator(seed) {
  let state = seed;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** 10,000 drain times: 50 blocks × 20 treatments × 10 plots, Weibull-like, censored at a 600 s cut-off. */
function drainTimes() {
  const random = generator(11);
  const rows = [];
  for (let b = 0; b < 50; b++) {
    for (let t = 0; t < 20; t++) {
      for (let r = 0; r < 10; r++) {
        const time = 250 * Math.exp(0.02 * t + 0.004 * b) * (-Math.log(1 - random())) ** (1 / 2.5);
        rows.push({ treatment: `T${t + 1}`, block: `${b + 1}`, value: Math.min(600, Math.round(time * 10) / 10), censored: time >= 600 });
      }
    }
  }
  return rows;
}

/** 6,400 values: 20 sites × 10 treatments × 4 blocks × 8 rounds unequally spaced, plot effects and AR(1) noise. */
function roundValues() {
  const random = generator(23);
  const days = [0, 7, 14, 28, 42, 56, 84, 112];
  const rows = [];
  for (let s = 0; s < 20; s++) {
    for (let b = 0; b < 4; b++) {
      for (let t = 0; t < 10; t++) {
        const plot = 4 * (random() - 0.5);
        let noise = 0;
        days.forEach((day, k) => {
          noise = 0.8 * noise + 2 * (random() - 0.5);
          rows.push({ treatment: `T${t + 1}`, block: `${b + 1}`, site: `S${s + 1}`, round: `R${k + 1}`, time: day, value: Math.round((50 + s + 0.3 * t + 0.05 * day + plot + noise) * 100) / 100 });
        });
      }
    }
  }
  return rows;
}

/** Median wall-clock and CPU milliseconds (CPU time says what the work costs on a machine shared with others). */
function time(compute, repeats) {
  compute();
  const times = [];
  const cpu = [];
  for (let r = 0; r < repeats; r++) {
    const used = process.cpuUsage();
    const start = process.hrtime.bigint();
    compute();
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
    const spent = process.cpuUsage(used);
    cpu.push((spent.user + spent.system) / 1000);
  }
  const median = (values) => values.sort((a, b) => a - b)[Math.floor(values.length / 2)];
  return { wall: median(times), cpu: median(cpu) };
}

/** R's time for one fit, from Rscript's own clock (NaN without R). */
function rTime(rows, columns, code) {
  if (spawnSync('Rscript', ['--version'], { stdio: 'ignore' }).status !== 0) return Number.NaN;
  const directory = mkdtempSync(join(tmpdir(), 'friable-bench-'));
  try {
    writeFileSync(join(directory, 'data.csv'), [columns.join(','), ...rows.map((row) => columns.map((c) => String(row[c])).join(','))].join('\n'));
    const script = `suppressMessages({ library(survival); library(nlme) })\nd <- read.csv("data.csv")\n${code}\ncat(1000 * unname(t["elapsed"]))\n`;
    writeFileSync(join(directory, 'bench.R'), script);
    const run = spawnSync('Rscript', ['bench.R'], { cwd: directory, encoding: 'utf8', timeout: 600_000 });
    return run.status === 0 ? Number(run.stdout.trim().split('\n').pop()) : Number.NaN;
  } finally {
    rmSync(directory, { recursive: true, force: true });
  }
}

const censored = drainTimes();
const censoredMs = time(() => analyseCensoredTimes({ design: 'rcbd', distribution: 'weibull', control: 'T1', observations: censored }), 3);
// The target is the time-ratio (AFT) regression itself: the same model matrix as the analysis, fitted alone.
const censoredLayout = modelLayout('rcbd', censored, 'T1');
const censoredMatrix = buildModelMatrix(censored.length, [...censoredLayout.blockingTerms, censoredLayout.treatmentTerm].map((t) => t.term));
const aftMs = time(
  () => fitAcceleratedFailureTime(censoredMatrix, Float64Array.from(censored, (o) => o.value), Uint8Array.from(censored, (o) => (o.censored ? 1 : 0)), 'weibull'),
  5,
);
const survregMs = rTime(
  censored,
  ['treatment', 'block', 'value', 'censored'],
  'd$treatment <- factor(d$treatment); d$block <- factor(d$block)\nt <- system.time(survreg(Surv(value, !as.logical(censored)) ~ block + treatment, data = d, dist = "weibull"))',
);
const rounds = roundValues();
const repeatedMs = time(() => analyseRepeatedMeasures({ design: 'multisite-rcbd', covariance: 'ar1', control: 'T1', observations: rounds }), 3);
const glsMs = rTime(
  rounds,
  ['treatment', 'block', 'site', 'round', 'time', 'value'],
  'd$plot <- factor(paste(d$site, d$block, d$treatment)); d$treatment <- factor(d$treatment); d$round <- factor(d$round); d$site <- factor(d$site); d$block <- factor(d$block)\nt <- system.time(gls(value ~ site + site:block + treatment * round, data = d, correlation = corCAR1(form = ~ time | plot), method = "REML"))',
);
const shown = (ms) => (Number.isFinite(ms) ? `${ms.toFixed(0)} ms` : 'R not installed');
const row = (analysis, ms, target, anchor) => ({ analysis, 'Friable ms': Number(ms.wall.toFixed(0)), 'Friable CPU ms': Number(ms.cpu.toFixed(0)), 'target ms': target, ...anchor });
console.table([
  row('time-ratio (AFT) regression alone, Weibull, 10,000 plots (20 treatments, 50 blocks)', aftMs, 200, { 'R survreg': shown(survregMs) }),
  row('censored times, whole analysis (curves, log-rank, AFT, drop-term tests, time ratios)', censoredMs, '—', {}),
  row('rounds over time, AR(1), 6,400 values (20 sites × 10 × 4 × 8 rounds)', repeatedMs, 1000, { 'R nlme::gls': shown(glsMs) }),
]);
