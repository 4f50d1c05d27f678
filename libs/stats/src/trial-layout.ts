import { centreDecimalValues } from './decimal-values';
import type { TrialDesign, TrialLayout } from './design-fit';
import { StatsInputError } from './errors';
import type { ModelFactor } from './linear-model';

/** One plot's observation as the analysis receives it. */
export interface TrialObservation {
  /** Treatment label (crd, rcbd, multisite-rcbd). */
  readonly treatment?: string;
  /** Factor levels by factor name (factorial-rcbd). */
  readonly factors?: Readonly<Record<string, string>>;
  readonly block?: string;
  readonly site?: string;
  /** A JSON number or decimal text such as "1000000000000.4". */
  readonly value: number | string;
  /** A baseline covariate (e.g. the day-0 value of the plot): the analysis becomes an analysis of covariance. */
  readonly covariate?: number | string;
}

/** A layout ready for fitting, with the exact centre of its values. */
export interface PreparedLayout {
  readonly layout: TrialLayout;
  readonly centreValue: number;
  readonly factorNames?: readonly [string, string];
}

const DESIGNS: readonly TrialDesign[] = ['crd', 'rcbd', 'factorial-rcbd', 'multisite-rcbd'];

/**
 * Factor coding: level codes for labels, levels in order of first appearance (the protocol's order when the
 * data follow it), as R's factor(x, levels = unique(x)).
 * Reference: Chambers & Hastie (1992), Statistical Models in S, §2.2. @throws never.
 * @example codeFactor('treatment', ['b', 'a', 'b']); // { levels: ['b', 'a'], codes: Int32Array [0, 1, 0] }
 */
export function codeFactor(name: string, labels: readonly string[]): ModelFactor {
  const index = new Map<string, number>();
  const codes = new Int32Array(labels.length);
  labels.forEach((label, i) => {
    let code = index.get(label);
    if (code === undefined) {
      code = index.size;
      index.set(label, code);
    }
    codes[i] = code;
  });
  return Object.freeze({ name, levels: Object.freeze([...index.keys()]), codes });
}

function requiredLabel(value: unknown, what: string, design: string, index: number): string {
  if (typeof value === 'string' && value.trim() !== '') return value;
  if (typeof value === 'number' && Number.isFinite(value)) return String(value);
  throw new StatsInputError(`missing ${what}`, `observation ${index} has no ${what}, which the ${design} design needs`);
}

function resolveFactorNames(observations: readonly TrialObservation[], given?: readonly string[]): [string, string] {
  const names = given ?? Object.keys(observations[0]?.factors ?? {});
  if (names.length !== 2 || names[0] === names[1]) {
    throw new StatsInputError('missing factors', `a factorial-rcbd analysis needs two factor names, found ${JSON.stringify(names)}`);
  }
  return [names[0]!, names[1]!];
}

/** Builds the combination factor a × b with all a·b combinations, refusing empty ones. */
function combinationFactor(factorA: ModelFactor, factorB: ModelFactor): ModelFactor {
  const levelsB = factorB.levels.length;
  const levels = factorA.levels.flatMap((a) => factorB.levels.map((b) => `${a} × ${b}`));
  const codes = new Int32Array(factorA.codes.length);
  const counts = new Int32Array(levels.length);
  for (let i = 0; i < codes.length; i++) {
    codes[i] = factorA.codes[i]! * levelsB + factorB.codes[i]!;
    counts[codes[i]!]!++;
  }
  counts.forEach((count, code) => {
    if (count === 0) throw new StatsInputError('treatment with no data', `treatment ${levels[code]} has no observations`);
  });
  return Object.freeze({ name: 'treatment', levels: Object.freeze(levels), codes });
}

function checkBlocks(block: ModelFactor): void {
  const counts = new Int32Array(block.levels.length);
  for (const code of block.codes) counts[code]!++;
  counts.forEach((count, code) => {
    if (count < 2) {
      const [site, label] = block.levels[code]!.split('\u0000');
      const where = label !== undefined ? `block ${label} at site ${site}` : `block ${site}`;
      throw new StatsInputError('block with a single plot', `${where} has only one plot; a block needs at least two`);
    }
  });
}

function checkTreatmentsAtSites(site: ModelFactor, treatment: ModelFactor): void {
  const t = treatment.levels.length;
  const present = new Uint8Array(site.levels.length * t);
  for (let i = 0; i < site.codes.length; i++) present[site.codes[i]! * t + treatment.codes[i]!] = 1;
  site.levels.forEach((siteLabel, s) => {
    treatment.levels.forEach((label, j) => {
      if (!present[s * t + j]) {
        throw new StatsInputError('treatment with no data', `treatment ${label} has no observations at site ${siteLabel}`);
      }
    });
  });
}

/**
 * Trial layout preparation: checks the observations of an analysis request and codes them for fitting.
 *
 * Labels are coded in order of first appearance. Blocks are nested in sites for a multisite trial (block
 * "1" at one site is not block "1" at another). Values are centred on an exact decimal centre.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 2, 4 and 8.
 * @throws StatsInputError for an unknown design, a missing treatment, block, site or factor level, fewer than
 *   two treatments, an empty factorial combination, a treatment missing from a site, a block with a single plot,
 *   fewer than two sites, or a non-finite value (naming its index).
 * @example prepareTrialLayout('crd', [{ treatment: 'a', value: 1 }, { treatment: 'b', value: '2.5' }, ...]).layout.treatment.levels; // ['a', 'b']
 */
export function prepareTrialLayout(
  design: TrialDesign,
  observations: readonly TrialObservation[],
  values: readonly (number | string)[],
  factorNamesGiven?: readonly string[],
): PreparedLayout {
  if (!DESIGNS.includes(design)) throw new StatsInputError('unknown design', `design must be one of ${DESIGNS.join(', ')}, got ${JSON.stringify(design)}`);
  if (!Array.isArray(observations) || observations.length === 0) {
    throw new StatsInputError('too few observations', 'the request has no observations');
  }
  const centred = centreDecimalValues(values);
  let treatment: ModelFactor;
  let factorA: ModelFactor | undefined;
  let factorB: ModelFactor | undefined;
  let factorNames: [string, string] | undefined;
  if (design === 'factorial-rcbd') {
    factorNames = resolveFactorNames(observations, factorNamesGiven);
    const [nameA, nameB] = factorNames;
    factorA = codeFactor(nameA, observations.map((o, i) => requiredLabel(o.factors?.[nameA], `level of ${nameA}`, design, i)));
    factorB = codeFactor(nameB, observations.map((o, i) => requiredLabel(o.factors?.[nameB], `level of ${nameB}`, design, i)));
    treatment = combinationFactor(factorA, factorB);
  } else {
    treatment = codeFactor('treatment', observations.map((o, i) => requiredLabel(o.treatment, 'treatment', design, i)));
  }
  if (treatment.levels.length < 2) {
    throw new StatsInputError('too few treatments', `an analysis needs at least two treatments, found ${treatment.levels.length}`);
  }
  let block: ModelFactor | undefined;
  let site: ModelFactor | undefined;
  if (design === 'multisite-rcbd') {
    const siteLabels = observations.map((o, i) => requiredLabel(o.site, 'site', design, i));
    site = codeFactor('site', siteLabels);
    if (site.levels.length < 2) {
      throw new StatsInputError('too few sites', `a multisite-rcbd analysis needs at least two sites, found ${site.levels.length}`);
    }
    block = codeFactor('block', observations.map((o, i) => `${siteLabels[i]}\u0000${requiredLabel(o.block, 'block', design, i)}`));
    checkBlocks(block);
    checkTreatmentsAtSites(site, treatment);
  } else if (design !== 'crd') {
    block = codeFactor('block', observations.map((o, i) => requiredLabel(o.block, 'block', design, i)));
    checkBlocks(block);
  }
  const layout: TrialLayout = Object.freeze({
    design,
    y: centred.values,
    treatment,
    ...(block ? { block } : {}),
    ...(site ? { site } : {}),
    ...(factorA ? { factorA } : {}),
    ...(factorB ? { factorB } : {}),
  });
  return Object.freeze({ layout, centreValue: centred.centreValue, ...(factorNames ? { factorNames } : {}) });
}
