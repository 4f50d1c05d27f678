import { describe, expect, it } from 'vitest';
import { infiltrationRate } from './infiltration';

// Tolerances: toBeCloseTo(expected, d) passes when |error| < 0.5·10^-d (decimals as printed).
describe('infiltrationRate (USDA-NRCS Soil Quality Test Kit Guide, via DOMAIN.md "Single-ring infiltration")', () => {
  it('444 mL in a 5.875 in ring, drained in 12 min → 127 mm/h = 5.0 in/h', () => {
    const result = infiltrationRate({ volumeMl: 444, ringInsideDiameterIn: 5.875, minutes: 12 });
    expect(result.mmPerHour).toBeCloseTo(127, 0);
    expect(result.inchesPerHour).toBeCloseTo(5.0, 1);
    expect(result.depthAppliedIn).toBeCloseTo(1, 2); // "444 mL is 1 in for ID ≈ 5.87 in"
  });

  it('463 mL ≈ 1 in of water for a 6.00 in ring', () => {
    const result = infiltrationRate({ volumeMl: 463, ringInsideDiameterIn: 6, minutes: 10 });
    expect(result.depthAppliedIn).toBeCloseTo(1, 2);
  });

  it('for exactly 1 in applied, in/h = 60 / t(min) (DOMAIN.md)', () => {
    // Volume of exactly 1 in in a 15 cm ring: π × 7.5² cm² × 2.54 cm, computed from the formula.
    const volumeMl = Math.PI * 7.5 ** 2 * 2.54;
    const result = infiltrationRate({ volumeMl, ringInsideDiameterCm: 15, minutes: 8 });
    expect(result.depthAppliedCm).toBeCloseTo(2.54, 12);
    expect(result.inchesPerHour).toBeCloseTo(60 / 8, 12);
  });

  it('gives the same answer for a diameter in cm and in inches', () => {
    const inches = infiltrationRate({ volumeMl: 444, ringInsideDiameterIn: 5.875, minutes: 12 });
    const centimetres = infiltrationRate({ volumeMl: 444, ringInsideDiameterCm: 5.875 * 2.54, minutes: 12 });
    expect(centimetres.mmPerHour).toBeCloseTo(inches.mmPerHour, 12);
    expect(Object.isFrozen(inches)).toBe(true);
  });

  it('throws RangeError naming the field', () => {
    expect(() => infiltrationRate({ volumeMl: 0, ringInsideDiameterIn: 6, minutes: 5 })).toThrow(/infiltrationRate: volumeMl/);
    expect(() => infiltrationRate({ volumeMl: 444, ringInsideDiameterIn: 6, minutes: 0 })).toThrow(/minutes/);
    expect(() => infiltrationRate({ volumeMl: 444, ringInsideDiameterCm: -15, minutes: 5 })).toThrow(/ringInsideDiameterCm/);
    expect(() => infiltrationRate({ volumeMl: 444, minutes: 5 } as never)).toThrow(RangeError);
    expect(() =>
      infiltrationRate({ volumeMl: 444, minutes: 5, ringInsideDiameterCm: 15, ringInsideDiameterIn: 6 } as never),
    ).toThrow(/one of the two/);
  });
});
