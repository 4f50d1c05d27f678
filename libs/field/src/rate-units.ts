import { EXACT_FACTORS } from './exact-factors';

export type MassRateUnit = 'lb/100ft2' | 'lb/1000ft2' | 'lb/acre' | 'g/m2' | 'kg/m2' | 'kg/ha' | 't/ha' | 'ton/acre';
/** Depth of a layer spread over the area (`in`, `cm`) or a bulk volume per area. */
export type VolumeRateUnit = 'in' | 'cm' | 'yd3/1000ft2';
export type RateUnit = MassRateUnit | VolumeRateUnit;

export interface RateUnitDefinition {
  readonly id: RateUnit;
  readonly label: string;
  /** `mass` rates convert to g/m², `volume` rates to L/m². */
  readonly kind: 'mass' | 'volume';
  /** g/m² (mass) or L/m² (volume) for a rate of 1 in this unit. */
  readonly perSquareMetre: number;
}

const { kilogramsPerPound, squareMetresPerSquareFoot, squareMetresPerAcre, squareMetresPerHectare } = EXACT_FACTORS;
const gramsPerPound = kilogramsPerPound * 1_000;
const litresPerCubicYard = EXACT_FACTORS.cubicMetresPerCubicYard * 1_000;

function rateUnit(id: RateUnit, label: string, kind: 'mass' | 'volume', perSquareMetre: number): RateUnitDefinition {
  return Object.freeze({ id, label, kind, perSquareMetre });
}

/**
 * Rate units — the application-rate units the Rate calculator accepts.
 *
 * Purpose: turn a rate as printed on a bag or in a protocol into g/m² or L/m². `t` is the
 * metric tonne, `ton` the US short ton (2,000 lb). A depth of 1 cm over 1 m² is 10 L.
 * Reference: NIST SP 811 (2008), Appendix B, via `EXACT_FACTORS`; DOMAIN.md derived factors.
 * Throws: nothing (constant list).
 * Example: `RATE_UNITS.find((u) => u.id === 'lb/1000ft2')?.perSquareMetre` → 4.88242763638305
 */
export const RATE_UNITS: readonly RateUnitDefinition[] = Object.freeze([
  rateUnit('lb/100ft2', 'pounds per 100 square feet', 'mass', gramsPerPound / (100 * squareMetresPerSquareFoot)),
  rateUnit('lb/1000ft2', 'pounds per 1,000 square feet', 'mass', gramsPerPound / (1_000 * squareMetresPerSquareFoot)),
  rateUnit('lb/acre', 'pounds per acre', 'mass', gramsPerPound / squareMetresPerAcre),
  rateUnit('g/m2', 'grams per square metre', 'mass', 1),
  rateUnit('kg/m2', 'kilograms per square metre', 'mass', 1_000),
  rateUnit('kg/ha', 'kilograms per hectare', 'mass', 1_000 / squareMetresPerHectare),
  rateUnit('t/ha', 'tonnes per hectare', 'mass', 1_000_000 / squareMetresPerHectare),
  rateUnit('ton/acre', 'short tons per acre', 'mass', (EXACT_FACTORS.kilogramsPerShortTon * 1_000) / squareMetresPerAcre),
  rateUnit('in', 'inches deep over the area', 'volume', EXACT_FACTORS.metresPerInch * 1_000),
  rateUnit('cm', 'centimetres deep over the area', 'volume', 10),
  rateUnit('yd3/1000ft2', 'cubic yards per 1,000 square feet', 'volume', litresPerCubicYard / (1_000 * squareMetresPerSquareFoot)),
]);

/**
 * Find rate unit — looks up a rate unit by id.
 * Purpose: validate a treatment's stored rate unit. Reference: `RATE_UNITS`.
 * Throws: nothing; unknown ids give `undefined`.
 * Example: `findRateUnit('t/ha')?.perSquareMetre` → 100
 */
export function findRateUnit(id: string): RateUnitDefinition | undefined {
  return RATE_UNITS.find((definition) => definition.id === id);
}
