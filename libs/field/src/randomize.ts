import { MersenneTwister19937, shuffle, type Engine } from 'random-js';
import { invalidInput, requirePositiveInteger, requireText } from './checks';
import { factorCombinations } from './factor-combinations';
import { DESIGN_RULES, requireFactorCount, requireTrialDesign, type TrialDesign } from './trial-designs';

export { TRIAL_DESIGNS, requireTrialDesign, type TrialDesign } from './trial-designs';

/** A factor as the randomization needs it: its name (for messages) and its level codes in order. */
export interface RandomizationFactor {
  readonly name: string;
  readonly levels: readonly string[];
}

export interface SiteRandomizationInput {
  /** The trial's randomization seed, kept with the trial so the layout can be rebuilt. */
  readonly seed: string;
  /** A stable key for the site (its id, not its editable name). */
  readonly siteKey: string;
  readonly design: TrialDesign;
  /** One-factor designs: the treatment codes. A factorial may give its combination codes here instead of `factors`. */
  readonly treatments?: readonly string[];
  /** Factorial and split designs: the factors in order (a split plot's whole-plot factor first), with their level codes. */
  readonly factors?: readonly RandomizationFactor[];
  /** Blocks per site (replicates for a completely randomized design). */
  readonly blocks: number;
  /** Label prefix for the site, e.g. from `plotLabelPrefix`. */
  readonly labelPrefix: string;
}

export interface PlotAssignment {
  /** Block number from 1; for `crd`, the replicate group (layout row of t plots). */
  readonly block: number;
  /** Position from 1: within the block, or over the whole site for `crd`. Split designs: whole plots in order, sub plots side by side inside them. */
  readonly position: number;
  /** The treatment code; with factors, the combination code (level codes joined). */
  readonly treatmentCode: string;
  /** Printed plot label: `GH-B2-P07`, `GH-P07` for `crd`, `GH-B2-W3-S2` for a split plot, `GH-B2-W3-S2-SS1` for a split-split plot. */
  readonly label: string;
  /** Split designs: the whole plot within its block, from 1; null otherwise. */
  readonly wholePlot: number | null;
  /** Split designs: the sub plot within its whole plot, from 1; null otherwise. */
  readonly subPlot: number | null;
  /** Split-split plot: the sub-sub plot within its sub plot, from 1; null otherwise. */
  readonly subSubPlot: number | null;
  /** The level code of each factor, in the factors' order; empty for one-factor designs. */
  readonly levels: readonly string[];
}

/** Bumped if the layout algorithm ever changes, so old seeds cannot silently give new maps. */
const LAYOUT_KEY_VERSION = 1;
const FUNCTION_NAME = 'randomizeSite';

/**
 * Seed from text — turns a seed text into the 32-bit words a Mersenne Twister is seeded with.
 *
 * Purpose: let people keep a readable seed ("clay-2025") instead of a number. The text is
 * encoded as UTF-8 and packed four bytes to a word (little-endian), preceded by the byte
 * count. This is an encoding, not a lossy hash: two different texts never give the same
 * words, and because the length comes first, joining two encodings is unambiguous too.
 * (Lone UTF-16 surrogates are not text; UTF-8 encoding replaces them with U+FFFD.)
 * Reference: MT19937 `init_by_array` takes a key of any length (Matsumoto & Nishimura 1998,
 * ACM TOMACS 8:3–30, and their reference code mt19937ar.c).
 * Throws: nothing.
 * Example: `seedFromText('ab')` → [2, 25185]
 */
export function seedFromText(text: string): readonly number[] {
  const bytes = new TextEncoder().encode(text);
  const words = new Array<number>(Math.ceil(bytes.length / 4)).fill(0);
  bytes.forEach((byte, index) => {
    words[index >> 2] = (words[index >> 2]! | (byte << (8 * (index & 3)))) >>> 0;
  });
  return Object.freeze([bytes.length, ...words]);
}

function positionText(position: number, plotsInRun: number): string {
  return String(position).padStart(Math.max(2, String(plotsInRun).length), '0');
}

/** A unit number in a label (`W3`, `S12`): padded only as wide as the largest number of its run. */
function unitText(unit: number, unitsInRun: number): string {
  return String(unit).padStart(String(unitsInRun).length, '0');
}

interface Treatment {
  readonly code: string;
  readonly levels: readonly string[];
}

/** The factors' level codes checked: the count the design allows, 2 levels or more, distinct codes and combinations. */
function checkFactors(design: TrialDesign, factors: readonly RandomizationFactor[] | undefined): readonly RandomizationFactor[] {
  requireFactorCount(FUNCTION_NAME, design, factors).forEach((factor, index) => {
    requireText(FUNCTION_NAME, `factors[${index}].name`, factor?.name);
    checkCodes(`factors[${index}].levels`, factor.levels, 'level codes');
  });
  return factors!;
}

function checkCodes(field: string, codes: readonly string[] | undefined, what: string): readonly string[] {
  if (!Array.isArray(codes) || codes.length < 2) throw invalidInput(FUNCTION_NAME, field, `a list of at least 2 ${what}`, codes);
  const seen = new Set<string>();
  for (const code of codes) {
    requireText(FUNCTION_NAME, `${field}[]`, code);
    if (seen.has(code)) throw invalidInput(FUNCTION_NAME, field, 'distinct codes', `${code} twice`);
    seen.add(code);
  }
  return codes;
}

/** The treatments to lay out: the given codes, or every combination of the factors' levels (first factor outermost). */
function treatmentsOf(input: SiteRandomizationInput, design: TrialDesign): readonly Treatment[] {
  const rule = DESIGN_RULES[design];
  if (rule.maxFactors === 0 || (!rule.split && input.factors === undefined)) {
    return checkCodes('treatments', input.treatments, 'treatment codes').map((code) => ({ code, levels: [] }));
  }
  const factors = checkFactors(design, input.factors);
  const combinations = factorCombinations(factors.map((factor) => factor.levels.map((code) => ({ code, name: code }))));
  const treatments = combinations.map((combination) => ({ code: combination.code, levels: combination.levels.map((level) => level.code) }));
  checkCodes('factors', treatments.map((treatment) => treatment.code), 'combination codes (level codes that join uniquely)');
  return treatments;
}

/** A split plot's block: whole-plot levels shuffled over the whole plots, then each lower factor shuffled inside its unit. */
function splitBlock(engine: Engine, factors: readonly RandomizationFactor[], block: number, labelPrefix: string): PlotAssignment[] {
  const plots: PlotAssignment[] = [];
  const counts = factors.map((factor) => factor.levels.length);
  const place = (levels: readonly string[], units: readonly number[]) => {
    const [wholePlot, subPlot, subSubPlot = null] = units as [number, number, number?];
    const parts = [`${labelPrefix}-B${block}`, `W${unitText(wholePlot, counts[0]!)}`, `S${unitText(subPlot, counts[1]!)}`];
    if (subSubPlot !== null) parts.push(`SS${unitText(subSubPlot, counts[2]!)}`);
    plots.push(
      Object.freeze({ block, position: plots.length + 1, treatmentCode: levels.join(''), label: parts.join('-'), wholePlot, subPlot, subSubPlot, levels: Object.freeze([...levels]) }),
    );
  };
  const nest = (depth: number, levels: readonly string[], units: readonly number[]) => {
    if (depth === factors.length) {
      place(levels, units);
      return;
    }
    shuffle(engine, [...factors[depth]!.levels]).forEach((level, index) => nest(depth + 1, [...levels, level], [...units, index + 1]));
  };
  nest(0, [], []);
  return plots;
}

/**
 * Randomize site — the seeded plot layout of one site.
 *
 * Purpose: give every site its own reproducible randomization: the same seed and site key
 * always give the same layout, another site gets an independent one.
 * - `rcbd`, `factorial-rcbd`: every treatment (factor combination) once in every block, shuffled
 *   separately in each block. Blocks are shuffled in order from one engine, so adding a block
 *   later leaves the existing blocks unchanged.
 * - `crd`, `factorial-crd`: all treatments × blocks plots shuffled together over positions
 *   1…t·b; `block` is then only the replicate group, i.e. the layout row of t consecutive
 *   positions, and has no role in the analysis.
 * - `split-plot`, `split-split-plot`: in each block the whole-plot factor's levels are shuffled
 *   over the block's whole plots; inside each whole plot the sub-plot factor's levels are
 *   shuffled over its sub plots; inside each sub plot (split-split) the sub-sub-plot levels over
 *   its sub-sub plots. These are the restrictions of the split-plot randomization: a whole-plot
 *   level covers a whole plot, and a lower factor never leaves its unit.
 * The engine is MT19937 seeded with [layout version, seedFromText(seed), seedFromText(siteKey)];
 * shuffling is random-js's Fisher–Yates with unbiased integers.
 * Reference: Fisher & Yates (1938) / Durstenfeld (1964) shuffle; Matsumoto & Nishimura (1998);
 * Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., §3.4.1 and
 * §3.5.1 (randomization of split and split-split plots); DOMAIN.md "Design rules of thumb".
 * Throws: RangeError naming the field for an empty seed, site key or prefix, an unknown
 * design, fewer than 1 block, fewer than 2 treatments or levels, duplicate codes, or a number of
 * factors the design does not take.
 * Example: `randomizeSite({ seed: 'clay-2025', siteKey: 'site-1', design: 'rcbd', treatments: ['C', 'G', 'K'], blocks: 2, labelPrefix: 'GH' })[0].label`
 * → 'GH-B1-P01'
 */
export function randomizeSite(input: SiteRandomizationInput): readonly PlotAssignment[] {
  const seed = requireText(FUNCTION_NAME, 'seed', input.seed);
  const siteKey = requireText(FUNCTION_NAME, 'siteKey', input.siteKey);
  const labelPrefix = requireText(FUNCTION_NAME, 'labelPrefix', input.labelPrefix);
  const design = requireTrialDesign(FUNCTION_NAME, input.design);
  const blocks = requirePositiveInteger(FUNCTION_NAME, 'blocks', input.blocks);
  const treatments = treatmentsOf(input, design);
  const engine = MersenneTwister19937.seedWithArray([LAYOUT_KEY_VERSION, ...seedFromText(seed), ...seedFromText(siteKey)]);
  const plots: PlotAssignment[] = [];
  const plain = (block: number, position: number, treatment: Treatment, label: string): PlotAssignment =>
    Object.freeze({ block, position, treatmentCode: treatment.code, label, wholePlot: null, subPlot: null, subSubPlot: null, levels: Object.freeze([...treatment.levels]) });

  if (DESIGN_RULES[design].split) {
    for (let block = 1; block <= blocks; block += 1) plots.push(...splitBlock(engine, input.factors!, block, labelPrefix));
  } else if (!DESIGN_RULES[design].blocked) {
    const all = shuffle(engine, Array.from({ length: blocks }, () => treatments).flat());
    all.forEach((treatment, index) => {
      const position = index + 1;
      plots.push(plain(Math.ceil(position / treatments.length), position, treatment, `${labelPrefix}-P${positionText(position, all.length)}`));
    });
  } else {
    for (let block = 1; block <= blocks; block += 1) {
      shuffle(engine, [...treatments]).forEach((treatment, index) => {
        const position = index + 1;
        plots.push(plain(block, position, treatment, `${labelPrefix}-B${block}-P${positionText(position, treatments.length)}`));
      });
    }
  }
  return Object.freeze(plots);
}

const SMALL_WORDS = new Set(['THE', 'OF', 'AND', 'AT']);

/**
 * Plot label prefix — a 2–3 letter uppercase prefix for a site's plot labels.
 *
 * Purpose: short, printable labels (`GH-B2-P07`). Initials of the first three words
 * ("Green Hill" → `GH`, "North Side Allotment" → `NSA`), skipping "the/of/and/at"; a single
 * word gives its first three letters ("Riverside" → `RIV`). Accents are dropped
 * ("Östra Trädgården" → `OT`); digits and other scripts are ignored, so give a prefix by hand
 * for such names. Two sites can get the same prefix; the caller keeps them distinct.
 * Reference: none (Friable convention).
 * Throws: RangeError when the name holds fewer than two Latin letters.
 * Example: `plotLabelPrefix('Green Hill Community Garden')` → 'GHC'
 */
export function plotLabelPrefix(siteName: string): string {
  const words = siteName
    .normalize('NFD')
    .replace(/\p{M}/gu, '')
    .toUpperCase()
    .split(/[^A-Z]+/)
    .filter((word) => word !== '');
  const meaningful = words.filter((word) => !SMALL_WORDS.has(word));
  const chosen = meaningful.length > 0 ? meaningful : words;
  const prefix = chosen.length >= 2 ? chosen.slice(0, 3).map((word) => word[0]).join('') : (chosen[0] ?? '').slice(0, 3);
  if (prefix.length < 2) {
    throw invalidInput('plotLabelPrefix', 'siteName', 'a name with at least two Latin letters', siteName);
  }
  return prefix;
}
