/**
 * The REML core: restricted maximum likelihood for linear mixed models y ~ N(Xβ, V(θ)) with V block-diagonal
 * over independent groups (sites, blocks, plots followed over rounds). Shared by the trial designs
 * (`analyseTrial`) and the repeated-measures models. See README.md beside this file for the interface.
 *
 * How to use it:
 *   1. Describe X as a `FixedEffectsDesign` (distinct rows + the row of each observation; `designFromDense`).
 *   2. Describe V: `varianceComponentsStructure(randomTerms, groupOf)` for random intercepts, or your own
 *      `CovarianceStructure` (V_g and ∂V_g/∂θ_k per group; second derivatives when V is not linear in θ).
 *   3. Build the problem: `denseRemlProblem({ y, design, groupOf, structure })`, or, for one random intercept
 *      per group at any size, `randomInterceptRemlProblem({ y, design, groupOf, groupName })`.
 *   4. `fitReml(problem)` → θ̂, β̂, Φ = (X'V⁻¹X)⁻¹, the REML log-likelihood (R's convention) and the informations.
 *   5. Tests and estimates: `kenwardRogerAdjustment(fit)` then `kenwardRogerTest` / `kenwardRogerEstimate`
 *      (pbkrtest), or `satterthwaitePreparation(fit)` then `satterthwaiteTest` / `satterthwaiteEstimate` (lmerTest).
 */
export { designFromDense, type CovarianceParameter, type FixedEffectsDesign, type RemlProblem, type RemlSums } from './reml-problem';
export { applyDerivative, traceWithDerivative, type CovarianceDerivative, type CovarianceStructure, type GroupCovarianceBlock } from './covariance-structure';
export { ordinaryLeastSquares, type OrdinaryLeastSquaresFit } from './ordinary-least-squares';
export { varianceComponentsStructure, type RandomInterceptTerm } from './variance-components';
export { denseRemlProblem, type DenseRemlData } from './dense-reml-problem';
export { randomInterceptRemlProblem, type RandomInterceptData } from './random-intercept-reml-problem';
export { remlQuantities, type RemlQuantities } from './reml-quantities';
export { fitReml, type RemlFit, type RemlFitOptions } from './fit-reml';
export { kenwardRogerAdjustment, kenwardRogerEstimate, kenwardRogerTest, type KenwardRogerAdjustment, type LinearHypothesisTest } from './kenward-roger';
export { satterthwaiteEstimate, satterthwaitePreparation, satterthwaiteTest, type SatterthwaitePreparation } from './satterthwaite';
