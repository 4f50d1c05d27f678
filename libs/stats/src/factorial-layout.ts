import { centreDecimalValues } from './decimal-values';
import { StatsInputError } from './errors';
import type { ModelFactor } from './linear-model';
import { codeFactor, type TrialObservation } from './trial-layout';

/** Designs analysed on their factors: factorials with 2–4 factors and split plots, at one site or several. */
export const FACTORIAL_DESIGNS = ['factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot', 'multisite-factorial-rcbd', 'multisite-split-plot'] as const;
export type FactorialDesign = (typeof FACTORIAL_DESIGNS)[number];

export const isFactorialDesign = (design: string): design is FactorialDesign => (FACTORIAL_DESIGNS as readonly string[]).includes(design);

/** A factorial or split-plot trial coded for fitting. */
export interface FactorialLayout {
  readonly design: FactorialDesign;
  /** Centred values (value − exact decimal centre). */
  readonly y: Float64Array;
  readonly centreValue: number;
  /** The treatment factors in the order of factorNames (a split plot's from the whole-plot factor down). */
  readonly factors: readonly ModelFactor[];
  /** Randomization level of each factor: 1 on whole plots (or plots of a factorial), 2 sub plots, 3 sub-sub plots. */
  readonly levelOf: readonly number[];
  /** Number of error strata (1 factorial, 2 split plot, 3 split-split plot). */
  readonly depth: number;
  /** The level combinations, labelled "a1 × b2". */
  readonly treatment: ModelFactor;
  /** Blocks, labelled uniquely across sites (absent for a completely randomized factorial). */
  readonly block?: ModelFactor;
  readonly site?: ModelFactor;
  /** True when every (site,) block holds every combination exactly once and sites have equal numbers of blocks (or, unblocked, equal replication). */
  readonly balanced: boolean;
  /** Plain sentences about what was left out or is thin (a block with a single plot). */
  readonly notes: readonly string[];
}

const DEPTH: Record<FactorialDesign, number> = {
  'factorial-crd': 1,
  'factorial-rcbd': 1,
  'multisite-factorial-rcbd': 1,
  'split-plot': 2,
  'multisite-split-plot': 2,
  'split-split-plot': 3,
};

function label(value: unknown, what: string, design: string, index: number): string {
  if (typeof value === 'string' && value.trim() !== '') return value;
  if (typeof value === 'number' && Number.isFinite(value)) return String(value);
  throw new StatsInputError(`missing ${what}`, `observation ${index} has no ${what}, which the ${design} design needs`);
}

function factorNamesOf(design: FactorialDesign, observations: readonly TrialObservation[], given?: readonly string[]): string[] {
  const names = [...(given ?? Object.keys(observations[0]?.factors ?? {}))];
  const depth = DEPTH[design];
  const [min, max] = depth === 1 ? [2, 4] : [depth, depth];
  if (names.length < min || names.length > max || new Set(names).size !== names.length || names.some((name) => typeof name !== 'string' || name.trim() === '')) {
    const wanted = min === max ? `${min} factor names` : `${min} to ${max} different factor names`;
    throw new StatsInputError('missing factors', `a ${design} analysis needs ${wanted}, found ${JSON.stringify(names)}`);
  }
  for (const reserved of ['block', 'site', 'treatment', 'error', 'total']) {
    if (names.includes(reserved)) throw new StatsInputError('reserved factor name', `a factor may not be called "${reserved}"`);
  }
  return names;
}

function countBy(codes: Int32Array, size: number): Int32Array {
  const counts = new Int32Array(size);
  for (const code of codes) counts[code]!++;
  return counts;
}

/**
 * Factorial layout: codes the observations of a factorial or split-plot trial for fitting — each factor's
 * levels in order of first appearance, their combinations as treatments, blocks nested in sites — and says
 * whether the layout is balanced (the classical strata then hold exactly).
 * A block with a single plot is kept (the mixed model uses it), with a note; a combination with no plot is refused.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 3–4 and 8.
 * @throws StatsInputError for missing factor names or levels, a missing block or site, fewer than two levels of a
 *   factor, a combination with no plots (at a site), fewer than two sites for a multisite design.
 * @example prepareFactorialLayout('split-plot', observations, values, ['Amendment', 'Mulch']).depth; // 2
 */
export function prepareFactorialLayout(
  design: FactorialDesign,
  observations: readonly TrialObservation[],
  values: readonly (number | string)[],
  factorNamesGiven?: readonly string[],
): FactorialLayout {
  if (!Array.isArray(observations) || observations.length === 0) throw new StatsInputError('too few observations', 'the request has no observations');
  const names = factorNamesOf(design, observations, factorNamesGiven);
  const centred = centreDecimalValues(values);
  const n = observations.length;
  const factors = names.map((name) => codeFactor(name, observations.map((o, i) => label(o.factors?.[name], `level of ${name}`, design, i))));
  factors.forEach((factor) => {
    if (factor.levels.length < 2) throw new StatsInputError('too few levels', `factor ${factor.name} needs at least two levels, found ${factor.levels.length}`);
  });
  const depth = DEPTH[design];
  const levelOf = factors.map((_, f) => (depth === 1 ? 1 : f + 1));
  const combinationLabels = observations.map((_, i) => factors.map((factor) => factor.levels[factor.codes[i]!]!).join(' × '));
  const allCombinations = factors.reduce<string[][]>((acc, factor) => acc.flatMap((prefix) => factor.levels.map((level) => [...prefix, level])), [[]]).map((c) => c.join(' × '));
  const treatment = (() => {
    const index = new Map(allCombinations.map((c, j) => [c, j]));
    const codes = Int32Array.from(combinationLabels, (c) => index.get(c)!);
    const counts = countBy(codes, allCombinations.length);
    counts.forEach((count, j) => {
      if (count === 0) throw new StatsInputError('treatment with no data', `treatment ${allCombinations[j]} has no observations`);
    });
    return Object.freeze({ name: 'treatment', levels: Object.freeze(allCombinations), codes });
  })();
  const multisite = design.startsWith('multisite-');
  let site: ModelFactor | undefined;
  let block: ModelFactor | undefined;
  if (multisite) {
    const siteLabels = observations.map((o, i) => label(o.site, 'site', design, i));
    site = codeFactor('site', siteLabels);
    if (site.levels.length < 2) throw new StatsInputError('too few sites', `a ${design} analysis needs at least two sites, found ${site.levels.length}`);
    block = codeFactor('block', observations.map((o, i) => `${siteLabels[i]}\u0000${label(o.block, 'block', design, i)}`));
    const t = treatment.levels.length;
    const present = new Uint8Array(site.levels.length * t);
    for (let i = 0; i < n; i++) present[site.codes[i]! * t + treatment.codes[i]!] = 1;
    site.levels.forEach((siteLabel, s) =>
      treatment.levels.forEach((combination, j) => {
        if (!present[s * t + j]) throw new StatsInputError('treatment with no data', `treatment ${combination} has no observations at site ${siteLabel}`);
      }),
    );
  } else if (design !== 'factorial-crd') {
    block = codeFactor('block', observations.map((o, i) => label(o.block, 'block', design, i)));
  }
  const notes: string[] = [];
  let balanced: boolean;
  if (block) {
    const t = treatment.levels.length;
    const cells = new Int32Array(block.levels.length * t);
    for (let i = 0; i < n; i++) cells[block.codes[i]! * t + treatment.codes[i]!]!++;
    balanced = cells.every((count) => count === 1);
    countBy(block.codes, block.levels.length).forEach((count, b) => {
      if (count === 1) {
        const [siteLabel, blockLabel] = block!.levels[b]!.split('\u0000');
        notes.push(`${blockLabel !== undefined ? `Block ${blockLabel} at site ${siteLabel}` : `Block ${siteLabel}`} has a single plot; the mixed model uses it, but it says little about the treatments.`);
      }
    });
    if (site && balanced) {
      const blocksPerSite = new Map<number, Set<number>>();
      for (let i = 0; i < n; i++) {
        if (!blocksPerSite.has(site.codes[i]!)) blocksPerSite.set(site.codes[i]!, new Set());
        blocksPerSite.get(site.codes[i]!)!.add(block.codes[i]!);
      }
      balanced = new Set([...blocksPerSite.values()].map((set) => set.size)).size === 1;
    }
  } else {
    balanced = new Set(countBy(treatment.codes, treatment.levels.length)).size === 1;
  }
  return Object.freeze({
    design,
    y: centred.values,
    centreValue: centred.centreValue,
    factors: Object.freeze(factors),
    levelOf: Object.freeze(levelOf),
    depth,
    treatment,
    ...(block ? { block } : {}),
    ...(site ? { site } : {}),
    balanced,
    notes: Object.freeze(notes),
  });
}

/** Every non-empty set of factor indices, in R's order for A*B*C (by size, then lexicographic), grouped by stratum. */
export function factorTerms(layout: Pick<FactorialLayout, 'factors' | 'levelOf'>): number[][] {
  const k = layout.factors.length;
  const sets: number[][] = [];
  for (let mask = 1; mask < 1 << k; mask++) sets.push(Array.from({ length: k }, (_, f) => f).filter((f) => mask & (1 << f)));
  const level = (set: number[]) => Math.max(...set.map((f) => layout.levelOf[f]!));
  return sets.sort((a, b) => level(a) - level(b) || a.length - b.length || a.join(',').localeCompare(b.join(',')));
}

/** The name of a term: factor names joined by ':' in the order of factorNames. */
export const termName = (layout: Pick<FactorialLayout, 'factors'>, set: readonly number[]): string => set.map((f) => layout.factors[f]!.name).join(':');
