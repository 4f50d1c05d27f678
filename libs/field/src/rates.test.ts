import { describe, expect, it } from 'vitest';
import { computeDose, trialTotal } from './rates';
import { RATE_UNITS, findRateUnit } from './rate-units';
import { convertValue } from './units';

// Tolerances: toBeCloseTo(expected, d) passes when |error| < 0.5·10^-d, so d is the number of
// decimals printed in the source ("as printed digits").
const squareMetresPerSquareFoot = 0.09290304; // NIST SP 811, exact
const thousandSquareFeet = { areaM2: 1_000 * squareMetresPerSquareFoot };

function perSquareMetre(unitId: string): number {
  return findRateUnit(unitId)!.perSquareMetre;
}

describe('RATE_UNITS derived factors (DOMAIN.md, "Derived (computed from the exact factors)")', () => {
  it('1 lb/1000 ft² = 4.8824 g/m² = 43.56 lb/acre = 48.824 kg/ha', () => {
    const gramsPerSquareMetre = perSquareMetre('lb/1000ft2');
    expect(gramsPerSquareMetre).toBeCloseTo(4.8824, 4);
    expect(gramsPerSquareMetre / perSquareMetre('lb/acre')).toBeCloseTo(43.56, 2);
    expect(gramsPerSquareMetre / perSquareMetre('kg/ha')).toBeCloseTo(48.824, 3);
  });

  it('1 lb/acre = 1.12085 kg/ha', () => {
    expect(perSquareMetre('lb/acre') / perSquareMetre('kg/ha')).toBeCloseTo(1.12085, 5);
  });

  it('1 short ton/acre = 2.2417 t/ha and 1 t/ha = 0.44609 short ton/acre (also NDSU gypsum page)', () => {
    expect(perSquareMetre('ton/acre') / perSquareMetre('t/ha')).toBeCloseTo(2.2417, 4);
    expect(perSquareMetre('t/ha') / perSquareMetre('ton/acre')).toBeCloseTo(0.44609, 5);
  });

  it('1 cm over 1 m² = 10 L; 1 in = 25.4 L/m² (computed from the exact factors)', () => {
    expect(perSquareMetre('cm')).toBe(10);
    expect(perSquareMetre('in')).toBeCloseTo(25.4, 12);
  });

  it('has unique ids', () => {
    expect(new Set(RATE_UNITS.map((u) => u.id)).size).toBe(RATE_UNITS.length);
  });
});

describe('computeDose worked examples (DOMAIN.md, "Rate arithmetic the Rate calculator must do")', () => {
  it('40 lb/1000 ft² of gypsum = 195.3 g/m² → 13.8 g for a 30 cm pot', () => {
    const dose = computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { diameterCm: 30 }, materialKind: 'gypsum' });
    expect(dose.ratePerM2).toEqual({ value: expect.closeTo(195.3, 1), unit: 'g/m2' });
    expect(dose.grams).toBeCloseTo(13.8, 1);
    expect(dose.litres).toBeNull();
    expect(dose.warnings).toEqual([]);
  });

  it('16 ft² plot at 40 lb/1000 ft² = 0.64 lb = 290 g', () => {
    const dose = computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { areaM2: 16 * squareMetresPerSquareFoot } });
    expect(dose.pounds).toBeCloseTo(0.64, 2);
    expect(dose.grams).toBeCloseTo(290, 0);
    expect(dose.ounces).toBeCloseTo(10.24, 2); // 0.64 lb × 16 oz/lb, computed from the exact factors
  });

  it('2 short t/acre = 0.448 kg/m² → 646 g on a 1.2 m × 1.2 m plot', () => {
    const dose = computeDose({ rate: 2, unit: 'ton/acre', basis: 'area', geometry: { lengthM: 1.2, widthM: 1.2 } });
    expect(dose.ratePerM2.value / 1_000).toBeCloseTo(0.448, 3);
    expect(dose.grams).toBeCloseTo(646, 0);
    expect(dose.kilograms).toBeCloseTo(0.646, 3);
  });

  it('"5 lb per 100 ft²" = 244 g/m² = 50 lb/1000 ft² (the 100 vs 1000 trap)', () => {
    const perHundred = computeDose({ rate: 5, unit: 'lb/100ft2', basis: 'area', geometry: { areaM2: 1 } });
    const perThousand = computeDose({ rate: 50, unit: 'lb/1000ft2', basis: 'area', geometry: { areaM2: 1 } });
    expect(perHundred.ratePerM2.value).toBeCloseTo(244, 0);
    expect(perHundred.grams).toBeCloseTo(perThousand.grams!, 10);
  });

  it('a 2-inch compost layer over 1,000 ft² is 6.17 yd³', () => {
    const dose = computeDose({ rate: 2, unit: 'in', basis: 'area', geometry: thousandSquareFeet });
    expect(convertValue(dose.litres!, 'L', 'yd3')).toBeCloseTo(6.17, 2);
    expect(dose.grams).toBeNull();
    expect(dose.ratePerM2).toEqual({ value: expect.closeTo(50.8, 10), unit: 'L/m2' });
  });

  it('1 in over 1,000 ft² = 83.33 ft³ = 3.086 yd³ (DOMAIN.md derived factors)', () => {
    const dose = computeDose({ rate: 1, unit: 'in', basis: 'area', geometry: thousandSquareFeet });
    expect(convertValue(dose.litres!, 'L', 'ft3')).toBeCloseTo(83.33, 2);
    expect(convertValue(dose.litres!, 'L', 'yd3')).toBeCloseTo(3.086, 3);
  });

  it('1 yd³ spread 1 in deep covers 324 ft² (DOMAIN.md derived factors)', () => {
    const dose = computeDose({ rate: 1, unit: 'in', basis: 'area', geometry: { areaM2: 324 * squareMetresPerSquareFoot } });
    expect(convertValue(dose.litres!, 'L', 'yd3')).toBeCloseTo(1, 12);
  });

  it('1 cm over 1 m² = 10 L (DOMAIN.md derived factors); gallons are US gallons (NIST SP 811)', () => {
    const dose = computeDose({ rate: 1, unit: 'cm', basis: 'area', geometry: { areaM2: 1 } });
    expect(dose.litres).toBeCloseTo(10, 12);
    expect(dose.gallons).toBeCloseTo(10 / 3.785411784, 12);
  });

  it('1 yd³/1000 ft² over 1,000 ft² is 1 yd³ (computed from the exact factors)', () => {
    const dose = computeDose({ rate: 1, unit: 'yd3/1000ft2', basis: 'area', geometry: thousandSquareFeet });
    expect(convertValue(dose.litres!, 'L', 'yd3')).toBeCloseTo(1, 12);
  });
});

describe('computeDose bases and adjustments (computed from the exact factors)', () => {
  const gypsumInPot = { rate: 40, unit: 'lb/1000ft2', geometry: { diameterCm: 30 } } as const;

  it('concentration basis: rate ÷ depth × soil volume', () => {
    // 195.297 g/m² ÷ 0.15 m × 0.010 m³ = 13.0198 g
    const dose = computeDose({ ...gypsumInPot, basis: 'concentration', incorporationDepthCm: 15, soilVolumeL: 10 });
    expect(dose.grams).toBeCloseTo(13.0198, 4);
    expect(dose.basis).toBe('concentration');
  });

  it('both bases agree when the container soil depth equals the incorporation depth', () => {
    const area = computeDose({ ...gypsumInPot, basis: 'area' });
    const depthCm = 20;
    const soilVolumeL = area.areaM2 * (depthCm / 100) * 1_000;
    const concentration = computeDose({ ...gypsumInPot, basis: 'concentration', incorporationDepthCm: depthCm, soilVolumeL });
    expect(concentration.grams).toBeCloseTo(area.grams!, 10);
  });

  it('divides by purity and by (1 − moisture)', () => {
    const plain = computeDose({ ...gypsumInPot, basis: 'area' });
    const adjusted = computeDose({ ...gypsumInPot, basis: 'area', purity: 0.8, moistureFraction: 0.2 });
    expect(adjusted.grams).toBeCloseTo(plain.grams! / 0.8 / 0.8, 10);
    expect(adjusted.ratePerM2.value).toBe(plain.ratePerM2.value);
  });

  it('fills both mass and volume when a bulk density is given', () => {
    const compost = computeDose({ rate: 1, unit: 'cm', basis: 'area', geometry: { areaM2: 1 }, bulkDensityKgPerL: 0.5 });
    expect(compost.grams).toBeCloseTo(5_000, 9);
    expect(compost.pounds).toBeCloseTo(5 / 0.45359237, 9);
    const gypsum = computeDose({ rate: 1, unit: 'kg/m2', basis: 'area', geometry: { areaM2: 1 }, bulkDensityKgPerL: 1.25 });
    expect(gypsum.litres).toBeCloseTo(0.8, 12);
  });

  it('gives zero for a zero rate (untreated control)', () => {
    expect(computeDose({ ...gypsumInPot, rate: 0, basis: 'area' }).grams).toBe(0);
  });

  it('returns frozen results', () => {
    const dose = computeDose({ ...gypsumInPot, basis: 'area' });
    expect(Object.isFrozen(dose)).toBe(true);
    expect(Object.isFrozen(dose.warnings)).toBe(true);
    expect(Object.isFrozen(dose.ratePerM2)).toBe(true);
  });
});

describe('computeDose plausibility warnings (common practice thresholds)', () => {
  const square = { areaM2: 1 };

  it('warns about mass rates above 10 kg/m² but still answers', () => {
    const dose = computeDose({ rate: 12, unit: 'kg/m2', basis: 'area', geometry: square });
    expect(dose.grams).toBe(12_000);
    expect(dose.warnings).toHaveLength(1);
    expect(dose.warnings[0]).toMatch(/12 kg\/m² is far above common practice/);
  });

  it('warns about gypsum far above 20–50 lb/1000 ft² and points at the per-100 ft² trap', () => {
    const dose = computeDose({ rate: 40, unit: 'lb/100ft2', basis: 'area', geometry: square, materialKind: 'gypsum' });
    expect(dose.warnings[0]).toMatch(/400 lb\/1,000 ft² of gypsum/);
    expect(dose.warnings[1]).toMatch(/per 100 ft²/);
  });

  it('does not warn for gypsum at 50 lb/1000 ft² or for the same mass of another material', () => {
    expect(computeDose({ rate: 50, unit: 'lb/1000ft2', basis: 'area', geometry: square, materialKind: 'gypsum' }).warnings).toEqual([]);
    expect(computeDose({ rate: 400, unit: 'lb/1000ft2', basis: 'area', geometry: square }).warnings).toEqual([]);
  });

  it('warns about a compost layer deeper than 3 in', () => {
    expect(computeDose({ rate: 3, unit: 'in', basis: 'area', geometry: square }).warnings).toEqual([]);
    const deep = computeDose({ rate: 4, unit: 'in', basis: 'area', geometry: square });
    expect(deep.warnings[0]).toMatch(/10.2 cm \(4 in\) deep/);
  });
});

describe('computeDose bad input', () => {
  const base = { rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { areaM2: 1 } } as const;

  it('throws RangeError naming the field', () => {
    expect(() => computeDose({ ...base, rate: -1 })).toThrow(/computeDose: rate must be a finite number of at least 0 \(got -1\)/);
    expect(() => computeDose({ ...base, unit: 'lb/ft2' as never })).toThrow(/computeDose: unit must be a rate unit/);
    expect(() => computeDose({ ...base, geometry: { areaM2: 0 } })).toThrow(/computeDose: geometry.areaM2/);
    expect(() => computeDose({ ...base, basis: 'concentration' })).toThrow(/incorporationDepthCm/);
    expect(() => computeDose({ ...base, basis: 'concentration', incorporationDepthCm: 15 })).toThrow(/soilVolumeL/);
    expect(() => computeDose({ ...base, basis: 'volume' as never })).toThrow(/basis/);
    expect(() => computeDose({ ...base, purity: 0 })).toThrow(/purity/);
    expect(() => computeDose({ ...base, purity: 1.2 })).toThrow(/purity/);
    expect(() => computeDose({ ...base, moistureFraction: 1 })).toThrow(/moistureFraction/);
    expect(() => computeDose({ ...base, bulkDensityKgPerL: 0 })).toThrow(/bulkDensityKgPerL/);
    expect(() => computeDose({ ...base, unit: 'in', purity: 0.5 })).toThrow(/purity must be left out/);
    expect(() => computeDose({ ...base, rate: Number.NaN })).toThrow(RangeError);
  });
});

describe('trialTotal (arithmetic; pound from NIST SP 811)', () => {
  it('multiplies by plots and adds the margin', () => {
    const total = trialTotal({ dosePerPlotGrams: 290.3, plots: 12, marginPercent: 10 });
    expect(total.netGrams).toBeCloseTo(3_483.6, 9);
    expect(total.marginGrams).toBeCloseTo(348.36, 9);
    expect(total.grams).toBeCloseTo(3_831.96, 9);
    expect(total.kilograms).toBeCloseTo(3.83196, 12);
    expect(total.pounds).toBeCloseTo(3_831.96 / 453.59237, 12);
    expect(Object.isFrozen(total)).toBe(true);
  });

  it('defaults the margin to 0', () => {
    expect(trialTotal({ dosePerPlotGrams: 13.8, plots: 4 }).grams).toBeCloseTo(55.2, 12);
  });

  it('throws RangeError naming the field', () => {
    expect(() => trialTotal({ dosePerPlotGrams: -1, plots: 4 })).toThrow(/trialTotal: dosePerPlotGrams/);
    expect(() => trialTotal({ dosePerPlotGrams: 1, plots: 0 })).toThrow(/trialTotal: plots must be a whole number/);
    expect(() => trialTotal({ dosePerPlotGrams: 1, plots: 2.5 })).toThrow(/plots/);
    expect(() => trialTotal({ dosePerPlotGrams: 1, plots: 2, marginPercent: -5 })).toThrow(/marginPercent/);
  });
});
