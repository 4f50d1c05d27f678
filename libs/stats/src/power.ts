import { jStat } from 'jstat';
import { StatsInputError } from './errors';
import { noncentralFCdf } from './noncentral-f';

/** Planner inputs for a randomized complete block trial. */
export interface RcbdPowerInput {
  /** Number of treatments t (including the control), at least 2. */
  readonly treatments: number;
  /** Blocks per site b, at least 2. */
  readonly blocks: number;
  /** Expected coefficient of variation, in % of the mean. */
  readonly cv: number;
  /** Smallest difference between two treatments worth detecting, in % of the mean. */
  readonly difference: number;
  /** Significance level of the F test, e.g. 0.05. */
  readonly alpha: number;
  /** Number of sites with the same layout (default 1). */
  readonly sites?: number;
}

/** Power of the treatment F test and the distribution it uses. */
export interface RcbdPowerResult {
  readonly power: number;
  readonly noncentrality: number;
  readonly df1: number;
  readonly df2: number;
}

function requireInteger(caller: string, name: string, value: number, minimum: number): void {
  if (!Number.isInteger(value) || value < minimum) {
    throw new StatsInputError('invalid argument', `${caller}: ${name} must be an integer of at least ${minimum}, got ${value}`);
  }
}

function requirePlannerInputs(caller: string, input: Omit<RcbdPowerInput, 'blocks'>): void {
  requireInteger(caller, 'treatments', input.treatments, 2);
  requireInteger(caller, 'sites', input.sites ?? 1, 1);
  if (!(input.cv > 0)) throw new StatsInputError('invalid argument', `${caller}: cv must be positive, got ${input.cv}`);
  if (!(input.difference > 0)) {
    throw new StatsInputError('invalid argument', `${caller}: difference must be positive, got ${input.difference}`);
  }
  if (!(input.alpha > 0 && input.alpha < 1)) {
    throw new StatsInputError('invalid argument', `${caller}: alpha must be in (0, 1), got ${input.alpha}`);
  }
}

/**
 * Power of the treatment F test in a randomized complete block trial (the
 * Planner): the chance of a significant F when two treatments differ by
 * `difference` % of the mean and the others sit at the grand mean, with error
 * CV `cv` %.
 *
 * The noncentrality is λ = sites·b·(difference/cv)²/2 (Σ τ_i² = δ²/2 for two
 * treatments at ±δ/2), the F test has t − 1 and sites·(t − 1)(b − 1) df, and
 * power = 1 − F_nc(F_crit; df1, df2, λ) with F_crit the 1 − α quantile of the
 * central F (Cohen, Statistical Power Analysis, 2nd ed., 1988, ch. 8; the
 * computation of R's power.anova.test; free notes:
 * https://en.wikipedia.org/wiki/Noncentral_F-distribution#Applications).
 *
 * @throws StatsInputError (a RangeError) for treatments or blocks < 2 or not integers,
 *   sites < 1, cv or difference not positive, alpha outside (0, 1).
 * @example rcbdPower({ treatments: 4, blocks: 4, cv: 15, difference: 10, alpha: 0.05 })
 *   // { power: 0.0877, noncentrality: 0.8889, df1: 3, df2: 9 } (4 blocks are far too few)
 */
export function rcbdPower(input: RcbdPowerInput): RcbdPowerResult {
  requirePlannerInputs('rcbdPower', input);
  requireInteger('rcbdPower', 'blocks', input.blocks, 2);
  const sites = input.sites ?? 1;
  const df1 = input.treatments - 1;
  const df2 = sites * (input.treatments - 1) * (input.blocks - 1);
  const noncentrality = (sites * input.blocks * (input.difference / input.cv) ** 2) / 2;
  const criticalF = jStat.centralF.inv(1 - input.alpha, df1, df2);
  const power = 1 - noncentralFCdf(criticalF, df1, df2, noncentrality);
  return Object.freeze({ power, noncentrality, df1, df2 });
}

/**
 * Smallest number of blocks per site (at least 2) whose RCBD treatment F test
 * reaches `targetPower` (see rcbdPower), and the power it gives.
 * @throws StatsInputError (a RangeError) when no number of blocks up to maxBlocks
 *   (default 100) reaches the target, targetPower is outside (0, 1), or as rcbdPower.
 * @example blocksForPower({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, targetPower: 0.6 }) // { blocks: 12, power: 0.6306 }
 */
export function blocksForPower(
  input: Omit<RcbdPowerInput, 'blocks'> & { readonly targetPower: number; readonly maxBlocks?: number },
): { blocks: number; power: number } {
  requirePlannerInputs('blocksForPower', input);
  if (!(input.targetPower > 0 && input.targetPower < 1)) {
    throw new StatsInputError('invalid argument', `blocksForPower: targetPower must be in (0, 1), got ${input.targetPower}`);
  }
  const maxBlocks = input.maxBlocks ?? 100;
  requireInteger('blocksForPower', 'maxBlocks', maxBlocks, 2);
  for (let blocks = 2; blocks <= maxBlocks; blocks++) {
    const { power } = rcbdPower({ ...input, blocks });
    if (power >= input.targetPower) return Object.freeze({ blocks, power });
  }
  throw new StatsInputError(
    'target not reached',
    `blocksForPower: ${maxBlocks} blocks give less than power ${input.targetPower}; detect a larger difference or lower the CV`,
  );
}
