import { requirePositiveInteger } from './checks';
import { errorStrata, type ErrorStratum, type StratumFactor } from './design-strata';
import { DESIGN_RULES, requireTrialDesign, type TrialDesign } from './trial-designs';

export interface DesignCheckInput {
  readonly design: TrialDesign;
  /** Treatment codes, or their number; for a factorial without `factors`, the combinations. */
  readonly treatments?: number | readonly string[];
  /** Factorial and split designs: each factor's name and number of levels (a split plot's whole-plot factor first). */
  readonly factors?: readonly StratumFactor[];
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

/** The fewest blocks that give the stratum 12 error df (each extra block adds at least one). */
function blocksNeeded(strataAt: (blocks: number) => readonly ErrorStratum[], index: number): { blocks: number; errorDf: number } {
  let blocks = 2;
  while (strataAt(blocks)[index]!.errorDf < DESIGN_MINIMUMS.errorDegreesOfFreedom) blocks += 1;
  return { blocks, errorDf: strataAt(blocks)[index]!.errorDf };
}

/** 161.4476 → '161.4', 18.5128 → '18.5', 4.7472 → '4.75'. */
function formatF(value: number): string {
  return value >= 100 ? value.toFixed(1) : value.toPrecision(3);
}

function listed(terms: readonly string[]): string {
  const words = terms.map((term) => term.split(':').join(' × '));
  return words.length <= 1 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

const degrees = (df: number) => `${df} degree${df === 1 ? '' : 's'} of freedom`;

/** 'split plot' or 'split-split plot', as the sentence names the design. */
const splitDesignWords = (design: TrialDesign) => (design === 'split-split-plot' ? 'split-split plot' : 'split plot');

/**
 * The plain sentence about a split plot's stratum with too few error df, opening with what the
 * investigator chose: "A split plot with 2 blocks has only 1 degree of freedom for whole-plot error …".
 */
function splitStratumWarning(design: TrialDesign, stratum: ErrorStratum, where: string, blocks: number, needed: { blocks: number; errorDf: number }): string {
  const first = stratum.terms[0]!.split(':').join(' × ');
  const more = `${needed.blocks} blocks would give ${needed.errorDf}.`;
  const opening = `A ${splitDesignWords(design)} with ${blocks} block${blocks === 1 ? '' : 's'} has`;
  const errorName = stratum.name.charAt(0).toLowerCase() + stratum.name.slice(1);
  if (stratum.errorDf === 0) {
    return `${opening} no degrees of freedom for ${errorName} ${where}: ${listed(stratum.terms)} cannot be tested. ${more}`;
  }
  const verb = stratum.terms.length === 1 ? 'is' : 'are';
  const critical = stratum.criticalF === null ? '' : `: at p = 0.05 the F of ${first} must exceed ${formatF(stratum.criticalF)}`;
  const plainly = stratum.errorDf <= 2 ? ', so only a very large difference could show' : '';
  return (
    `${opening} only ${degrees(stratum.errorDf)} for ${errorName} ${where} (${stratum.arithmetic}), fewer than the ${DESIGN_MINIMUMS.errorDegreesOfFreedom} EPPO PP 1/152 asks for. ` +
    `${listed(stratum.terms)} ${verb} tested against it${critical}${plainly}. ${more}`
  );
}

/**
 * Design warnings — plain sentences about a trial design too small to say much.
 *
 * Purpose: shown on the Protocol, the Sites page, the activation check and the Planner before
 * plots are laid out. Each site is analysed on its own before any combined analysis, so the
 * checks apply per site.
 * - Fewer than 4 blocks (replicates) per site: PNW on-farm testing guide.
 * - Fewer than 12 error degrees of freedom in any error stratum at one site: EPPO PP 1/152.
 *   One error for completely randomized, block and factorial designs, (t−1)(b−1) or t(r−1);
 *   4 treatments × 5 blocks give 12, × 4 blocks only 9. A split plot's whole-plot error has
 *   (r−1)(a−1): with 2 blocks and 2 whole-plot levels only 1 df, and the sentence says what that
 *   means for the F test (the F the whole-plot factor must exceed at p = 0.05).
 * - Only one treatment: nothing to compare (an untreated control is needed for any claim).
 * Reference: DOMAIN.md, "Design rules of thumb"; Gomez & Gomez (1984), 2nd ed., Tables 3.8 and 3.13.
 * Throws: RangeError naming the field for fewer than 1 treatment, block or site, or a
 * fractional count, an unknown design, or factors the design does not take.
 * Example: `designWarnings({ design: 'rcbd', treatments: 4, blocks: 4, sites: 1 })` → one
 * sentence: "4 treatments × 4 blocks leave 9 error degrees of freedom at the site, …"
 */
export function designWarnings(input: DesignCheckInput): readonly string[] {
  const design = requireTrialDesign(FUNCTION_NAME, input.design);
  const rule = DESIGN_RULES[design];
  const withFactors = rule.maxFactors > 0 && input.factors !== undefined;
  const treatmentCount = withFactors ? input.factors!.reduce((product, f) => product * f.levels, 1) : typeof input.treatments === 'number' ? input.treatments : input.treatments?.length;
  const treatments = requirePositiveInteger(FUNCTION_NAME, 'treatments', treatmentCount);
  const blocks = requirePositiveInteger(FUNCTION_NAME, 'blocks', input.blocks);
  const sites = requirePositiveInteger(FUNCTION_NAME, 'sites', input.sites);
  const blockWord = rule.blocked ? 'blocks' : 'replicates';
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
  if (treatments < 2) return Object.freeze(warnings);
  const strataAt = (b: number) => errorStrata({ design, blocks: b, ...(withFactors ? { factors: input.factors } : { treatments }) });
  strataAt(blocks).forEach((stratum, index) => {
    if (stratum.errorDf >= DESIGN_MINIMUMS.errorDegreesOfFreedom) return;
    const needed = blocksNeeded(strataAt, index);
    if (stratum.unit !== 'plot') {
      warnings.push(splitStratumWarning(design, stratum, where, blocks, needed));
      return;
    }
    const what = withFactors ? `${treatments} combinations` : `${treatments} treatments`;
    warnings.push(
      `${what} × ${blocks} ${blockWord} leave ${stratum.errorDf} error degrees of freedom ${where}, ` +
        `fewer than the ${DESIGN_MINIMUMS.errorDegreesOfFreedom} EPPO PP 1/152 asks for; ` +
        `${needed.blocks} ${blockWord} would give ${needed.errorDf}.`,
    );
  });
  return Object.freeze(warnings);
}
