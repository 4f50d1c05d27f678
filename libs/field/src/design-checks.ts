import { requirePositiveInteger } from './checks';
import { requireTrialDesign, type TrialDesign } from './randomize';

export interface DesignCheckInput {
  readonly design: TrialDesign;
  /** Treatment codes, or their number; for a factorial, the combinations. */
  readonly treatments: number | readonly string[];
  /** Blocks per site (replicates for `crd`). */
  readonly blocks: number;
  readonly sites: number;
}

/** Rules of thumb; each warning names where it comes from. */
export const DESIGN_MINIMUMS = Object.freeze({
  /** PNW on-farm testing guide: at least 4 replicates. */
  replicates: 4,
  /** EPPO PP 1/152: at least 12 error degrees of freedom. */
  errorDegreesOfFreedom: 12,
});

const FUNCTION_NAME = 'designWarnings';

/** Error df at one site: (t−1)(b−1) for block designs, t(r−1) for a completely randomized one. */
function siteErrorDegreesOfFreedom(design: TrialDesign, treatments: number, blocks: number): number {
  return design === 'crd' ? treatments * (blocks - 1) : (treatments - 1) * (blocks - 1);
}

function blocksNeeded(design: TrialDesign, treatments: number): number {
  let blocks = 2;
  while (siteErrorDegreesOfFreedom(design, treatments, blocks) < DESIGN_MINIMUMS.errorDegreesOfFreedom) blocks += 1;
  return blocks;
}

/**
 * Design warnings — plain sentences about a trial design too small to say much.
 *
 * Purpose: shown on the Protocol and Planner before plots are laid out. Each site is
 * analysed on its own before any combined analysis, so the checks apply per site.
 * - Fewer than 4 blocks (replicates) per site: PNW on-farm testing guide.
 * - Fewer than 12 error degrees of freedom at one site, (t−1)(b−1) for block designs and
 *   t(r−1) for `crd`: EPPO PP 1/152. 4 treatments × 5 blocks give 12; × 4 blocks only 9.
 * - Only one treatment: nothing to compare (an untreated control is needed for any claim).
 * Reference: DOMAIN.md, "Design rules of thumb".
 * Throws: RangeError naming the field for fewer than 1 treatment, block or site, or a
 * fractional count, or an unknown design.
 * Example: `designWarnings({ design: 'rcbd', treatments: 4, blocks: 4, sites: 1 })` → one
 * sentence: "4 treatments × 4 blocks leave 9 error degrees of freedom at the site, …"
 */
export function designWarnings(input: DesignCheckInput): readonly string[] {
  const design = requireTrialDesign(FUNCTION_NAME, input.design);
  const treatmentCount = typeof input.treatments === 'number' ? input.treatments : input.treatments.length;
  const treatments = requirePositiveInteger(FUNCTION_NAME, 'treatments', treatmentCount);
  const blocks = requirePositiveInteger(FUNCTION_NAME, 'blocks', input.blocks);
  const sites = requirePositiveInteger(FUNCTION_NAME, 'sites', input.sites);
  const blockWord = design === 'crd' ? 'replicates' : 'blocks';
  const where = sites === 1 ? 'at the site' : `at each of the ${sites} sites`;
  const warnings: string[] = [];

  if (treatments === 1) {
    warnings.push('Only 1 treatment: a trial needs at least two, one of them an untreated control, to show any effect.');
  }
  if (blocks < DESIGN_MINIMUMS.replicates) {
    warnings.push(
      `${blocks} ${blockWord} per site is fewer than the ${DESIGN_MINIMUMS.replicates} replicates the PNW on-farm testing guide recommends.`,
    );
  }
  const errorDf = siteErrorDegreesOfFreedom(design, treatments, blocks);
  if (treatments >= 2 && errorDf < DESIGN_MINIMUMS.errorDegreesOfFreedom) {
    const needed = blocksNeeded(design, treatments);
    warnings.push(
      `${treatments} treatments × ${blocks} ${blockWord} leave ${errorDf} error degrees of freedom ${where}, ` +
        `fewer than the ${DESIGN_MINIMUMS.errorDegreesOfFreedom} EPPO PP 1/152 asks for; ` +
        `${needed} ${blockWord} would give ${siteErrorDegreesOfFreedom(design, treatments, needed)}.`,
    );
  }
  return Object.freeze(warnings);
}
