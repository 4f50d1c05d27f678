import { findRateUnit, type RateUnitDefinition } from './rate-units';

const gramsPerSquareMetrePerPoundPerThousandSquareFeet = findRateUnit('lb/1000ft2')!.perSquareMetre;

/** What a rate is of, where Friable knows a commonly quoted range for it. */
export type MaterialKind = 'gypsum' | 'other';

/**
 * Rate plausibility limits — where the Rate calculator starts asking "is this right?".
 *
 * These are common practice, not a rule: a rate above a limit gets a warning, never a
 * refusal, since a trial may test an unusual rate on purpose.
 * - Any mass rate above 10 kg/m² (about 45 short tons per acre) is far beyond the heavy
 *   manure and compost rates growers quote.
 * - Gypsum: commonly quoted garden rates are 20–50 lb/1,000 ft² (DOMAIN.md); the warning
 *   starts at twice the top of that range, 100 lb/1,000 ft² (≈ 488 g/m²).
 * - A compost or mulch layer deeper than about 3 in (7.62 cm) is beyond common practice.
 */
export const RATE_PLAUSIBILITY_LIMITS = Object.freeze({
  massGramsPerSquareMetre: 10_000,
  gypsumGramsPerSquareMetre: 100 * gramsPerSquareMetrePerPoundPerThousandSquareFeet,
  layerDepthCm: 7.62,
});

function format(value: number): string {
  return value.toLocaleString('en-US', { maximumSignificantDigits: 3 });
}

/**
 * Rate warnings — sentences for a rate far outside common practice.
 *
 * Purpose: catch slips such as a per-100 ft² rate typed where a per-1,000 ft² rate was
 * meant (a tenfold overdose) before anyone weighs out amendment.
 * Reference: `RATE_PLAUSIBILITY_LIMITS` (common practice); DOMAIN.md, gypsum rates.
 * Throws: nothing.
 * Example: `rateWarnings(findRateUnit('lb/100ft2')!, 40, 'gypsum')` → two sentences: 400 lb/1,000 ft²
 * of gypsum is far above 20–50 lb/1,000 ft², and a reminder to check the per-100 ft² unit
 */
export function rateWarnings(
  unit: RateUnitDefinition,
  rate: number,
  materialKind: MaterialKind,
): readonly string[] {
  const perSquareMetre = rate * unit.perSquareMetre;
  const warnings: string[] = [];
  if (unit.kind === 'mass') {
    if (perSquareMetre > RATE_PLAUSIBILITY_LIMITS.massGramsPerSquareMetre) {
      warnings.push(
        `${format(perSquareMetre / 1_000)} kg/m² is far above common practice (over 10 kg/m²); check the rate and its unit.`,
      );
    } else if (materialKind === 'gypsum' && perSquareMetre > RATE_PLAUSIBILITY_LIMITS.gypsumGramsPerSquareMetre) {
      const poundsPerThousandSquareFeet = perSquareMetre / gramsPerSquareMetrePerPoundPerThousandSquareFeet;
      warnings.push(
        `${format(poundsPerThousandSquareFeet)} lb/1,000 ft² of gypsum is far above the commonly quoted 20–50 lb/1,000 ft²; check the rate and its unit.`,
      );
    }
    if (warnings.length > 0 && unit.id === 'lb/100ft2') {
      warnings.push('Rates are usually quoted per 1,000 ft²; check that this one is really per 100 ft².');
    }
  } else {
    const layerDepthCm = perSquareMetre / 10;
    if (layerDepthCm > RATE_PLAUSIBILITY_LIMITS.layerDepthCm) {
      warnings.push(
        `A layer ${format(layerDepthCm)} cm (${format(layerDepthCm / 2.54)} in) deep is beyond the usual 3 in at most; check the depth.`,
      );
    }
  }
  return Object.freeze(warnings);
}
