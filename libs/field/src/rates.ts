import { EXACT_FACTORS } from './exact-factors';
import { invalidInput, requireNonNegative, requirePositive, requirePositiveInteger } from './checks';
import { surfaceAreaFor, type PlotGeometry } from './plot-geometry';
import { findRateUnit, type RateUnit } from './rate-units';
import { rateWarnings, type MaterialKind } from './rate-plausibility';

export type DoseBasis = 'area' | 'concentration';

export interface DoseInput {
  /** The rate as stated, in `unit`; 0 is allowed (an untreated control). */
  readonly rate: number;
  readonly unit: RateUnit;
  /** `area`: rate × surface area. `concentration`: rate ÷ incorporation depth × soil volume. */
  readonly basis: DoseBasis;
  readonly geometry: PlotGeometry;
  /** Depth the field rate is mixed into; needed for the concentration basis. */
  readonly incorporationDepthCm?: number;
  /** Soil volume in the container; needed for the concentration basis. */
  readonly soilVolumeL?: number;
  /** Share of the product that is the active material (0–1], for a rate stated as active material. Mass rates only. */
  readonly purity?: number;
  /** Water share of the as-is product's mass [0–1), for a rate stated on a dry basis. Mass rates only. */
  readonly moistureFraction?: number;
  /** Bulk density of the product as applied (kg/L); when given, masses and volumes are both filled in. */
  readonly bulkDensityKgPerL?: number;
  /** Enables the gypsum range check. */
  readonly materialKind?: MaterialKind;
}

export interface DoseResult {
  /** Product to weigh out; null for a volume rate without a bulk density. */
  readonly grams: number | null;
  readonly kilograms: number | null;
  readonly ounces: number | null;
  readonly pounds: number | null;
  /** Product to measure out; null for a mass rate without a bulk density. */
  readonly litres: number | null;
  /** US gallons. */
  readonly gallons: number | null;
  /** The rate as stated, before purity and moisture, per square metre. */
  readonly ratePerM2: { readonly value: number; readonly unit: 'g/m2' | 'L/m2' };
  readonly areaM2: number;
  readonly basis: DoseBasis;
  readonly warnings: readonly string[];
}

const FUNCTION_NAME = 'computeDose';
const gramsPerPound = EXACT_FACTORS.kilogramsPerPound * 1_000;

function requireFraction(field: string, value: number, lowest: number, highest: number, bounds: string): number {
  if (!Number.isFinite(value) || value < lowest || value > highest) {
    throw invalidInput(FUNCTION_NAME, field, bounds, value);
  }
  return value;
}

/** Multiplier from the stated rate's material to the product weighed out (purity, moisture). */
function productFactor(input: DoseInput, isMassRate: boolean): number {
  const purity = input.purity ?? 1;
  const moistureFraction = input.moistureFraction ?? 0;
  requireFraction('purity', purity, Number.MIN_VALUE, 1, 'a fraction above 0 and at most 1');
  requireFraction('moistureFraction', moistureFraction, 0, 1 - Number.EPSILON, 'a fraction of at least 0 and below 1');
  if (!isMassRate && purity !== 1) {
    throw invalidInput(FUNCTION_NAME, 'purity', 'left out (or 1) for a depth or volume rate', purity);
  }
  if (!isMassRate && moistureFraction !== 0) {
    throw invalidInput(FUNCTION_NAME, 'moistureFraction', 'left out (or 0) for a depth or volume rate', moistureFraction);
  }
  return 1 / purity / (1 - moistureFraction);
}

/** Amount of the stated material (g or L) for the chosen basis. */
function basisAmount(input: DoseInput, perSquareMetre: number, areaM2: number): number {
  if (input.basis === 'area') return perSquareMetre * areaM2;
  if (input.basis !== 'concentration') {
    throw invalidInput(FUNCTION_NAME, 'basis', '"area" or "concentration"', input.basis);
  }
  const depthM = requirePositive(FUNCTION_NAME, 'incorporationDepthCm', input.incorporationDepthCm) / 100;
  const soilVolumeM3 = requirePositive(FUNCTION_NAME, 'soilVolumeL', input.soilVolumeL) / 1_000;
  return (perSquareMetre / depthM) * soilVolumeM3;
}

/**
 * Compute dose — the Rate calculator: how much product one plot or container receives.
 *
 * Purpose: turn a per-area rate into a quantity for a site's plot, in both unit systems.
 * - Area basis: dose = rate (per m²) × the soil surface area.
 * - Concentration basis, for copying a field rate mixed to depth d into a container of soil:
 *   dose = rate ÷ d × soil volume, i.e. the same amount per unit of soil as in the field.
 *   The two bases agree only when the soil in the container is exactly d deep, so the
 *   protocol must say which one it means.
 * - Rate stated as active material: the product needed is the dose ÷ purity. Rate stated on
 *   a dry basis: the as-is product needed is the dose ÷ (1 − moisture fraction).
 * Depth rates (`in`, `cm`) and `yd3/1000ft2` give litres and US gallons; masses need the
 * product's bulk density.
 * Reference: DOMAIN.md, "Rate arithmetic the Rate calculator must do"; factors NIST SP 811.
 * Throws: RangeError naming the field for a negative or non-finite rate, an unknown unit or
 * basis, a bad geometry, a concentration basis without depth or soil volume, a purity
 * outside (0, 1], a moisture fraction outside [0, 1), or purity/moisture on a volume rate.
 * Example: `computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { diameterCm: 30 } }).grams`
 * → 13.80 (rounded)
 */
export function computeDose(input: DoseInput): DoseResult {
  const rate = requireNonNegative(FUNCTION_NAME, 'rate', input.rate);
  const unit = findRateUnit(input.unit);
  if (!unit) throw invalidInput(FUNCTION_NAME, 'unit', 'a rate unit listed in RATE_UNITS', input.unit);
  const isMassRate = unit.kind === 'mass';
  const areaM2 = surfaceAreaFor(FUNCTION_NAME, input.geometry);
  const perSquareMetre = rate * unit.perSquareMetre;
  const amount = basisAmount(input, perSquareMetre, areaM2) * productFactor(input, isMassRate);
  const density =
    input.bulkDensityKgPerL === undefined
      ? null
      : requirePositive(FUNCTION_NAME, 'bulkDensityKgPerL', input.bulkDensityKgPerL);

  let grams: number | null = isMassRate ? amount : null;
  let litres: number | null = isMassRate ? null : amount;
  if (density !== null) {
    if (isMassRate) litres = amount / 1_000 / density;
    else grams = amount * density * 1_000;
  }
  return Object.freeze({
    grams,
    kilograms: grams === null ? null : grams / 1_000,
    ounces: grams === null ? null : (grams / gramsPerPound) * EXACT_FACTORS.ouncesPerPound,
    pounds: grams === null ? null : grams / gramsPerPound,
    litres,
    gallons: litres === null ? null : litres / EXACT_FACTORS.litresPerUsGallon,
    ratePerM2: Object.freeze({ value: perSquareMetre, unit: isMassRate ? ('g/m2' as const) : ('L/m2' as const) }),
    areaM2,
    basis: input.basis,
    warnings: rateWarnings(unit, rate, input.materialKind ?? 'other'),
  });
}

export interface TrialTotalInput {
  readonly dosePerPlotGrams: number;
  readonly plots: number;
  /** Extra to buy for spills and weighing losses, in percent of the net total; default 0. */
  readonly marginPercent?: number;
}

export interface TrialTotal {
  readonly netGrams: number;
  readonly marginGrams: number;
  readonly grams: number;
  readonly kilograms: number;
  readonly pounds: number;
  readonly ounces: number;
}

/**
 * Trial total — how much product to buy for all plots of one treatment, with a margin.
 *
 * Purpose: the shopping line under the Rate calculator: dose × plots × (1 + margin/100).
 * Reference: arithmetic; pound NIST SP 811.
 * Throws: RangeError naming the field for a negative dose, fewer than 1 plot (or a
 * fractional count) or a negative margin.
 * Example: `trialTotal({ dosePerPlotGrams: 13.8, plots: 12, marginPercent: 10 }).grams` → 182.16 (rounded)
 */
export function trialTotal(input: TrialTotalInput): TrialTotal {
  const dose = requireNonNegative('trialTotal', 'dosePerPlotGrams', input.dosePerPlotGrams);
  const plots = requirePositiveInteger('trialTotal', 'plots', input.plots);
  const marginPercent = requireNonNegative('trialTotal', 'marginPercent', input.marginPercent ?? 0);
  const netGrams = dose * plots;
  const marginGrams = (netGrams * marginPercent) / 100;
  const grams = netGrams + marginGrams;
  return Object.freeze({
    netGrams,
    marginGrams,
    grams,
    kilograms: grams / 1_000,
    pounds: grams / gramsPerPound,
    ounces: (grams / gramsPerPound) * EXACT_FACTORS.ouncesPerPound,
  });
}
