#!/usr/bin/env node
// Generates random trial layouts deterministically, analyses each with R (generate-r-fixtures.R:
// anova(lm(...)) with terms in order, emmeans least-squares means and Tukey pairs, multcomp glht Dunnett)
// and writes datasets/reference/r-anova-fixtures.json, which src/r-reference.test.ts compares against.
//
// Usage: node libs/stats/scripts/generate-r-fixtures.mjs [--cases 96] [--seed 20240611] [--output FILE]
// Needs /usr/bin/Rscript with the Debian packages r-cran-emmeans, r-cran-multcomp, r-cran-jsonlite.
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
const argument = (name, fallback) => {
  const text = textArgument(name);
  return text === undefined ? fallback : Number(text);
};
const output = path.resolve(textArgument('output') ?? path.resolve(here, '../../../datasets/reference/r-anova-fixtures.json'));
const caseCount = argument('cases', 96);
const seed = argument('seed', 20240611);

const { random, integer, gauss } = seededRandom(seed);
const pick = (items) => items[integer(0, items.length - 1)];

/** Decimal text of units × 10^−decimals, from a BigInt, so large values keep every digit. */
function decimalText(units, decimals) {
  const negative = units < 0n;
  const digits = (negative ? -units : units).toString().padStart(decimals + 1, '0');
  const text = decimals === 0 ? digits : `${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`;
  return negative ? `-${text}` : text;
}

// Scales: level 10^exponent, noise sd 10^(exponent + noiseShift), written with `decimals` decimals.
const SCALES = [
  { exponent: 0, noiseShift: -1, decimals: 3 },
  { exponent: 2, noiseShift: -1, decimals: 2 },
  { exponent: 4, noiseShift: -2, decimals: 1 },
  { exponent: -2, noiseShift: -1, decimals: 6 },
  { exponent: 6, noiseShift: -6, decimals: 3 },
  { exponent: 12, noiseShift: -12, decimals: 2 },
  { exponent: 9, noiseShift: -7, decimals: 0 },
];

function layoutFor(design) {
  const sites = design === 'multisite-rcbd' ? integer(2, 6) : 1;
  let treatments;
  let factorLevels = null;
  if (design === 'factorial-rcbd') {
    factorLevels = [integer(2, 4), integer(2, 3)];
    treatments = [];
    for (let a = 1; a <= factorLevels[0]; a++) for (let b = 1; b <= factorLevels[1]; b++) treatments.push({ a: `a${a}`, b: `b${b}` });
  } else {
    treatments = Array.from({ length: integer(2, design === 'multisite-rcbd' ? 8 : 12) }, (_, i) => ({ label: `T${String(i + 1).padStart(2, '0')}` }));
  }
  const blocks = design === 'crd' ? 1 : integer(2, design === 'multisite-rcbd' ? 5 : 8);
  return { sites, treatments, factorLevels, blocks };
}

function observationsFor(design, layout) {
  const scale = pick(SCALES);
  const unit = 10 ** -scale.decimals;
  const noise = 10 ** (scale.exponent + scale.noiseShift);
  const base = 10n ** BigInt(Math.max(0, scale.exponent + scale.decimals));
  const effects = layout.treatments.map(() => gauss() * noise * (random() < 0.3 ? 0.2 : 1.5));
  const rows = [];
  for (let s = 1; s <= layout.sites; s++) {
    const siteEffect = gauss() * noise * 3;
    for (let b = 1; b <= layout.blocks; b++) {
      const blockEffect = design === 'crd' ? 0 : gauss() * noise;
      layout.treatments.forEach((treatment, j) => {
        const replicates = design === 'crd' ? integer(2, 6) : 1;
        for (let k = 0; k < replicates; k++) {
          const deviation = effects[j] + siteEffect + blockEffect + gauss() * noise * (layout.sites > 1 ? 1 + 0.3 * s : 1);
          const units = base + BigInt(Math.round(deviation / unit));
          rows.push({ ...treatment, block: String(b), site: `S${s}`, units, decimals: scale.decimals });
        }
      });
    }
  }
  return { rows, scale };
}

function removeMissingPlots(design, rows) {
  if (design === 'crd' || random() < 0.5) return rows;
  const missing = integer(1, 3);
  let kept = rows;
  for (let attempt = 0; attempt < 50 && rows.length - kept.length < missing; attempt++) {
    const drop = integer(0, kept.length - 1);
    const candidate = kept.filter((_, i) => i !== drop);
    const dropped = kept[drop];
    const sameBlock = candidate.filter((r) => r.site === dropped.site && r.block === dropped.block).length;
    const sameCell = candidate.filter((r) => r.site === dropped.site && (r.label ?? `${r.a}${r.b}`) === (dropped.label ?? `${dropped.a}${dropped.b}`)).length;
    if (sameBlock >= 2 && sameCell >= 1) kept = candidate;
  }
  return kept;
}

/** Residual degrees of freedom of the design's model (blocks nested in sites, site × treatment cells). */
function residualDf(design, rows) {
  const count = (key) => new Set(rows.map(key)).size;
  const treatment = (r) => r.label ?? `${r.a}${r.b}`;
  if (design === 'crd') return rows.length - count(treatment);
  const blocks = count((r) => `${r.site}/${r.block}`);
  const cells = count((r) => `${r.site}/${treatment(r)}`);
  return rows.length - (blocks + cells - count((r) => r.site));
}

function buildCase(id, design) {
  let layout, complete, scale, rows;
  do {
    layout = layoutFor(design);
    ({ rows: complete, scale } = observationsFor(design, layout));
    rows = removeMissingPlots(design, complete);
  } while (residualDf(design, rows) < 2);
  // R gets the values less the first one (exact decimal subtraction here): its lm does not centre, and at
  // 1e12 it would lose the digits this comparison is about. The analysis is translation invariant.
  const first = rows[0].units;
  const observations = rows.map((row) => ({
    ...(design === 'factorial-rcbd' ? { factors: { fa: row.a, fb: row.b } } : { treatment: row.label }),
    ...(design === 'crd' ? {} : { block: row.block }),
    ...(design === 'multisite-rcbd' ? { site: row.site } : {}),
    value: decimalText(row.units, row.decimals),
  }));
  return {
    id,
    design,
    scale: `1e${scale.exponent}`,
    missingPlots: complete.length - rows.length,
    ...(design === 'factorial-rcbd' ? { factorNames: ['fa', 'fb'] } : {}),
    observations,
    centred: rows.map((row) => decimalText(row.units - first, row.decimals)),
    centre: decimalText(first, rows[0].decimals),
  };
}

const designs = ['crd', 'rcbd', 'factorial-rcbd', 'multisite-rcbd'];
const cases = Array.from({ length: caseCount }, (_, i) => buildCase(`case-${String(i + 1).padStart(3, '0')}`, designs[i % designs.length]));

const work = mkdtempSync(path.join(tmpdir(), 'friable-r-fixtures-'));
try {
  const input = path.join(work, 'cases.json');
  const results = path.join(work, 'results.json');
  writeFileSync(input, JSON.stringify(cases));
  execFileSync('Rscript', [path.join(here, 'generate-r-fixtures.R'), input, results], { stdio: ['ignore', 'inherit', 'inherit'] });
  const analysed = JSON.parse(readFileSync(results, 'utf8'));
  const fixture = {
    description:
      'Random trial layouts analysed by R; generated by libs/stats/scripts/generate-r-fixtures.mjs (seed ' +
      `${seed}). R receives value − centre (exact decimal subtraction) and its means are shifted back by centre.`,
    r: analysed.r,
    cases: cases.map((entry, i) => {
      const { centred: _centred, ...kept } = entry;
      return { ...kept, expected: analysed.cases[i] };
    }),
  };
  writeFileSync(output, `${JSON.stringify(fixture)}\n`);
  console.log(`wrote ${cases.length} cases to ${output}`);
} finally {
  rmSync(work, { recursive: true, force: true });
}
