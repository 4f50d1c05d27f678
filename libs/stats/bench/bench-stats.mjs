// Benchmark of analyseTrial on large layouts: a multisite RCBD with Tukey and letters, and RCBDs up to
// 1,000,000 plots. Run by `npm run bench -w libs/stats` (node --expose-gc) after `npx tsc -b libs/stats`.
// Targets: multisite 50 sites × 10 blocks × 20 treatments < 100 ms; RCBD of 1,000,000 plots < 3 s and < 1 GB;
// Tukey on 100 treatments × 100 blocks (4,950 pairs) ≤ 150 ms; RCBD of 1,000,000 plots with one plot missing
// (10,000 blocks × 100 treatments, its blocks absorbed) ≤ 10 s and < 1 GB.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const { analyseTrial } = require('../dist/index.js');

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

function observations(sites, blocks, treatments) {
  const random = generator(sites * 7919 + blocks * 104729 + treatments);
  const labels = Array.from({ length: treatments }, (_, t) => `T${t + 1}`);
  const blockLabels = Array.from({ length: blocks }, (_, b) => `${b + 1}`);
  const siteLabels = Array.from({ length: sites }, (_, s) => `S${s + 1}`);
  const rows = new Array(sites * blocks * treatments);
  let i = 0;
  for (let s = 0; s < sites; s++) {
    for (let b = 0; b < blocks; b++) {
      for (let t = 0; t < treatments; t++) {
        const value = Math.round((50 + s + 0.5 * b + 0.2 * t + 4 * (random() - 0.5)) * 100) / 100;
        rows[i++] = sites > 1 ? { treatment: labels[t], block: blockLabels[b], site: siteLabels[s], value } : { treatment: labels[t], block: blockLabels[b], value };
      }
    }
  }
  return rows;
}

function measure(label, request, repeats) {
  globalThis.gc?.();
  const baseline = process.memoryUsage();
  let peak = baseline.rss;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 5);
  const times = [];
  let result;
  for (let r = 0; r < repeats; r++) {
    const start = process.hrtime.bigint();
    result = analyseTrial(request);
    times.push(Number(process.hrtime.bigint() - start) / 1e6);
    peak = Math.max(peak, process.memoryUsage().rss);
  }
  clearInterval(timer);
  times.sort((a, b) => a - b);
  return {
    layout: label,
    plots: request.observations.length,
    'median ms': Number(times[Math.floor(times.length / 2)].toFixed(1)),
    'min ms': Number(times[0].toFixed(1)),
    'peak RSS MB': Math.round(peak / 2 ** 20),
    'RSS gain MB': Math.round((peak - baseline.rss) / 2 ** 20),
    'error df': result.summary.errorDf,
  };
}

const rows = [];
for (const [sites, blocks, treatments] of [
  [10, 4, 10],
  [50, 10, 20],
]) {
  for (const method of ['lsd', 'tukey']) {
    const request = { design: 'multisite-rcbd', meanSeparation: [method], forceLsd: true, observations: observations(sites, blocks, treatments) };
    rows.push(measure(`multisite ${sites}×${blocks}×${treatments}, ${method} + letters`, request, method === 'tukey' ? 3 : 7));
  }
}
for (const [blocks, treatments] of [
  [1000, 10],
  [10000, 10],
  [50000, 20],
]) {
  const request = { design: 'rcbd', meanSeparation: ['tukey'], observations: observations(1, blocks, treatments) };
  rows.push(measure(`rcbd ${blocks} blocks × ${treatments}, Tukey + letters`, request, blocks * treatments >= 1e6 ? 3 : 5));
}
const million = rows[rows.length - 1];
const tukey = measure('rcbd 100 blocks × 100, Tukey (4,950 pairs) + letters', { design: 'rcbd', meanSeparation: ['tukey'], observations: observations(1, 100, 100) }, 5);
rows.push(tukey);
const incomplete = observations(1, 10000, 100);
incomplete.splice(123457, 1);
const missing = measure('rcbd 10000 blocks × 100, one plot missing, Tukey + letters', { design: 'rcbd', meanSeparation: ['tukey'], observations: incomplete }, 3);
rows.push(missing);
console.table(rows);
const multisite = rows[3];
console.log(`multisite 50×10×20: ${multisite['median ms']} ms (target < 100 ms)`);
console.log(`rcbd 1,000,000 plots: ${million['median ms']} ms, peak RSS ${million['peak RSS MB']} MB (targets < 3000 ms, < 1024 MB)`);
console.log(`Tukey 100 treatments × 100 blocks: ${tukey['median ms']} ms (target ≤ 150 ms)`);
console.log(`rcbd 999,999 plots (one missing, blocks absorbed): ${missing['median ms']} ms, peak RSS ${missing['peak RSS MB']} MB (targets ≤ 10000 ms, < 1024 MB)`);
