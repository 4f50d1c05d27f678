import { cellCodes } from './balanced-sweep';
import { fUpperTailProbability } from './distributions';
import type { FactorialAnovaRow, FactorialFit } from './factorial-fit';
import { factorTerms, termName, type FactorialLayout } from './factorial-layout';
import type { ModelFactor } from './linear-model';
import { denseRemlProblem } from './reml/dense-reml-problem';
import { fitReml } from './reml/fit-reml';
import { kenwardRogerAdjustment, kenwardRogerEstimate, kenwardRogerTest } from './reml/kenward-roger';
import { satterthwaiteEstimate, satterthwaitePreparation, satterthwaiteTest } from './reml/satterthwaite';
import { bilinearForm } from './reml/symmetric-matrix';
import { varianceComponentsStructure, type RandomInterceptTerm } from './reml/variance-components';
import { sumToZeroDesign, type FixedTerm } from './sum-to-zero-design';

/** How the mixed model treats sites and blocks. */
export interface FactorialRemlOptions {
  /** Sites random: site and site × each factor term are random intercepts. */
  readonly sitesRandom: boolean;
  /** Blocks as fixed effects (the least-squares type III analysis of an unbalanced factorial). */
  readonly blocksFixed: boolean;
  /** Denominator degrees of freedom of the tests and means: Kenward–Roger (default, pbkrtest) or Satterthwaite (lmerTest). */
  readonly denominator?: 'kenward-roger' | 'satterthwaite';
}

function randomTerms(layout: FactorialLayout, options: FactorialRemlOptions): RandomInterceptTerm[] {
  const n = layout.y.length;
  const terms: RandomInterceptTerm[] = [];
  const all: ModelFactor[] = [...layout.factors, ...(layout.site ? [layout.site] : []), ...(layout.block ? [layout.block] : [])];
  const siteIndex = layout.site ? layout.factors.length : -1;
  const blockIndex = layout.block ? all.length - 1 : -1;
  if (siteIndex >= 0 && options.sitesRandom) {
    terms.push({ name: 'site', codes: layout.site!.codes });
    for (const set of factorTerms(layout)) terms.push({ name: `site:${termName(layout, set)}`, codes: cellCodes(all, [siteIndex, ...set], n).codes });
  }
  if (blockIndex >= 0 && !options.blocksFixed) terms.push({ name: siteIndex >= 0 ? 'block:site' : 'block', codes: layout.block!.codes });
  for (let k = 1; k < layout.depth; k++) {
    const upTo = layout.factors.map((_, f) => f).filter((f) => layout.levelOf[f]! <= k);
    terms.push({ name: [siteIndex >= 0 ? 'block:site' : 'block', ...upTo.map((f) => layout.factors[f]!.name)].join(':'), codes: cellCodes(all, [blockIndex, ...upTo], n).codes });
  }
  return terms;
}

/**
 * Mixed-model fit of a factorial or split-plot trial by REML: the factors and their interactions fixed
 * (sum-to-zero coding), blocks (within sites), whole plots and sub plots random, sites and site × each factor
 * term random when sites are random (fixed otherwise). F tests of each term's type III hypothesis and
 * least-squares means (equal weights over the other factors, as emmeans) with Kenward–Roger's adjusted
 * covariance and denominator degrees of freedom, or (denominator 'satterthwaite') with Φ and Satterthwaite's
 * degrees of freedom as lmerTest gives them (anova(type = 3, ddf = "Satterthwaite"), emmeans(lmer.df = "satterthwaite")). With no random term (an unbalanced factorial without blocks,
 * or blocks fixed) it is ordinary least squares with type III F tests against the residual.
 * Reference: Kenward & Roger (1997), Biometrics 53:983; R: lmer(y ~ A*B + (1|block) + (1|block:A)) with
 * pbkrtest::KRmodcomp and emmeans(mode = "kenward-roger"); car::Anova(lm(...), type = 3) with contr.sum.
 * @throws StatsInputError (from the REML core) when the fixed effects are not estimable.
 * @example remlFactorialFit(layout, { sitesRandom: true, blocksFixed: false }).anova[0]; // { term: 'A', numDf: 2, denDf: 9.8, f: …, errorTerm: 'kenward-roger' }
 */
export function remlFactorialFit(layout: FactorialLayout, options: FactorialRemlOptions): FactorialFit {
  const n = layout.y.length;
  const factors: ModelFactor[] = [...layout.factors];
  const fixed: FixedTerm[] = [];
  const siteFixed = layout.site !== undefined && !options.sitesRandom;
  const siteIndex = siteFixed ? factors.push(layout.site!) - 1 : -1;
  if (siteFixed) fixed.push({ name: 'site', factors: [siteIndex] });
  if (options.blocksFixed && layout.block) fixed.push({ name: 'block', factors: [factors.push(layout.block) - 1] });
  for (const set of factorTerms(layout)) fixed.push({ name: termName(layout, set), factors: set });
  if (siteFixed) for (const set of factorTerms(layout)) fixed.push({ name: `site:${termName(layout, set)}`, factors: [siteIndex, ...set] });
  const coding = sumToZeroDesign(factors, fixed);
  const random = randomTerms(layout, options);
  const groupOf = random.length === 0 ? Int32Array.from({ length: n }, (_, i) => i) : options.sitesRandom && layout.site ? layout.site.codes : layout.block!.codes;
  const structure = varianceComponentsStructure(random, groupOf);
  const problem = denseRemlProblem({ y: layout.y, design: coding.design, groupOf, structure });
  const fit = fitReml(problem);
  const p = coding.design.columns;
  const residualVariance = fit.theta[random.length]!;
  const leastSquares = random.length === 0;
  // Kenward–Roger tests with the adjusted covariance (pbkrtest); Satterthwaite with Φ itself (lmerTest).
  const satterthwaite = options.denominator === 'satterthwaite' && !leastSquares ? satterthwaitePreparation(fit) : null;
  const adjustment = satterthwaite ? null : kenwardRogerAdjustment(fit);
  const testOf = (values: Float64Array, rows: number) => (satterthwaite ? satterthwaiteTest(satterthwaite, values, rows) : kenwardRogerTest(adjustment!, values, rows));
  const covarianceOfBeta = satterthwaite ? fit.covariance : adjustment!.adjustedCovariance;
  const method = satterthwaite ? 'satterthwaite' : 'kenward-roger';
  const anova: FactorialAnovaRow[] = fixed.map((term, t) => {
    const hypothesis = coding.typeThreeHypothesis(t);
    const test = testOf(hypothesis.values, hypothesis.rows);
    const ss = leastSquares ? test.f * test.numDf * residualVariance : null;
    return Object.freeze({
      term: term.name,
      df: test.numDf,
      ss,
      ms: ss === null ? null : ss / test.numDf,
      f: test.f,
      p: test.p,
      errorTerm: leastSquares ? 'error' : method,
      numDf: test.numDf,
      denDf: test.denDf,
    });
  });
  const residualDf = n - p;
  if (leastSquares) {
    let mean = 0;
    for (const value of layout.y) mean += value / n;
    let totalSs = 0;
    for (const value of layout.y) totalSs += (value - mean) ** 2;
    anova.push(Object.freeze({ term: 'error', df: residualDf, ss: residualVariance * residualDf, ms: residualVariance, f: null, p: null, errorTerm: null }));
    anova.push(Object.freeze({ term: 'total', df: n - 1, ss: totalSs, ms: null, f: null, p: null, errorTerm: null }));
  }
  // Fitted values with the random effects' best linear unbiased predictions (lme4's fitted()).
  const marginal = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const start = coding.design.rowOf[i]! * p;
    for (let c = 0; c < p; c++) marginal[i]! += coding.design.rows[start + c]! * fit.beta[c]!;
  }
  const residualsMarginal = Float64Array.from(layout.y, (value, i) => value - marginal[i]!);
  const solved = random.length ? problem.solve(fit.theta, residualsMarginal) : new Float64Array(n);
  const fitted = Float64Array.from(marginal);
  random.forEach((term, k) => {
    const sums = new Map<number, number>();
    for (let i = 0; i < n; i++) sums.set(term.codes[i]!, (sums.get(term.codes[i]!) ?? 0) + solved[i]!);
    for (let i = 0; i < n; i++) fitted[i]! += fit.theta[k]! * sums.get(term.codes[i]!)!;
  });
  const residuals = Float64Array.from(layout.y, (value, i) => value - fitted[i]!);
  // Least squares: the hat matrix diagonal x_i'(X'X)⁻¹x_i = x_i'Φx_i / σ² (for rstandard); a mixed model has none.
  const leverage = new Float64Array(n);
  if (leastSquares && residualVariance > 0) {
    for (let i = 0; i < n; i++) {
      const row = coding.design.rows.subarray(coding.design.rowOf[i]! * p, (coding.design.rowOf[i]! + 1) * p);
      leverage[i] = bilinearForm(row, fit.covariance, row, p) / residualVariance;
    }
  }
  const estimate = (contrast: Float64Array) => {
    const result = satterthwaite ? satterthwaiteEstimate(satterthwaite, contrast) : kenwardRogerEstimate(adjustment!, contrast);
    return { value: result.estimate, variance: result.se * result.se, df: result.df };
  };
  return Object.freeze({
    model: 'reml' as const,
    anova: Object.freeze(anova),
    strata: Object.freeze([]),
    residualDf,
    residualMs: residualVariance,
    fitted,
    residuals,
    leverage,
    varianceComponents: Object.freeze(fit.parameterNames.map((name, k) => Object.freeze({ name: name === 'residual' ? 'error' : name, variance: fit.theta[k]! }))),
    mean: (which: readonly number[], levels: readonly number[]) => coding.marginalMeanRow(which, levels),
    estimate,
    covariance: (first: Float64Array, second: Float64Array) => bilinearForm(first, covarianceOfBeta, second, p),
    test(rows: readonly Float64Array[]) {
      const values = new Float64Array(rows.length * p);
      rows.forEach((row, r) => values.set(row, r * p));
      const result = testOf(values, rows.length);
      return { f: result.f, numDf: result.numDf, denDf: result.denDf, p: Number.isFinite(result.p) ? result.p : fUpperTailProbability(result.f, result.numDf, result.denDf) };
    },
    errorOf: () => (leastSquares ? 'error' : satterthwaite ? 'Satterthwaite' : 'Kenward–Roger'),
  });
}
