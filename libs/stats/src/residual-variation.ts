/**
 * No residual variation: a residual sum of squares that is zero up to rounding, relative to the total (below
 * 1e-24 of it, a residual standard deviation under 1e-12 of the values' own). Measured values never fit a model
 * that exactly; copied values or a formula's output can. No F test, standard error or comparison is then
 * possible, and the answer says so instead of dividing by rounding noise.
 * Reference: Friable issue #10 ("say plainly that the data have no residual variation and give no tests").
 * @throws never.
 * @example hasNoResidualVariation(3e-29, 41.5); // true
 */
export function hasNoResidualVariation(residualSs: number, totalSs: number): boolean {
  return !(residualSs > 1e-24 * totalSs) || !(residualSs > 0);
}

/** The plain words every analysis gives when its data have no residual variation. */
export const NO_RESIDUAL_VARIATION =
  'The values have no residual variation: every plot equals what the model (blocks and treatments) predicts, exactly. No F test, standard error or comparison can be made; check that these are measured values and not copies or a formula’s output.';
