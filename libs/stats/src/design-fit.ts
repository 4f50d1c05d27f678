import { fitAbsorbedLinearModel } from './absorbed-linear-model';
import { StatsInputError } from './errors';
import { fitLinearModel, type LinearModelFit, type ModelFactor, type ModelTerm, type SequentialTermRow } from './linear-model';

/** The trial designs the engine analyses. */
export type TrialDesign = 'crd' | 'rcbd' | 'factorial-rcbd' | 'multisite-rcbd';

/** Observations of one trial, already centred and coded (see `prepareTrialLayout`). */
export interface TrialLayout {
  readonly design: TrialDesign;
  /** Centred values (value − exact decimal centre). */
  readonly y: Float64Array;
  /** Treatment of each plot; for a factorial, the combination `a × b`. */
  readonly treatment: ModelFactor;
  /** Block of each plot, labelled uniquely across sites. */
  readonly block?: ModelFactor;
  readonly site?: ModelFactor;
  /** The two factors of a factorial; combination code = a · levelsB + b. */
  readonly factorA?: ModelFactor;
  readonly factorB?: ModelFactor;
}

/** Least-squares means of one factor's levels (centred scale), with variance factors of σ². */
export interface FactorLevelMeans {
  readonly factor: string;
  readonly levels: readonly string[];
  readonly counts: readonly number[];
  readonly means: Float64Array;
  readonly varianceFactors: Float64Array;
}

/** A fitted trial design: sequential ANOVA rows, residuals and treatment least-squares means. */
export interface DesignFit {
  readonly method: 'classical' | 'least-squares';
  /** Model terms in their documented order (error and total excluded). */
  readonly rows: readonly SequentialTermRow[];
  readonly residualDf: number;
  readonly residualSs: number;
  readonly fitted: Float64Array;
  readonly residuals: Float64Array;
  readonly leverage: Float64Array;
  readonly treatmentCounts: readonly number[];
  /** Treatment least-squares means on the centred scale. */
  readonly treatmentMeans: Float64Array;
  /** k × k covariance of the treatment means divided by σ² (row-major). */
  readonly meanCovariance: Float64Array;
  /** Per-factor means for a factorial. */
  readonly factorMeans?: readonly FactorLevelMeans[];
}

function countLevels(factor: ModelFactor): number[] {
  const counts = new Array<number>(factor.levels.length).fill(0);
  for (const code of factor.codes) counts[code]!++;
  return counts;
}

/**
 * True when every (site,) block holds each treatment exactly once and every site has the same number
 * of blocks: the layout for which the classical closed-form sums of squares are exact.
 */
function isCompleteBlocked(layout: TrialLayout): boolean {
  const block = layout.block!;
  const treatments = layout.treatment.levels.length;
  const cellCounts = new Int32Array(block.levels.length * treatments);
  for (let i = 0; i < layout.y.length; i++) cellCounts[block.codes[i]! * treatments + layout.treatment.codes[i]!]!++;
  for (const count of cellCounts) if (count !== 1) return false;
  if (!layout.site) return true;
  const blocksPerSite = new Map<number, Set<number>>();
  for (let i = 0; i < layout.y.length; i++) {
    const site = layout.site.codes[i]!;
    if (!blocksPerSite.has(site)) blocksPerSite.set(site, new Set());
    blocksPerSite.get(site)!.add(block.codes[i]!);
  }
  const sizes = new Set([...blocksPerSite.values()].map((blocks) => blocks.size));
  return sizes.size === 1;
}

function meansBy(y: Float64Array, codes: Int32Array, levelCount: number): { means: Float64Array; counts: Float64Array } {
  const sums = new Float64Array(levelCount);
  const counts = new Float64Array(levelCount);
  for (let i = 0; i < y.length; i++) {
    sums[codes[i]!]! += y[i]!;
    counts[codes[i]!]!++;
  }
  for (let level = 0; level < levelCount; level++) sums[level] = sums[level]! / counts[level]!;
  return { means: sums, counts };
}

function diagonalCovariance(factors: readonly number[]): Float64Array {
  const k = factors.length;
  const covariance = new Float64Array(k * k);
  factors.forEach((value, i) => (covariance[i * k + i] = value));
  return covariance;
}

/** One-way analysis by group means: exact for any replication. */
function classicalOneWay(layout: TrialLayout): DesignFit {
  const { y, treatment } = layout;
  const k = treatment.levels.length;
  const { means, counts } = meansBy(y, treatment.codes, k);
  let grand = 0;
  for (let i = 0; i < y.length; i++) grand += y[i]!;
  grand /= y.length;
  let treatmentSs = 0;
  for (let t = 0; t < k; t++) treatmentSs += counts[t]! * (means[t]! - grand) ** 2;
  const fitted = new Float64Array(y.length);
  const residuals = new Float64Array(y.length);
  const leverage = new Float64Array(y.length);
  let residualSs = 0;
  for (let i = 0; i < y.length; i++) {
    const t = treatment.codes[i]!;
    fitted[i] = means[t]!;
    residuals[i] = y[i]! - means[t]!;
    leverage[i] = 1 / counts[t]!;
    residualSs += residuals[i]! * residuals[i]!;
  }
  return Object.freeze({
    method: 'classical' as const,
    rows: [Object.freeze({ term: 'treatment', df: k - 1, ss: treatmentSs })],
    residualDf: y.length - k,
    residualSs,
    fitted,
    residuals,
    leverage,
    treatmentCounts: Array.from(counts),
    treatmentMeans: means,
    meanCovariance: diagonalCovariance(Array.from(counts, (n) => 1 / n)),
  });
}

/**
 * Complete blocks (optionally within sites): sums of squares about site, block, treatment and
 * site × treatment cell means. With one site this is the classical RCBD.
 */
function classicalBlocked(layout: TrialLayout): DesignFit {
  const { y, treatment } = layout;
  const block = layout.block!;
  const n = y.length;
  const t = treatment.levels.length;
  const siteCodes = layout.site?.codes ?? new Int32Array(n);
  const sites = layout.site?.levels.length ?? 1;
  const blockMeans = meansBy(y, block.codes, block.levels.length).means;
  const siteMeans = meansBy(y, siteCodes, sites).means;
  const treatmentMeans = meansBy(y, treatment.codes, t).means;
  const cellCodes = new Int32Array(n);
  for (let i = 0; i < n; i++) cellCodes[i] = siteCodes[i]! * t + treatment.codes[i]!;
  const cellMeans = meansBy(y, cellCodes, sites * t).means;
  let grand = 0;
  for (let i = 0; i < n; i++) grand += y[i]!;
  grand /= n;
  const blocksPerSite = block.levels.length / sites;
  const r = blocksPerSite;
  let siteSs = 0;
  for (let s = 0; s < sites; s++) siteSs += t * r * (siteMeans[s]! - grand) ** 2;
  const blockSiteOf = new Int32Array(block.levels.length);
  for (let i = 0; i < n; i++) blockSiteOf[block.codes[i]!] = siteCodes[i]!;
  let blockSs = 0;
  for (let b = 0; b < block.levels.length; b++) blockSs += t * (blockMeans[b]! - siteMeans[blockSiteOf[b]!]!) ** 2;
  let treatmentSs = 0;
  for (let j = 0; j < t; j++) treatmentSs += sites * r * (treatmentMeans[j]! - grand) ** 2;
  let interactionSs = 0;
  for (let s = 0; s < sites; s++) {
    for (let j = 0; j < t; j++) {
      interactionSs += r * (cellMeans[s * t + j]! - siteMeans[s]! - treatmentMeans[j]! + grand) ** 2;
    }
  }
  const fitted = new Float64Array(n);
  const residuals = new Float64Array(n);
  let residualSs = 0;
  for (let i = 0; i < n; i++) {
    const s = siteCodes[i]!;
    fitted[i] = blockMeans[block.codes[i]!]! + cellMeans[s * t + treatment.codes[i]!]! - siteMeans[s]!;
    residuals[i] = y[i]! - fitted[i]!;
    residualSs += residuals[i]! * residuals[i]!;
  }
  const leverage = new Float64Array(n).fill(1 / t + 1 / r - 1 / (r * t));
  const rows: SequentialTermRow[] = layout.site
    ? [
        { term: 'site', df: sites - 1, ss: siteSs },
        { term: 'block:site', df: sites * (r - 1), ss: blockSs },
        { term: 'treatment', df: t - 1, ss: treatmentSs },
        { term: 'site:treatment', df: (sites - 1) * (t - 1), ss: interactionSs },
      ]
    : [
        { term: 'block', df: r - 1, ss: blockSs },
        { term: 'treatment', df: t - 1, ss: treatmentSs },
      ];
  return Object.freeze({
    method: 'classical' as const,
    rows: rows.map((row) => Object.freeze(row)),
    residualDf: sites * (r - 1) * (t - 1),
    residualSs,
    fitted,
    residuals,
    leverage,
    treatmentCounts: new Array<number>(t).fill(sites * r),
    treatmentMeans,
    meanCovariance: diagonalCovariance(new Array<number>(t).fill(1 / (sites * r))),
  });
}

/** Splits the combination sum of squares of a complete factorial into A, B and A:B. */
function classicalFactorial(layout: TrialLayout): DesignFit {
  const rcbd = classicalBlocked(layout);
  const factorA = layout.factorA!;
  const factorB = layout.factorB!;
  const a = factorA.levels.length;
  const b = factorB.levels.length;
  const r = layout.block!.levels.length;
  const meansA = meansBy(layout.y, factorA.codes, a);
  const meansB = meansBy(layout.y, factorB.codes, b);
  let grand = 0;
  for (const value of layout.y) grand += value;
  grand /= layout.y.length;
  let ssA = 0;
  for (let i = 0; i < a; i++) ssA += r * b * (meansA.means[i]! - grand) ** 2;
  let ssB = 0;
  for (let j = 0; j < b; j++) ssB += r * a * (meansB.means[j]! - grand) ** 2;
  let ssAB = 0;
  for (let i = 0; i < a; i++) {
    for (let j = 0; j < b; j++) {
      ssAB += r * (rcbd.treatmentMeans[i * b + j]! - meansA.means[i]! - meansB.means[j]! + grand) ** 2;
    }
  }
  const factorMeans: FactorLevelMeans[] = [factorA, factorB].map((factor, index) => {
    const levelMeans = index === 0 ? meansA : meansB;
    return Object.freeze({
      factor: factor.name,
      levels: factor.levels,
      counts: Array.from(levelMeans.counts),
      means: levelMeans.means,
      varianceFactors: Float64Array.from(levelMeans.counts, (n) => 1 / n),
    });
  });
  return Object.freeze({
    ...rcbd,
    rows: [
      rcbd.rows[0]!,
      Object.freeze({ term: factorA.name, df: a - 1, ss: ssA }),
      Object.freeze({ term: factorB.name, df: b - 1, ss: ssB }),
      Object.freeze({ term: `${factorA.name}:${factorB.name}`, df: (a - 1) * (b - 1), ss: ssAB }),
    ],
    factorMeans,
  });
}

interface GridSpec {
  readonly factors: ModelFactor[];
  readonly terms: ModelTerm[];
  /** How many leading terms are blocks (and the sites holding them), which a large layout absorbs. */
  readonly blocking: number;
  /** Grid points (a level code per factor) and weights whose average gives treatment j's mean. */
  readonly treatmentGrid: (j: number) => { points: number[][]; weights: number[] };
}

function blocksBySite(layout: TrialLayout): number[][] {
  const sites = layout.site!.levels.length;
  const lists: Set<number>[] = Array.from({ length: sites }, () => new Set<number>());
  for (let i = 0; i < layout.y.length; i++) lists[layout.site!.codes[i]!]!.add(layout.block!.codes[i]!);
  return lists.map((set) => [...set].sort((x, y) => x - y));
}

function leastSquaresSpec(layout: TrialLayout): GridSpec {
  const blockCount = layout.block?.levels.length ?? 0;
  const uniform = (count: number): number[] => new Array<number>(count).fill(1 / count);
  switch (layout.design) {
    case 'crd':
      return {
        factors: [layout.treatment],
        terms: [{ name: 'treatment', factors: [0] }],
        blocking: 0,
        treatmentGrid: (j) => ({ points: [[j]], weights: [1] }),
      };
    case 'rcbd':
      return {
        factors: [layout.block!, layout.treatment],
        terms: [
          { name: 'block', factors: [0] },
          { name: 'treatment', factors: [1] },
        ],
        blocking: 1,
        treatmentGrid: (j) => ({ points: Array.from({ length: blockCount }, (_, b) => [b, j]), weights: uniform(blockCount) }),
      };
    case 'factorial-rcbd': {
      const a = layout.factorA!;
      const b = layout.factorB!;
      const levelsB = b.levels.length;
      return {
        factors: [layout.block!, a, b],
        terms: [
          { name: 'block', factors: [0] },
          { name: a.name, factors: [1] },
          { name: b.name, factors: [2] },
          { name: `${a.name}:${b.name}`, factors: [1, 2] },
        ],
        blocking: 1,
        treatmentGrid: (j) => ({
          points: Array.from({ length: blockCount }, (_, k) => [k, Math.floor(j / levelsB), j % levelsB]),
          weights: uniform(blockCount),
        }),
      };
    }
    case 'multisite-rcbd': {
      const siteBlocks = blocksBySite(layout);
      const sites = siteBlocks.length;
      return {
        factors: [layout.site!, layout.block!, layout.treatment],
        terms: [
          { name: 'site', factors: [0] },
          { name: 'block:site', factors: [0, 1] },
          { name: 'treatment', factors: [2] },
          { name: 'site:treatment', factors: [0, 2] },
        ],
        blocking: 2,
        treatmentGrid: (j) => ({
          points: siteBlocks.flatMap((blocks, s) => blocks.map((block) => [s, block, j])),
          weights: siteBlocks.flatMap((blocks) => blocks.map(() => 1 / (sites * blocks.length))),
        }),
      };
    }
  }
}

/**
 * The design matrix with every block as a column, or — when that is too large for QR, or when asked — the blocks
 * absorbed (the same answer; the work then grows with the treatments, not the blocks).
 */
function linearFit(layout: TrialLayout, spec: GridSpec, absorbBlocks: boolean | undefined): LinearModelFit {
  if (spec.blocking > 0 && absorbBlocks) return fitAbsorbedLinearModel(layout.y, spec.factors, spec.terms, spec.blocking);
  try {
    return fitLinearModel(layout.y, spec.factors, spec.terms);
  } catch (error) {
    const tooLarge = error instanceof StatsInputError && error.message.startsWith('layout too large');
    if (!tooLarge || spec.blocking === 0 || absorbBlocks === false) throw error;
    return fitAbsorbedLinearModel(layout.y, spec.factors, spec.terms, spec.blocking);
  }
}

function leastSquaresFit(layout: TrialLayout, absorbBlocks: boolean | undefined): DesignFit {
  const spec = leastSquaresSpec(layout);
  const fit = linearFit(layout, spec, absorbBlocks);
  const k = layout.treatment.levels.length;
  const contrasts = Array.from({ length: k }, (_, j) => {
    const grid = spec.treatmentGrid(j);
    return fit.contrastVector(grid.points, grid.weights);
  });
  const treatmentMeans = new Float64Array(k);
  const meanCovariance = new Float64Array(k * k);
  contrasts.forEach((contrast, j) => {
    const estimate = fit.estimate(contrast, `the least-squares mean of treatment ${layout.treatment.levels[j]}`);
    treatmentMeans[j] = estimate.value;
    meanCovariance[j * k + j] = estimate.varianceFactor;
    for (let other = 0; other < j; other++) {
      const covariance = fit.covarianceFactor(contrast, contrasts[other]!);
      meanCovariance[j * k + other] = covariance;
      meanCovariance[other * k + j] = covariance;
    }
  });
  let factorMeans: FactorLevelMeans[] | undefined;
  if (layout.design === 'factorial-rcbd') {
    const blockCount = layout.block!.levels.length;
    factorMeans = [layout.factorA!, layout.factorB!].map((factor, index) => {
      const other = index === 0 ? layout.factorB! : layout.factorA!;
      const counts = countLevels(factor);
      const means = new Float64Array(factor.levels.length);
      const varianceFactors = new Float64Array(factor.levels.length);
      factor.levels.forEach((level, code) => {
        const points: number[][] = [];
        for (let block = 0; block < blockCount; block++) {
          for (let o = 0; o < other.levels.length; o++) points.push(index === 0 ? [block, code, o] : [block, o, code]);
        }
        const weights = new Array<number>(points.length).fill(1 / points.length);
        const estimate = fit.estimate(fit.contrastVector(points, weights), `the least-squares mean of ${factor.name} ${level}`);
        means[code] = estimate.value;
        varianceFactors[code] = estimate.varianceFactor;
      });
      return Object.freeze({ factor: factor.name, levels: factor.levels, counts, means, varianceFactors });
    });
  }
  return Object.freeze({
    method: 'least-squares' as const,
    rows: fit.rows,
    residualDf: fit.residualDf,
    residualSs: fit.residualSs,
    fitted: fit.fitted,
    residuals: fit.residuals,
    leverage: fit.leverage,
    treatmentCounts: countLevels(layout.treatment),
    treatmentMeans,
    meanCovariance,
    ...(factorMeans ? { factorMeans } : {}),
  });
}

/**
 * Trial design fit: sequential sums of squares, residuals and treatment least-squares means.
 *
 * Terms in order: crd — treatment; rcbd — block, treatment; factorial-rcbd — block, A, B, A:B;
 * multisite-rcbd — site, block:site, treatment, site:treatment. Complete balanced layouts (and every
 * one-way layout) use the classical closed-form sums of squares about cell means, which are exact for
 * them and need no design matrix (a million plots fit in well under a second). Any other layout — missing
 * plots, unequal blocks per site — is fitted by Householder QR (`fitLinearModel`), or with its blocks absorbed
 * (`fitAbsorbedLinearModel`) when the design matrix would be too large for QR (`absorbBlocks`: true always
 * absorbs, false never does); its least-squares means average the fitted cell values over blocks (and over sites with equal weight), as R's emmeans does.
 *
 * Reference: Steel, Torrie & Dickey (1997), Principles and Procedures of Statistics, 3rd ed., ch. 9 and 15;
 * Searle, Speed & Milliken (1980), Population marginal means, Am. Stat. 34:216.
 * @throws StatsInputError (from fitLinearModel) when a least-squares mean needs an empty cell.
 * @example fitTrialDesign(layout).rows; // [{ term: 'block', df: 3, ss: 0.825 }, { term: 'treatment', df: 3, ss: 0.385 }]
 */
export function fitTrialDesign(layout: TrialLayout, options: { forceLeastSquares?: boolean; absorbBlocks?: boolean } = {}): DesignFit {
  if (!options.forceLeastSquares) {
    if (layout.design === 'crd') return classicalOneWay(layout);
    if (isCompleteBlocked(layout)) return layout.design === 'factorial-rcbd' ? classicalFactorial(layout) : classicalBlocked(layout);
  }
  return leastSquaresFit(layout, options.absorbBlocks);
}
