#!/usr/bin/env node
// Generates random factorial and split-plot layouts deterministically (some balanced, some with missing plots or
// a block left with a single plot, some over several sites), analyses each with R (generate-r-design-fixtures.R:
// aov with Error() strata, car::Anova type 3, lme4 + pbkrtest KRmodcomp, lmerTest's Satterthwaite, emmeans) and writes
// datasets/reference/r-design-fixtures.json, which src/r-design-reference.test.ts compares against.
//
// Usage: node libs/stats/scripts/generate-r-design-fixtures.mjs [--seed 20261211] [--output FILE] [--cases N]
// Needs /usr/bin/Rscript with Debian's r-cran-lme4, -pbkrtest, -lmertest, -emmeans, -car and -jsonlite.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { commandOption as argument, writeFixtureFromR } from './r-fixture-runner.mjs';
import { seededRandom } from './seeded-random.mjs';

const here = path.dirname(fileURLToPath(import.meta.url));
const output = path.resolve(argument('output') ?? path.resolve(here, '../../../datasets/reference/r-design-fixtures.json'));
const seed = Number(argument('seed') ?? 20261211);
const caseLimit = argument('cases') === undefined ? Infinity : Number(argument('cases'));
const round = (x) => Math.round(x * 100) / 100;

const NAMES = ['Amendment', 'Mulch', 'Rate', 'Variety'];
const PREFIX = ['am', 'mu', 'ra', 've'];

/**
 * One layout: sites × blocks × every combination of the factors' levels, with block, whole-plot, sub-plot,
 * site and site-interaction effects, then some plots dropped (`missing`) and optionally a block cut to one plot.
 */
function layout(index, spec) {
  const { integer, gauss } = seededRandom(seed + 7919 * index);
  const factors = spec.levels.map((count, f) => ({ name: NAMES[f], levels: Array.from({ length: count }, (_, l) => `${PREFIX[f]}${l + 1}`) }));
  const effects = factors.map((factor) => factor.levels.map(() => gauss() * 1.5));
  const interaction = new Map();
  const effectOf = (key, scale) => {
    if (!interaction.has(key)) interaction.set(key, gauss() * scale);
    return interaction.get(key);
  };
  const combinations = factors.reduce((acc, factor) => acc.flatMap((prefix) => factor.levels.map((_, l) => [...prefix, l])), [[]]);
  const observations = [];
  for (let s = 1; s <= spec.sites; s++) {
    const site = `Site ${s}`;
    const siteEffect = spec.sites > 1 ? gauss() * 2 : 0;
    for (let b = 1; b <= spec.blocks; b++) {
      const blockEffect = spec.design === 'factorial-crd' ? 0 : gauss();
      for (const combination of combinations) {
        let value = 40 + siteEffect + blockEffect + combination.reduce((sum, l, f) => sum + effects[f][l], 0);
        value += effectOf(`ab:${combination[0]}:${combination[1]}`, 0.8);
        if (spec.sites > 1) value += effectOf(`s${s}:${combination.join(',')}`, 0.7);
        for (let depth = 1; depth < spec.depth; depth++) value += effectOf(`unit:${s}:${b}:${combination.slice(0, depth).join(',')}`, 1.2);
        value += gauss();
        observations.push({
          factors: Object.fromEntries(factors.map((factor, f) => [factor.name, factor.levels[combination[f]]])),
          ...(spec.design === 'factorial-crd' ? {} : { block: String(b) }),
          ...(spec.sites > 1 ? { site } : {}),
          value: round(value),
        });
      }
    }
  }
  let kept = observations;
  if (spec.singlePlotBlock) {
    const [first] = kept;
    kept = kept.filter((o) => o.block !== first.block || o.site !== first.site || o === first);
  }
  for (let k = 0; k < spec.missing; k++) kept.splice(integer(1, kept.length - 1), 1);
  return { factorNames: factors.map((f) => f.name), observations: kept };
}

const SPECS = [
  { design: 'factorial-rcbd', levels: [2, 3, 2], blocks: 4, sites: 1, depth: 1, missing: 0, model: 'anova' },
  { design: 'factorial-rcbd', levels: [2, 2, 3, 2], blocks: 3, sites: 1, depth: 1, missing: 0, model: 'anova' },
  { design: 'factorial-crd', levels: [3, 2, 2], blocks: 3, sites: 1, depth: 1, missing: 4, model: 'anova' },
  { design: 'factorial-rcbd', levels: [2, 3, 2], blocks: 4, sites: 1, depth: 1, missing: 3, model: 'anova' },
  { design: 'factorial-rcbd', levels: [3, 2, 2], blocks: 4, sites: 1, depth: 1, missing: 3, model: 'reml' },
  { design: 'factorial-rcbd', levels: [2, 3], blocks: 4, sites: 1, depth: 1, missing: 0, singlePlotBlock: true, model: 'reml' },
  { design: 'split-plot', levels: [3, 4], blocks: 4, sites: 1, depth: 2, missing: 0, model: 'anova' },
  { design: 'split-plot', levels: [3, 4], blocks: 4, sites: 1, depth: 2, missing: 3, model: 'reml' },
  { design: 'split-split-plot', levels: [2, 3, 2], blocks: 4, sites: 1, depth: 3, missing: 2, model: 'reml' },
  { design: 'multisite-factorial-rcbd', levels: [2, 3], blocks: 3, sites: 4, depth: 1, missing: 3, model: 'reml' },
  { design: 'multisite-split-plot', levels: [2, 3], blocks: 3, sites: 4, depth: 2, missing: 3, model: 'reml' },
  { design: 'multisite-split-plot', levels: [3, 2], blocks: 3, sites: 3, depth: 2, missing: 0, model: 'reml' },
];

const cases = SPECS.slice(0, caseLimit).map((spec, i) => ({ id: `design-${String(i + 1).padStart(2, '0')}`, design: spec.design, model: spec.model, ...layout(i + 1, spec) }));

writeFixtureFromR({
  cases,
  rScript: path.join(here, 'generate-r-design-fixtures.R'),
  output,
  description: `Random factorial and split-plot layouts analysed by R; generated by libs/stats/scripts/generate-r-design-fixtures.mjs (seed ${seed}).`,
});
