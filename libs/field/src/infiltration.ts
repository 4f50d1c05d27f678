import { EXACT_FACTORS } from './exact-factors';
import { invalidInput, requirePositive } from './checks';

export type InfiltrationInput = {
  /** Water poured into the ring, mL (= cm³). */
  readonly volumeMl: number;
  /** Time until the surface inside the ring just glistens, minutes. */
  readonly minutes: number;
} & (
  | { readonly ringInsideDiameterIn: number; readonly ringInsideDiameterCm?: undefined }
  | { readonly ringInsideDiameterCm: number; readonly ringInsideDiameterIn?: undefined }
);

export interface InfiltrationRate {
  readonly depthAppliedCm: number;
  readonly depthAppliedIn: number;
  readonly mmPerHour: number;
  readonly inchesPerHour: number;
}

const FUNCTION_NAME = 'infiltrationRate';

function ringInsideDiameterCm(input: InfiltrationInput): number {
  const inches = input.ringInsideDiameterIn;
  const centimetres = input.ringInsideDiameterCm;
  if ((inches === undefined) === (centimetres === undefined)) {
    throw invalidInput(FUNCTION_NAME, 'ringInsideDiameterIn or ringInsideDiameterCm', 'given, one of the two', input);
  }
  if (inches !== undefined) {
    return requirePositive(FUNCTION_NAME, 'ringInsideDiameterIn', inches) * EXACT_FACTORS.metresPerInch * 100;
  }
  return requirePositive(FUNCTION_NAME, 'ringInsideDiameterCm', centimetres);
}

/**
 * Infiltration rate — single-ring infiltration from the volume poured, the ring's inside
 * diameter and the time the water took to soak in.
 *
 * Purpose: turn a drain time into a rate with the depth actually applied, since the usual
 * "444 mL is one inch" holds only for a ring of about 5.87 in inside diameter.
 * Depth applied d = V / (π·(ID/2)²); rate (mm/h) = 10·d(cm)·60 / t(min).
 * Reference: USDA-NRCS Soil Quality Test Kit Guide (1999), infiltration test; DOMAIN.md,
 * "Measures and how they are computed". A plot not drained by the cut-off is a censored
 * time; do not pass the cut-off here as if it were a drain time.
 * Throws: RangeError when the volume, diameter or minutes are not finite numbers above 0, or
 * when neither or both diameters are given.
 * Example: `infiltrationRate({ volumeMl: 444, ringInsideDiameterIn: 5.875, minutes: 12 }).mmPerHour`
 * → 126.9 (rounded)
 */
export function infiltrationRate(input: InfiltrationInput): InfiltrationRate {
  const volumeMl = requirePositive(FUNCTION_NAME, 'volumeMl', input.volumeMl);
  const minutes = requirePositive(FUNCTION_NAME, 'minutes', input.minutes);
  const diameterCm = ringInsideDiameterCm(input);
  const depthAppliedCm = volumeMl / (Math.PI * (diameterCm / 2) ** 2);
  const mmPerHour = (10 * depthAppliedCm * 60) / minutes;
  const millimetresPerInch = EXACT_FACTORS.metresPerInch * 1_000;
  return Object.freeze({
    depthAppliedCm,
    depthAppliedIn: (depthAppliedCm * 10) / millimetresPerInch,
    mmPerHour,
    inchesPerHour: mmPerHour / millimetresPerInch,
  });
}
