/**
 * Type declarations for the parts of jStat (https://jstat.github.io/) that the
 * statistics engine uses. jStat ships no types of its own. Add a member here
 * when a new function is needed; keep the parameter names of jStat's docs.
 */
declare module 'jstat' {
  interface TwoParameterDistribution {
    pdf(x: number, a: number, b: number): number;
    cdf(x: number, a: number, b: number): number;
    inv(p: number, a: number, b: number): number;
  }

  interface OneParameterDistribution {
    pdf(x: number, dof: number): number;
    cdf(x: number, dof: number): number;
    inv(p: number, dof: number): number;
  }

  interface JStatStatic {
    /** Normal distribution with mean and standard deviation. */
    normal: TwoParameterDistribution;
    /** Student's t with dof degrees of freedom. */
    studentt: OneParameterDistribution;
    /** Chi-square with dof degrees of freedom. */
    chisquare: OneParameterDistribution;
    /** Central F with df1 and df2 degrees of freedom. */
    centralF: TwoParameterDistribution;
    /** Beta distribution with shape parameters alpha and beta. */
    beta: TwoParameterDistribution;
    /** Regularized incomplete beta function I_x(a, b). */
    ibeta(x: number, a: number, b: number): number;
    /** Inverse of the regularized incomplete beta function. */
    ibetainv(p: number, a: number, b: number): number;
    /** Natural logarithm of the gamma function. */
    gammaln(x: number): number;
    /** Regularized lower incomplete gamma function P(a, x). */
    lowRegGamma(a: number, x: number): number;
    /** Error function and its complement. */
    erf(x: number): number;
    erfc(x: number): number;
  }

  export const jStat: JStatStatic;
}
