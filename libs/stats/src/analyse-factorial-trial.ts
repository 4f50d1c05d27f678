import { brownForsythe } from './brown-forsythe';
import { studentTQuantile } from './distributions';
import { StatsInputError } from './errors';
import { classicalFactorialFit, type FactorialAnovaRow, type FactorialFit } from './factorial-fit';
import { factorTerms, prepareFactorialLayout, termName, type FactorialDesign, type FactorialLayout } from './factorial-layout';
import { remlFactorialFit } from './factorial-reml-fit';
import type { ErrorStratum } from './error-strata';
import { separateMeans, type MeanSeparation, type MeanSeparationMethod } from './mean-separation';
import { NO_RESIDUAL_VARIATION } from './residual-variation';
import { shapiroWilk } from './shapiro-wilk';
import type { TrialObservation } from './trial-layout';

/** A least-squares mean of a level combination of some factors. */
export interface FactorialMean {
  /** Level of each factor of the term, by factor name. */
  readonly levels: Readonly<Record<string, string>>;
  /** The levels joined by " × " (a treatment's label when all factors are given). */
  readonly treatment: string;
  readonly n: number;
  readonly mean: number;
  readonly se: number;
  readonly backTransformedMean?: number;
}

/** A mean with the linear function that gives it and its value on the centred scale. */
type Entry = FactorialMean & { readonly contrast: Float64Array; readonly centred: number };

/** The least-squares means of one term (a factor or an interaction). */
export interface TermMeans {
  readonly term: string;
  readonly factors: readonly string[];
  readonly means: readonly FactorialMean[];
}

/** Comparisons of some means against the error their differences belong to. */
export interface StratumComparisons extends MeanSeparation {
  /** The error the differences are judged against, in words ('block:A', 'error', 'Kenward–Roger'). */
  readonly errorTerm: string;
  readonly df: number;
}

/** A standard error of a difference of one kind (split plots: the textbook kinds). */
export interface DifferenceError {
  readonly kind: string;
  readonly description: string;
  readonly se: number;
  readonly df: number;
  /** t at α (two-sided); for a difference that mixes strata, the weighted t of Cochran & Cox (classical). */
  readonly critical: number;
  /** critical × se. */
  readonly lsd: number;
  readonly errorTerm: string;
}

/** One factor tested within one level of another (an interaction's slice), with the means inside it. */
export interface SliceTest extends StratumComparisons {
  readonly factor: string;
  readonly within: string;
  readonly level: string;
  readonly numDf: number;
  readonly denDf: number;
  readonly f: number;
  readonly p: number;
  readonly means: readonly FactorialMean[];
}

/** The complete analysis of a factorial or split-plot trial. */
export interface FactorialTrialAnalysis {
  readonly anova: readonly FactorialAnovaRow[];
  readonly summary: { readonly n: number; readonly grandMean: number; readonly cv: number; readonly rootMse: number; readonly errorDf: number };
  readonly means: readonly { readonly treatment: string; readonly n: number; readonly mean: number; readonly se: number; readonly backTransformedMean?: number }[];
  readonly factorMeans: Readonly<Record<string, readonly { readonly treatment: string; readonly n: number; readonly mean: number; readonly se: number; readonly backTransformedMean?: number }[]>>;
  readonly comparisons: MeanSeparation['comparisons'];
  readonly letters: MeanSeparation['letters'];
  readonly diagnostics: {
    readonly shapiroWilk: { readonly w: number; readonly p: number } | null;
    readonly brownForsythe: { readonly f: number; readonly p: number } | null;
    readonly residuals: readonly { readonly index: number; readonly fitted: number; readonly residual: number; readonly standardized: number | null; readonly flagged: boolean }[];
  };
  readonly warnings: readonly string[];
  /** Which model gave the answer and why. */
  readonly model: { readonly kind: 'anova' | 'reml'; readonly reason: string };
  /** Classical: the error strata (whole plot first), each with the terms tested against it. */
  readonly strata: readonly (ErrorStratum & { readonly terms: readonly string[] })[];
  /** Every main effect and interaction: its least-squares means. */
  readonly marginalMeans: readonly TermMeans[];
  /** Each factor's level means compared within the factor's own stratum. */
  readonly factorComparisons: Readonly<Record<string, StratumComparisons>>;
  /** Standard errors of a difference by kind (split plots: the four kinds; factorials: per factor). */
  readonly differences: readonly DifferenceError[];
  /** Tests of one factor within each level of another, for every significant two-factor interaction. */
  readonly slices: readonly SliceTest[];
  /** REML: the variance of each random term and of the error. */
  readonly varianceComponents?: readonly { readonly name: string; readonly variance: number }[];
}

/** What analyseFactorialTrial needs beyond the observations (validated by analyseTrial). */
export interface FactorialRequest {
  readonly design: FactorialDesign;
  readonly observations: readonly TrialObservation[];
  readonly values: readonly (number | string)[];
  readonly factorNames?: readonly string[];
  readonly model?: 'anova' | 'reml';
  /** REML denominator degrees of freedom; default Kenward–Roger. */
  readonly ddf?: 'kenward-roger' | 'satterthwaite';
  readonly sitesAre?: 'random' | 'fixed';
  readonly alpha: number;
  readonly methods: readonly MeanSeparationMethod[];
  readonly control?: string;
  readonly forceLsd?: boolean;
  readonly back: ((mean: number) => number) | null;
  readonly transformNote: string | null;
}

const SMALL_ERROR_DF = 12;
const MAX_PAIRS_PER_KIND = 60;
const MAX_COMBINATIONS = 48;

function chooseModel(layout: FactorialLayout, request: FactorialRequest): { kind: 'anova' | 'reml'; reason: string } {
  const missing = layout.balanced ? '' : 'the layout is unbalanced (a plot missing, a block incomplete or unequal replication)';
  if (request.model === 'reml') return { kind: 'reml', reason: 'REML was asked for.' };
  if (request.model === 'anova') {
    if (!layout.balanced && (layout.depth > 1 || layout.site)) {
      throw new StatsInputError('classical strata do not hold', `${missing}, so the whole-plot and sub-plot errors of the classical analysis no longer separate; use model "reml"`);
    }
    return { kind: 'anova', reason: layout.balanced ? 'The classical ANOVA was asked for.' : `The least-squares ANOVA (type III, blocks fixed) was asked for because ${missing}.` };
  }
  return layout.balanced
    ? { kind: 'anova', reason: 'Every plot is present, so the classical ANOVA is exact.' }
    : { kind: 'reml', reason: `REML with ${request.ddf === 'satterthwaite' ? 'Satterthwaite' : 'Kenward–Roger'} degrees of freedom, because ${missing}.` };
}

/** Level codes of every combination of the given factors, the first factor slowest. */
function combinations(layout: FactorialLayout, which: readonly number[]): number[][] {
  return which.reduce<number[][]>((acc, f) => acc.flatMap((prefix) => layout.factors[f]!.levels.map((_, l) => [...prefix, l])), [[]]);
}

/** Plots of each level combination of some factors, keyed by the combination's mixed-radix number. */
function plotCounts(layout: FactorialLayout, which: readonly number[]): Map<number, number> {
  const counts = new Map<number, number>();
  for (let i = 0; i < layout.y.length; i++) {
    let key = 0;
    for (const f of which) key = key * layout.factors[f]!.levels.length + layout.factors[f]!.codes[i]!;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return counts;
}

/**
 * Factorial and split-plot trial analysis: every main effect and interaction of 2–4 factors (completely
 * randomized or in blocks, at one site or several), or a split / split-split plot in blocks with each term tested
 * in its error stratum; least-squares means of every term with standard errors; each factor's means compared in
 * its own stratum; the standard errors of a difference of each kind (a split plot's four, with the weighted t
 * for differences that mix strata); and, for every significant two-factor interaction, each factor tested and its
 * means separated within each level of the other (slices). Balanced data get the classical ANOVA; unbalanced data
 * (a missing plot, a block with a single plot, unequal blocks per site) a REML mixed model with Kenward–Roger
 * degrees of freedom, unless the request names the model.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed. (Wiley), ch. 3–4 and 8;
 * Kenward & Roger (1997), Biometrics 53:983; R: aov(... + Error(block/A)), lmer + pbkrtest, emmeans.
 * @throws StatsInputError for a malformed layout (see prepareFactorialLayout), classical analysis asked of an
 *   unbalanced split plot, or no error degrees of freedom.
 * @example analyseFactorialTrial({ design: 'split-plot', factorNames: ['A', 'B'], ... }).strata.map((s) => s.errorTerm); // ['block:A', 'error']
 */
export function analyseFactorialTrial(request: FactorialRequest): FactorialTrialAnalysis {
  const layout = prepareFactorialLayout(request.design, request.observations, request.values, request.factorNames);
  if (request.control !== undefined && !layout.treatment.levels.includes(request.control)) {
    throw new StatsInputError('unknown control', `control ${JSON.stringify(request.control)} is not among the treatments ${layout.treatment.levels.join(', ')}`);
  }
  const model = chooseModel(layout, request);
  const sitesRandom = layout.site !== undefined && request.sitesAre !== 'fixed';
  const classical = model.kind === 'anova' && layout.balanced ? classicalFactorialFit(layout, sitesRandom) : null;
  if (classical && classical.strata.some((stratum) => stratum.df <= 0)) {
    const empty = classical.strata.find((stratum) => stratum.df <= 0)!;
    throw new StatsInputError('no residual degrees of freedom', `the ${empty.stratum} error (${empty.errorTerm}) has no degrees of freedom; more blocks are needed`);
  }
  const fit: FactorialFit =
    classical && !sitesRandom ? classical : remlFactorialFit(layout, { sitesRandom, blocksFixed: model.kind === 'anova', ...(request.ddf ? { denominator: request.ddf } : {}) });
  const anova = classical ? classical.anova : fit.anova;
  const warnings: string[] = [...layout.notes];
  if (classical?.strata.some((stratum) => stratum.ms === 0) || fit.residualMs === 0) warnings.push(NO_RESIDUAL_VARIATION);
  if (model.kind === 'reml') warnings.push(model.reason);
  if (classical && sitesRandom) warnings.push('With sites random, the means and their comparisons come from the mixed model (site and each site interaction random); the table is the classical one.');

  const { alpha, back } = request;
  const centre = layout.centreValue;
  const names = layout.factors.map((factor) => factor.name);
  const countsByTerm = new Map<string, Map<number, number>>();
  const countOf = (which: readonly number[], levels: readonly number[]): number => {
    let counts = countsByTerm.get(which.join(','));
    if (!counts) countsByTerm.set(which.join(','), (counts = plotCounts(layout, which)));
    let key = 0;
    which.forEach((f, j) => (key = key * layout.factors[f]!.levels.length + levels[j]!));
    return counts.get(key) ?? 0;
  };
  const entry = (which: readonly number[], levels: readonly number[], by: FactorialFit = fit): Entry => {
    const contrast = by.mean(which, levels);
    const estimate = by.estimate(contrast);
    const labels = which.map((f, j) => layout.factors[f]!.levels[levels[j]!]!);
    const mean = estimate.value + centre;
    return {
      levels: Object.freeze(Object.fromEntries(which.map((f, j) => [names[f]!, labels[j]!]))),
      treatment: labels.join(' × '),
      n: countOf(which, levels),
      mean,
      se: Math.sqrt(estimate.variance),
      ...(back ? { backTransformedMean: back(mean) } : {}),
      contrast,
      centred: estimate.value,
    };
  };
  const strip = ({ contrast: _contrast, centred: _centred, ...rest }: Entry): FactorialMean => Object.freeze(rest);
  const difference = differenceOf;

  const compare = (entries: readonly Entry[], methods: readonly MeanSeparationMethod[], control?: string, by: FactorialFit = fit): StratumComparisons => {
    const k = entries.length;
    const first = difference(entries[1]!.contrast, entries[0]!.contrast);
    const firstEstimate = by.estimate(first);
    // No variation in the stratum: differences have no standard error, so nothing can be compared.
    if (!(firstEstimate.variance > 0)) return Object.freeze({ comparisons: Object.freeze({}), letters: Object.freeze({}), errorTerm: by.errorOf(first), df: firstEstimate.df });
    const covariance = new Float64Array(k * k);
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) covariance[i * k + j] = covariance[j * k + i] = by.covariance(entries[i]!.contrast, entries[j]!.contrast);
    const df = firstEstimate.df;
    // Kenward–Roger can leave a stratum less than one degree of freedom (two sites, a plot missing): no t or
    // studentized range exists there, so these means are given without tests, and the answer says why.
    if (!(df >= 1)) {
      const which = Object.keys(entries[0]!.levels).join(' × ');
      const why = `The ${which} means are not compared: their differences have ${df.toFixed(3)} degrees of freedom (${by.errorOf(first)}), fewer than one, too few for any test (more sites or blocks give more).`;
      if (!warnings.includes(why)) warnings.push(why);
      return Object.freeze({ comparisons: Object.freeze({}), letters: Object.freeze({}), errorTerm: by.errorOf(first), df });
    }
    const separation = separateMeans({
      treatments: entries.map((e) => e.treatment),
      // Centred means: at 1e12 the shifted means have lost the digits their differences need.
      means: entries.map((e) => e.centred),
      covariance,
      df,
      alpha,
      methods: control !== undefined && entries.some((e) => e.treatment === control) ? methods : methods.filter((m) => m !== 'dunnett'),
      ...(control !== undefined ? { control } : {}),
    });
    return Object.freeze({ ...separation, errorTerm: by.errorOf(first), df });
  };

  const all = names.map((_, f) => f);
  const combinationEntries = combinations(layout, all).map((levels) => entry(all, levels));
  const sets = factorTerms(layout);
  const marginal = sets.map((set) => ({ set, entries: set.length === all.length ? combinationEntries : combinations(layout, set).map((levels) => entry(set, levels)) }));
  const termP = new Map(anova.map((row) => [row.term, row.p]));
  const anySignificant = sets.some((set) => (termP.get(termName(layout, set)) ?? 1) < alpha);
  const methods = request.methods.filter((m) => m !== 'lsd' || anySignificant || request.forceLsd === true);
  if (request.methods.includes('lsd') && !methods.includes('lsd')) {
    warnings.push(`Fisher's LSD was not computed because no factor or interaction is significant at α = ${alpha}; set forceLsd to compute it anyway.`);
  }
  if (!anySignificant && !warnings.includes(NO_RESIDUAL_VARIATION)) warnings.push(`No factor or interaction is significant at α = ${alpha}, so the letters are shown for reference only.`);
  // Every pair of, say, 144 combinations (10,296 pairs) helps no one and costs seconds: beyond MAX_COMBINATIONS the
  // combinations are compared within slices and factor by factor only, and the answer says so.
  const overall =
    combinationEntries.length <= MAX_COMBINATIONS
      ? compare(combinationEntries, methods, request.control)
      : (warnings.push(
          `The ${combinationEntries.length} treatment combinations are not compared pair by pair (more than ${MAX_COMBINATIONS}); compare each factor's means and, where an interaction is significant, the means within each slice.`,
        ),
        { comparisons: Object.freeze({}), letters: Object.freeze({}) });
  const factorComparisons = Object.fromEntries(all.map((f) => [names[f]!, compare(marginal.find((m) => m.set.length === 1 && m.set[0] === f)!.entries, methods.filter((m) => m !== 'dunnett'))]));

  const differences = differenceErrors(layout, fit, alpha);
  // A slice whose differences mix strata (a whole-plot factor within a sub-plot level) has no classical F: it is
  // tested on the mixed model with blocks fixed and whole plots random, by Kenward–Roger, as lmer + emmeans would.
  let mixed: FactorialFit | null = null;
  const sliceFit = (contrast: Float64Array): FactorialFit => {
    if (!classical || sitesRandom || !fit.errorOf(contrast).includes('(Satterthwaite)')) return fit;
    mixed ??= remlFactorialFit(layout, { sitesRandom: false, blocksFixed: true });
    return mixed;
  };
  const slices = sliceTests(layout, fit, sliceFit, anova, alpha, methods.filter((m) => m !== 'dunnett'), entry, compare);

  // Small error degrees of freedom, stratum by stratum.
  if (classical) {
    for (const stratum of classical.strata) {
      if (stratum.df < SMALL_ERROR_DF) {
        warnings.push(`The ${stratum.stratum} error (${stratum.errorTerm}) has only ${stratum.df} degree${stratum.df === 1 ? '' : 's'} of freedom (fewer than ${SMALL_ERROR_DF}), so the terms tested against it have little power; more blocks would help.`);
      }
    }
  }
  if (request.transformNote) warnings.push(request.transformNote);

  const n = layout.y.length;
  let centred = 0;
  for (const value of layout.y) centred += value;
  const grandMean = centre + centred / n;
  const rootMse = Math.sqrt(fit.residualMs);
  const residualDiagnostics = Array.from(fit.residuals, (residual, i) => {
    const scale = Math.sqrt(fit.residualMs * (1 - fit.leverage[i]!));
    const standardized = scale > 0 && 1 - fit.leverage[i]! > 1e-10 ? residual / scale : null;
    return Object.freeze({ index: i, fitted: fit.fitted[i]! + centre, residual, standardized, flagged: standardized !== null && Math.abs(standardized) > 3 });
  });
  const safely = <T>(run: () => T, name: string): T | null => {
    try {
      return run();
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      warnings.push(`The ${name} test was skipped: ${error.message}.`);
      return null;
    }
  };
  const shapiro = n >= 3 && n <= 5000 ? safely(() => shapiroWilk(Array.from(fit.residuals)), 'Shapiro–Wilk') : null;
  const groups: number[][] = layout.treatment.levels.map(() => []);
  layout.treatment.codes.forEach((code, i) => groups[code]!.push(fit.residuals[i]!));
  const spread = groups.every((group) => group.length >= 2) ? safely(() => brownForsythe(groups), 'Brown–Forsythe') : null;

  const strata = classical
    ? classical.strata.map((stratum) =>
        Object.freeze({ ...stratum, terms: Object.freeze(anova.filter((row) => row.errorTerm === stratum.errorTerm).map((row) => row.term)) }),
      )
    : [];
  const plainMean = (e: FactorialMean) => Object.freeze({ treatment: e.treatment, n: e.n, mean: e.mean, se: e.se, ...(e.backTransformedMean !== undefined ? { backTransformedMean: e.backTransformedMean } : {}) });
  return Object.freeze({
    anova,
    summary: Object.freeze({ n, grandMean, cv: (100 * rootMse) / grandMean, rootMse, errorDf: classical ? classical.residualDf : fit.residualDf }),
    means: Object.freeze(combinationEntries.map(plainMean)),
    factorMeans: Object.freeze(Object.fromEntries(marginal.filter((m) => m.set.length === 1).map((m) => [names[m.set[0]!]!, Object.freeze(m.entries.map(plainMean))]))),
    comparisons: overall.comparisons,
    letters: overall.letters,
    diagnostics: Object.freeze({
      shapiroWilk: shapiro ? Object.freeze({ w: shapiro.w, p: shapiro.p }) : null,
      brownForsythe: spread ? Object.freeze({ f: spread.f, p: spread.p }) : null,
      residuals: Object.freeze(residualDiagnostics),
    }),
    warnings: Object.freeze(warnings),
    model: Object.freeze(model),
    strata: Object.freeze(strata),
    marginalMeans: Object.freeze(marginal.map((m) => Object.freeze({ term: termName(layout, m.set), factors: Object.freeze(m.set.map((f) => names[f]!)), means: Object.freeze(m.entries.map(strip)) }))),
    factorComparisons: Object.freeze(factorComparisons),
    differences: Object.freeze(differences),
    slices: Object.freeze(slices),
    ...(fit.varianceComponents ? { varianceComponents: fit.varianceComponents } : {}),
  });
}

/** a − b, element by element. */
function differenceOf(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(a.length);
  for (let i = 0; i < a.length; i++) out[i] = a[i]! - b[i]!;
  return out;
}

/** A kind of difference: the pairs of level combinations (of `which`) it covers. */
interface DifferenceKind {
  readonly kind: string;
  readonly description: string;
  readonly which: number[];
  readonly pairs: [number[], number[]][];
}

function differenceKinds(layout: FactorialLayout): DifferenceKind[] {
  const names = layout.factors.map((factor) => factor.name);
  const kinds: DifferenceKind[] = [];
  const levelPairs = (f: number): [number, number][] => {
    const out: [number, number][] = [];
    const k = layout.factors[f]!.levels.length;
    for (let a = 0; a < k; a++) for (let b = a + 1; b < k; b++) out.push([a, b]);
    return out;
  };
  const unit = ['plot', 'whole-plot', 'sub-plot', 'sub-sub-plot'];
  const unitOf = (f: number) => (layout.depth === 1 ? `${names[f]}` : `${names[f]} (${unit[layout.levelOf[f]!]})`);
  for (let f = 0; f < names.length; f++) {
    kinds.push({ kind: `${names[f]}`, description: `Two ${unitOf(f)} means`, which: [f], pairs: levelPairs(f).map(([a, b]) => [[a], [b]]) });
  }
  for (let f = 0; f < names.length; f++) {
    for (let g = 0; g < names.length; g++) {
      if (f === g) continue;
      const others = layout.factors[g]!.levels.map((_, l) => l);
      const sameLevel: [number[], number[]][] = others.flatMap((l) => levelPairs(f).map(([a, b]) => (f < g ? [[a, l], [b, l]] : [[l, a], [l, b]]) as [number[], number[]]));
      const which = f < g ? [f, g] : [g, f];
      const mixed = layout.depth > 1 && layout.levelOf[f]! < layout.levelOf[g]!;
      kinds.push({
        kind: `${names[f]} within ${names[g]}`,
        description: mixed ? `Two ${unitOf(f)} means at the same or different levels of ${names[g]}` : `Two ${unitOf(f)} means at the same level of ${names[g]}`,
        which,
        pairs: mixed
          ? [
              ...sameLevel,
              ...others.flatMap((l) => others.filter((m) => m !== l).flatMap((m) => levelPairs(f).map(([a, b]) => (f < g ? [[a, l], [b, m]] : [[l, a], [m, b]]) as [number[], number[]]))),
            ]
          : sameLevel,
      });
    }
  }
  // Factorials: only the main-effect kinds and one factor within another are usual; three-way kinds follow from these.
  return layout.depth === 1 ? kinds.filter((kind) => kind.which.length === 1 || names.length === 2) : kinds;
}

function differenceErrors(layout: FactorialLayout, fit: FactorialFit, alpha: number): DifferenceError[] {
  const quantile = (df: number) => studentTQuantile(1 - alpha / 2, df);
  return differenceKinds(layout).map((kind) => {
    const step = Math.max(1, Math.ceil(kind.pairs.length / MAX_PAIRS_PER_KIND));
    const pairs = kind.pairs.filter((_, i) => i % step === 0);
    let variance = 0;
    let df = 0;
    let critical = 0;
    let errorTerm = '';
    for (const [a, b] of pairs) {
      const contrast = differenceOf(fit.mean(kind.which, a), fit.mean(kind.which, b));
      const estimate = fit.estimate(contrast);
      variance += estimate.variance;
      df += estimate.df;
      critical += fit.weightedCritical ? fit.weightedCritical(contrast, quantile) : quantile(estimate.df);
      errorTerm ||= fit.errorOf(contrast);
    }
    const se = Math.sqrt(variance / pairs.length);
    const meanCritical = critical / pairs.length;
    return Object.freeze({ kind: kind.kind, description: kind.description, se, df: df / pairs.length, critical: meanCritical, lsd: meanCritical * se, errorTerm });
  });
}

function sliceTests(
  layout: FactorialLayout,
  fit: FactorialFit,
  sliceFit: (contrast: Float64Array) => FactorialFit,
  anova: readonly FactorialAnovaRow[],
  alpha: number,
  methods: readonly MeanSeparationMethod[],
  entry: (which: readonly number[], levels: readonly number[], by?: FactorialFit) => Entry,
  compare: (entries: readonly Entry[], methods: readonly MeanSeparationMethod[], control?: string, by?: FactorialFit) => StratumComparisons,
): SliceTest[] {
  const slices: SliceTest[] = [];
  const names = layout.factors.map((factor) => factor.name);
  for (const set of factorTerms(layout).filter((s) => s.length === 2)) {
    const row = anova.find((r) => r.term === termName(layout, set));
    if (!row || row.p === null || row.p >= alpha) continue;
    for (const [f, g] of [set, [...set].reverse()] as [number, number][]) {
      layout.factors[g]!.levels.forEach((level, l) => {
        const levelsAt = (a: number) => (f < g ? [a, l] : [l, a]);
        const by = sliceFit(differenceOf(fit.mean(set, levelsAt(1)), fit.mean(set, levelsAt(0))));
        const entries = layout.factors[f]!.levels.map((label, a) => ({ ...entry(set, levelsAt(a), by), treatment: label }));
        const rows = entries.slice(1).map((e) => differenceOf(e.contrast, entries[0]!.contrast));
        const test = by.test(rows);
        const separated = compare(entries, methods, undefined, by);
        slices.push(
          Object.freeze({
            factor: names[f]!,
            within: names[g]!,
            level,
            numDf: test.numDf,
            denDf: test.denDf,
            f: test.f,
            p: test.p,
            ...separated,
            df: test.denDf,
            means: Object.freeze(entries.map(({ contrast: _contrast, centred: _centred, ...rest }) => Object.freeze(rest))),
          }),
        );
      });
    }
  }
  return slices;
}
