import Decimal from 'decimal.js';
import { NUMBER_BOUNDS } from './number-bounds';

/**
 * The decimal.js the API reads numbers with, configured for measurements: enough precision for
 * every digit `NUMBER_BOUNDS` lets through, half-up rounding, and exponent limits a little beyond
 * the bounds so that a number that slipped past them overflows to Infinity (or underflows to
 * zero) at once instead of being written out in full. Never text in exponent form from toString().
 * Reference: decimal.js configuration (precision, rounding, minE, maxE, toExpNeg, toExpPos).
 */
export const MeasurementDecimal = Decimal.clone({
  precision: 2 * NUMBER_BOUNDS.significantDigits,
  rounding: Decimal.ROUND_HALF_UP,
  maxE: 2 * (NUMBER_BOUNDS.largestExponent + 1),
  minE: 2 * NUMBER_BOUNDS.smallestExponent,
  toExpPos: 9e15,
  toExpNeg: -9e15,
});

export type MeasurementDecimal = Decimal;
