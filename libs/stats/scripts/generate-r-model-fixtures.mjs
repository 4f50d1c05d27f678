#!/usr/bin/env node
// Generates random trial layouts for the measurement models deterministically, analyses each with R
// (generate-r-model-fixtures.R: survival, nlme, emmeans, MASS, car, pbkrtest, stats::glm) and writes
// datasets/reference/r-model-fixtures.json, which src/r-model-reference.test.ts compares against.
//
// Usage: node libs/stats/scripts/generate-r-model-fixtures.mjs [--cases 4] [--seed 20261212] [--output FILE] [--family censored]
// Needs /usr/bin/Rscript with Debian's r-cran-survival, -nlme, -emmeans, -mass, -car, -pbkrtest, -multcomp, -jsonlite.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { seededRandom } from './seeded-random.mjs';

const here = path.dirname(fileURLToPath(import.meta.url));
const textArgument = (name) => {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
};
const output = path.resolve(textArgument('output') ?? path.resolve(here, '../../../datasets/reference/r-model-fixtures.json'));
const casesPerFamily = Number(textArgument('cases') ?? 6);
const seed = Number(textArgument('seed') ?? 20261212);
const onlyFamily = textArgument('family');

// Each case draws from its own stream (seed, family, case number), so any subset regenerates identically.
let random, integer, gauss;
const reseed = (familyIndex, caseIndex) => ({ random, integer, gauss } = seededRandom(seed + 7919 * familyIndex + 104729 * caseIndex));
const round = (x, decimals) => Math.round(x * 10 ** decimals) / 10 ** decimals;

const DESIGNS = ['crd', 'rcbd', 'multisite-rcbd'];

/** Plots of a layout: sites × blocks × treatments (crd: replicates labelled as blocks), with effects. */
function layout(design, options = {}) {
  const sites = design === 'multisite-rcbd' ? integer(2, 3) : 1;
  const treatments = Array.from({ length: integer(3, options.maxTreatments ?? 5) }, (_, i) => (i === 0 ? 'CTRL' : `T${i}`));
  const blocks = integer(3, 5);
  const effects = treatments.map((_, i) => (i === 0 ? 0 : gauss() * 0.5));
  const plots = [];
  for (let s = 1; s <= sites; s++) {
    const siteEffect = gauss() * 0.4;
    for (let b = 1; b <= blocks; b++) {
      const blockEffect = design === 'crd' ? 0 : gauss() * 0.3;
      treatments.forEach((treatment, t) => {
        plots.push({ treatment, block: String(b), ...(design === 'multisite-rcbd' ? { site: `Site ${s}` } : {}), effect: effects[t] + siteEffect + blockEffect });
      });
    }
  }
  return plots;
}

function censoredCase(id, design, distribution) {
  const cutoff = 600;
  const plots = layout(design);
  const observations = plots.map(({ effect, ...labels }) => {
    // Weibull-like log time around log(200 s), shape about 2.
    const u = random();
    const time = Math.exp(Math.log(320) + effect + 0.6 * Math.log(-Math.log(1 - u)));
    const censored = time > cutoff;
    return { ...labels, value: censored ? cutoff : round(Math.max(time, 1), 1), censored };
  });
  return { id, family: 'censored', design, distribution, control: 'CTRL', observations };
}

function ordinalCase(id, design) {
  const plots = layout(design);
  const cuts = [-1.5, -0.3, 0.8, 2];
  const observations = plots.map(({ effect, ...labels }) => {
    const u = Math.min(Math.max(random(), 1e-9), 1 - 1e-9);
    const latent = 2 * effect + Math.log(u / (1 - u));
    return { ...labels, value: String(1 + cuts.filter((c) => latent > c).length) };
  });
  return { id, family: 'ordinal', design, control: 'CTRL', observations };
}

/** A Poisson draw (Knuth's product of uniforms; the means here stay small). */
function poisson(mean) {
  const limit = Math.exp(-mean);
  let k = 0;
  for (let product = random(); product > limit; product *= random()) k++;
  return k;
}

function countCase(id, design, overdispersed) {
  const plots = layout(design);
  const observations = plots.map(({ effect, ...labels }) => {
    // Overdispersed: the mean itself varies from plot to plot (a gamma-like spread from two exponentials).
    const spread = overdispersed ? (-Math.log(1 - random()) - Math.log(1 - random())) / 2 : 1;
    return { ...labels, value: poisson(8 * Math.exp(effect) * spread) };
  });
  return { id, family: 'counts', design, control: 'CTRL', observations };
}

/** Rounds over time: a plot effect, AR-like errors over unequally spaced days, treatment courses; a value or two missing. */
function repeatedCase(id, design, structure) {
  const plots = layout(design, { maxTreatments: 4 });
  const days = design === 'crd' ? [0, 14, 28] : [0, 14, 28, 56];
  const slopes = new Map();
  const observations = [];
  plots.forEach(({ effect, ...labels }, plot) => {
    if (!slopes.has(labels.treatment)) slopes.set(labels.treatment, labels.treatment === 'CTRL' ? 0 : gauss() * 0.02);
    const plotEffect = gauss() * 1.2;
    let error = gauss();
    days.forEach((day, k) => {
      if (k > 0) error = Math.pow(0.97, day - days[k - 1]) * error + Math.sqrt(1 - Math.pow(0.97, 2 * (day - days[k - 1]))) * gauss();
      if (plot === 2 && k === days.length - 1 && design !== 'crd') return; // one plot misses its last round
      const value = 20 + 3 * effect + slopes.get(labels.treatment) * day + plotEffect + error;
      observations.push({ ...labels, round: `Day ${day}`, time: day, value: round(value, 2) });
    });
  });
  return { id, family: 'repeated', design, covariance: structure, control: 'CTRL', observations };
}

/** A baseline (day-0) value per plot and a later value that follows it, with treatment and block effects. */
function ancovaCase(id, design) {
  const plots = layout(design);
  const observations = plots.map(({ effect, ...labels }) => {
    const baseline = 30 + 4 * gauss() + (design === 'multisite-rcbd' ? 0 : effect);
    return { ...labels, value: round(12 + 0.6 * baseline + 3 * effect + gauss(), 2), covariate: round(baseline, 2) };
  });
  return { id, family: 'ancova', design, control: 'CTRL', sitesAre: 'fixed', observations };
}

const families = {
  ordinal: (i) => ordinalCase(`ordinal-${String(i + 1).padStart(2, '0')}`, DESIGNS[i % DESIGNS.length]),
  counts: (i) => countCase(`counts-${String(i + 1).padStart(2, '0')}`, DESIGNS[i % DESIGNS.length], i % 2 === 1),
  censored: (i) => censoredCase(`censored-${String(i + 1).padStart(2, '0')}`, DESIGNS[i % DESIGNS.length], ['weibull', 'lognormal', 'loglogistic'][(i + Math.floor(i / 3)) % 3]),
  repeated: (i) => repeatedCase(`repeated-${String(i + 1).padStart(2, '0')}`, DESIGNS[i % DESIGNS.length], ['cs', 'ar1', 'unstructured'][(i + Math.floor(i / 3)) % 3]),
  ancova: (i) => ancovaCase(`ancova-${String(i + 1).padStart(2, '0')}`, DESIGNS[i % DESIGNS.length]),
};

// Each family's stream number is fixed here, not taken from the order above, so adding or moving a family never
// changes another family's layouts.
const STREAMS = { ordinal: 1, counts: 2, censored: 3, repeated: 4, ancova: 5 };

const cases = Object.entries(families)
  .filter(([family]) => onlyFamily === undefined || family === onlyFamily)
  .flatMap(([family, make]) =>
    Array.from({ length: casesPerFamily }, (_, i) => {
      reseed(STREAMS[family], i);
      return make(i);
    }),
  );

const work = mkdtempSync(path.join(tmpdir(), 'friable-r-models-'));
try {
  const input = path.join(work, 'cases.json');
  const results = path.join(work, 'results.json');
  writeFileSync(input, JSON.stringify(cases));
  execFileSync('Rscript', [path.join(here, 'generate-r-model-fixtures.R'), input, results], { stdio: ['ignore', 'inherit', 'inherit'] });
  const analysed = JSON.parse(readFileSync(results, 'utf8'));
  const fixture = {
    description: `Random layouts for the measurement models analysed by R; generated by libs/stats/scripts/generate-r-model-fixtures.mjs (seed ${seed}).`,
    r: analysed.r,
    cases: cases.map((entry, i) => ({ ...entry, expected: analysed.cases[i] })),
  };
  writeFileSync(output, `${JSON.stringify(fixture)}\n`);
  console.log(`wrote ${cases.length} cases to ${output}`);
} finally {
  rmSync(work, { recursive: true, force: true });
}
