// Benchmark of the factorial and split-plot analyses (issue #10), beside R on the same data when Rscript is there.
// Run by `npm run bench:designs` (after `npx tsc -b libs/stats`).
// Targets: a 4-factor factorial in 4 blocks (4×4×3×3, 576 plots) with slices ≤ 50 ms; a REML multi-site split plot,
// 20 sites × 4 blocks × 6 whole-plot × 4 sub-plot levels with 5 % of plots missing, ≤ 1 s and no slower than lmer.
// Each row shows the median wall-clock time and the median CPU time: on a machine shared with other work the CPU
// time is what the analysis itself costs.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { seededRandom } from '../scripts/seeded-random.mjs';

const require = createRequire(import.meta.url);
const { analyseTrial } = require('../dist/index.js');

/** Plots of sites × blocks × every level combination, with block, whole-plot and interaction effects; a share dropped. */
function layout({ sites, blocks, levels, split, missingShare, seed }) {
  const { random, gauss } = seededRandom(seed);
  const names = ['Amendment', 'Mulch', 'Rate', 'Variety'].slice(0, levels.length);
  const combinations = levels.reduce((acc, count) => acc.flatMap((prefix) => Array.from({ length: count }, (_, l) => [...prefix, l])), [[]]);
  const effects = levels.map((count) => Array.from({ length: count }, () => gauss()));
  const observations = [];
  for (let s = 0; s < sites; s++) {
    const siteEffect = gauss() * 2;
    for (let b = 0; b < blocks; b++) {
      const blockEffect = gauss();
      const wholePlot = new Map();
      for (const combination of combinations) {
        if (random() < missingShare) continue;
        if (split && !wholePlot.has(combination[0])) wholePlot.set(combination[0], gauss());
        const value = 50 + siteEffect + blockEffect + (split ? wholePlot.get(combination[0]) : 0) + combination.reduce((sum, l, f) => sum + effects[f][l], 0) + gauss();
        observations.push({
          factors: Object.fromEntries(names.map((name, f) => [name, `${name.slice(0, 2)}${combination[f] + 1}`])),
          block: String(b + 1),
          ...(sites > 1 ? { site: `S${s + 1}` } : {}),
          value: Math.round(value * 100) / 100,
        });
      }
    }
  }
  return { names, observations };
}

/** Median wall-clock and CPU milliseconds (CPU time says what the work costs on a machine shared with others). */
function time(run, repeats) {
  run();
  const times = [];
  const cpu = [];
  for (let r = 0; r < repeats; r++) {
    const used = process.cpuUsage();
    const start = process.hrtime.bigint();
    run();
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
    const spent = process.cpuUsage(used);
    cpu.push((spent.user + spent.system) / 1000);
  }
  const median = (values) => values.sort((a, b) => a - b)[Math.floor(values.length / 2)];
  return { wall: median(times), cpu: median(cpu) };
}

/** Seconds R takes in-process (system.time) for the same model, or null without R. */
function timeInR(observations, names, formula) {
  const work = mkdtempSync(path.join(tmpdir(), 'friable-bench-designs-'));
  try {
    const file = path.join(work, 'data.csv');
    writeFileSync(file, ['y,block,site,' + names.join(','), ...observations.map((o) => [o.value, o.block, o.site ?? '', ...names.map((n) => o.factors[n])].join(','))].join('\n'));
    const script = `suppressPackageStartupMessages({library(lme4); library(pbkrtest); library(emmeans)})
d <- read.csv("${file}", colClasses = "character"); d$y <- as.numeric(d$y)
t <- system.time({ m <- ${formula}; a <- lapply(seq_along(attr(terms(m), "term.labels")), function(k) { X <- getME(m, "X"); KRmodcomp(m, diag(ncol(X))[attr(X, "assign") == k, , drop = FALSE]) }) })
cat(t[["elapsed"]])`;
    const run = spawnSync('Rscript', ['-e', script], { encoding: 'utf8' });
    return run.status === 0 ? Number(run.stdout.trim()) : null;
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

const factorial = layout({ sites: 1, blocks: 4, levels: [4, 4, 3, 3], split: false, missingShare: 0, seed: 11 });
const factorialMs = time(() => analyseTrial({ design: 'factorial-rcbd', factorNames: factorial.names, observations: factorial.observations, meanSeparation: ['tukey'] }), 21);
const splitPlot = layout({ sites: 20, blocks: 4, levels: [6, 4], split: true, missingShare: 0.05, seed: 12 });
let splitResult;
const splitMs = process.argv.includes('--factorial-only') ? { wall: NaN, cpu: NaN } : time(() => (splitResult = analyseTrial({ design: 'multisite-split-plot', factorNames: splitPlot.names, observations: splitPlot.observations, meanSeparation: ['tukey'] })), 3);
const rSeconds = process.argv.includes('--factorial-only') ? null : timeInR(
  splitPlot.observations,
  splitPlot.names,
  'lmer(y ~ Amendment*Mulch + (1|site) + (1|site:Amendment) + (1|site:Mulch) + (1|site:Amendment:Mulch) + (1|site:block) + (1|site:block:Amendment), data = d)',
);
console.table([
  { layout: '4-factor factorial 4×4×3×3 in 4 blocks, slices + Tukey', plots: factorial.observations.length, 'median ms': Number(factorialMs.wall.toFixed(1)), 'CPU ms': Number(factorialMs.cpu.toFixed(1)), target: '≤ 50 ms' },
  {
    layout: 'REML multi-site split plot 20 sites × 4 blocks × 6 × 4, 5 % missing',
    plots: splitPlot.observations.length,
    'median ms': Number(splitMs.wall.toFixed(0)),
    'CPU ms': Number(splitMs.cpu.toFixed(0)),
    target: '≤ 1000 ms and ≤ lmer',
    'lmer + KRmodcomp ms (R)': rSeconds === null ? 'R absent' : Math.round(rSeconds * 1000),
  },
]);
if (splitResult) console.log(`model used for the split plot: ${splitResult.model.kind}`);
