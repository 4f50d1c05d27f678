/**
 * Type declarations for the one part of jStat (https://jstat.github.io/) the field library uses:
 * the central F quantile behind the design guardrails. jStat ships no types of its own.
 */
declare module 'jstat' {
  interface JStatStatic {
    /** Central F with df1 and df2 degrees of freedom. */
    centralF: { inv(p: number, df1: number, df2: number): number };
  }

  export const jStat: JStatStatic;
}
