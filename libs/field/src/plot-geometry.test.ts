import { describe, expect, it } from 'vitest';
import { plotSurfaceAreaM2 } from './plot-geometry';

describe('plotSurfaceAreaM2', () => {
  it('multiplies length by width (DOMAIN.md: 1.2 m × 1.2 m plot)', () => {
    expect(plotSurfaceAreaM2({ lengthM: 1.2, widthM: 1.2 })).toBeCloseTo(1.44, 12);
  });

  it('uses π(D/2)² for a round container (DOMAIN.md: 30 cm pot)', () => {
    // π × 0.15² = 0.0706858 m², computed from the formula.
    expect(plotSurfaceAreaM2({ diameterCm: 30 })).toBeCloseTo(0.0706858, 7);
  });

  it('passes a known area through', () => {
    expect(plotSurfaceAreaM2({ areaM2: 2.5 })).toBe(2.5);
  });

  it('throws RangeError naming the field for non-positive sizes', () => {
    expect(() => plotSurfaceAreaM2({ diameterCm: 0 })).toThrow(RangeError);
    expect(() => plotSurfaceAreaM2({ diameterCm: 0 })).toThrow(/plotSurfaceAreaM2: geometry.diameterCm must be/);
    expect(() => plotSurfaceAreaM2({ lengthM: 2, widthM: -1 })).toThrow(/geometry.widthM/);
    expect(() => plotSurfaceAreaM2({ areaM2: Number.POSITIVE_INFINITY })).toThrow(/geometry.areaM2/);
  });

  it('throws RangeError for a geometry that mixes or lacks shapes', () => {
    const mixed = { areaM2: 1, diameterCm: 30 };
    expect(() => plotSurfaceAreaM2(mixed)).toThrow(/exactly one of/);
    expect(() => plotSurfaceAreaM2({} as never)).toThrow(RangeError);
    expect(() => plotSurfaceAreaM2({ lengthM: 2 } as never)).toThrow(/geometry.widthM/);
  });
});
