import { MersenneTwister19937, shuffle } from 'random-js';
import { invalidInput, requirePositiveInteger, requireText } from './checks';

export type TrialDesign = 'crd' | 'rcbd' | 'factorial-rcbd';

/** The designs Friable lays out: completely randomized, randomized complete block, two-factor factorial in blocks. */
export const TRIAL_DESIGNS: readonly TrialDesign[] = Object.freeze(['crd', 'rcbd', 'factorial-rcbd']);

/** Throws the shared RangeError when `design` is not one of `TRIAL_DESIGNS`. */
export function requireTrialDesign(functionName: string, design: unknown): TrialDesign {
  if (!TRIAL_DESIGNS.includes(design as TrialDesign)) {
    throw invalidInput(functionName, 'design', `one of ${TRIAL_DESIGNS.map((d) => `"${d}"`).join(', ')}`, design);
  }
  return design as TrialDesign;
}

export interface SiteRandomizationInput {
  /** The trial's randomization seed, kept with the trial so the layout can be rebuilt. */
  readonly seed: string;
  /** A stable key for the site (its id, not its editable name). */
  readonly siteKey: string;
  readonly design: TrialDesign;
  /** Treatment codes; for a factorial, the combination codes (e.g. `G1C0`). */
  readonly treatments: readonly string[];
  /** Blocks per site (replicates for a completely randomized design). */
  readonly blocks: number;
  /** Label prefix for the site, e.g. from `plotLabelPrefix`. */
  readonly labelPrefix: string;
}

export interface PlotAssignment {
  /** Block number from 1; for `crd`, the replicate group (layout row of t plots). */
  readonly block: number;
  /** Position from 1: within the block, or over the whole site for `crd`. */
  readonly position: number;
  readonly treatmentCode: string;
  /** Printed plot label: `GH-B2-P07`, or `GH-P07` for `crd`. */
  readonly label: string;
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

function checkTreatments(treatments: readonly string[]): readonly string[] {
  if (!Array.isArray(treatments) || treatments.length < 2) {
    throw invalidInput(FUNCTION_NAME, 'treatments', 'a list of at least 2 treatment codes', treatments);
  }
  const seen = new Set<string>();
  for (const code of treatments) {
    requireText(FUNCTION_NAME, 'treatments[]', code);
    if (seen.has(code)) throw invalidInput(FUNCTION_NAME, 'treatments', 'distinct codes', `${code} twice`);
    seen.add(code);
  }
  return treatments;
}

function positionText(position: number, plotsInRun: number): string {
  return String(position).padStart(Math.max(2, String(plotsInRun).length), '0');
}

/**
 * Randomize site — the seeded plot layout of one site.
 *
 * Purpose: give every site its own reproducible randomization: the same seed and site key
 * always give the same layout, another site gets an independent one.
 * - `rcbd` and `factorial-rcbd`: every treatment once in every block, shuffled separately in
 *   each block. Blocks are shuffled in order from one engine, so adding a block later leaves
 *   the existing blocks unchanged.
 * - `crd`: all treatments × blocks plots shuffled together over positions 1…t·b; `block` is
 *   then only the replicate group, i.e. the layout row of t consecutive positions, and has no
 *   role in the analysis.
 * The engine is MT19937 seeded with [layout version, seedFromText(seed), seedFromText(siteKey)];
 * shuffling is random-js's Fisher–Yates with unbiased integers.
 * Reference: Fisher & Yates (1938) / Durstenfeld (1964) shuffle; Matsumoto & Nishimura (1998);
 * DOMAIN.md "Design rules of thumb" (randomize separately in each block, keep the seed).
 * Throws: RangeError naming the field for an empty seed, site key or prefix, an unknown
 * design, fewer than 1 block, fewer than 2 treatments, or duplicate treatment codes.
 * Example: `randomizeSite({ seed: 'clay-2025', siteKey: 'site-1', design: 'rcbd', treatments: ['C', 'G', 'K'], blocks: 2, labelPrefix: 'GH' })[0].label`
 * → 'GH-B1-P01'
 */
export function randomizeSite(input: SiteRandomizationInput): readonly PlotAssignment[] {
  const seed = requireText(FUNCTION_NAME, 'seed', input.seed);
  const siteKey = requireText(FUNCTION_NAME, 'siteKey', input.siteKey);
  const labelPrefix = requireText(FUNCTION_NAME, 'labelPrefix', input.labelPrefix);
  const design = requireTrialDesign(FUNCTION_NAME, input.design);
  const blocks = requirePositiveInteger(FUNCTION_NAME, 'blocks', input.blocks);
  const treatments = checkTreatments(input.treatments);
  const engine = MersenneTwister19937.seedWithArray([LAYOUT_KEY_VERSION, ...seedFromText(seed), ...seedFromText(siteKey)]);
  const plots: PlotAssignment[] = [];

  if (design === 'crd') {
    const all = shuffle(engine, Array.from({ length: blocks }, () => treatments).flat());
    all.forEach((treatmentCode, index) => {
      const position = index + 1;
      const label = `${labelPrefix}-P${positionText(position, all.length)}`;
      plots.push(Object.freeze({ block: Math.ceil(position / treatments.length), position, treatmentCode, label }));
    });
  } else {
    for (let block = 1; block <= blocks; block += 1) {
      shuffle(engine, [...treatments]).forEach((treatmentCode, index) => {
        const position = index + 1;
        const label = `${labelPrefix}-B${block}-P${positionText(position, treatments.length)}`;
        plots.push(Object.freeze({ block, position, treatmentCode, label }));
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
