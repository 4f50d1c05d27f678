/** The fewest error degrees of freedom per site a trial should have (EPPO PP 1/152). */
export const MIN_ERROR_DF = 12;
/** The fewest blocks (replicates) per site a trial should have (PNW on-farm testing guide). */
export const MIN_BLOCKS = 4;

/** Error degrees of freedom of one site's randomized complete block analysis: (t − 1)(b − 1). */
export function errorDfPerSite(treatments: number, blocks: number): number {
  return (treatments - 1) * (blocks - 1);
}

/** The fewest blocks per site that give at least MIN_ERROR_DF error degrees of freedom: ⌈12 / (t − 1)⌉ + 1. */
export function blocksForMinimumDf(treatments: number): number {
  return Math.ceil(MIN_ERROR_DF / (treatments - 1)) + 1;
}

/**
 * Planner warnings — the design rules of thumb a planned number of blocks breaks, each as one
 * plain sentence: fewer than 12 error degrees of freedom per site (EPPO standard PP 1/152,
 * "Design and analysis of efficacy evaluation trials", free on https://pp1.eppo.int) and
 * fewer than 4 blocks (the PNW on-farm testing guide's minimum of 4 replicates).
 * Throws nothing; an empty list means the plan keeps both rules.
 * @example plannerWarnings(4, 4) // ['With 4 treatments and 4 blocks each site has 9 error degrees of freedom; …5 blocks give 12.']
 */
export function plannerWarnings(treatments: number, blocks: number): string[] {
  const warnings: string[] = [];
  const df = errorDfPerSite(treatments, blocks);
  if (df < MIN_ERROR_DF) {
    const enough = blocksForMinimumDf(treatments);
    warnings.push(
      `With ${treatments} treatments and ${blocks} blocks each site has ${df} error degrees of freedom; at least ${MIN_ERROR_DF} are wanted for a trustworthy error estimate (EPPO PP 1/152). ${enough} blocks give ${errorDfPerSite(treatments, enough)}.`,
    );
  }
  if (blocks < MIN_BLOCKS) {
    warnings.push(`${blocks} blocks is fewer than the ${MIN_BLOCKS} a site should have: one odd block can then sway the whole result. Plan at least ${MIN_BLOCKS}.`);
  }
  return warnings;
}
