/**
 * Exact conversion factors — the defined values every Friable conversion is built from.
 *
 * Purpose: one place for the numbers, so units, the Rate calculator and the infiltration
 * arithmetic cannot drift apart. All are exact by definition.
 *
 * Reference: NIST Special Publication 811 (2008), Guide for the Use of the International
 * System of Units, Appendix B (free: https://www.nist.gov/pml/special-publication-811);
 * the 1959 international yard and pound agreement; standard gravity as defined by the
 * 3rd CGPM (1901), used for kilogram-force and pound-force.
 *
 * Throws: nothing (constants).
 *
 * Example: `EXACT_FACTORS.kilogramsPerPound` → 0.45359237
 */
export const EXACT_FACTORS = Object.freeze({
  kilogramsPerPound: 0.45359237,
  metresPerInch: 0.0254,
  metresPerFoot: 0.3048,
  squareMetresPerSquareFoot: 0.09290304,
  squareFeetPerAcre: 43_560,
  squareMetresPerAcre: 4_046.8564224,
  squareMetresPerHectare: 10_000,
  cubicMetresPerCubicYard: 0.764554857984,
  cubicFeetPerCubicYard: 27,
  litresPerUsGallon: 3.785411784,
  poundsPerShortTon: 2_000,
  kilogramsPerShortTon: 907.18474,
  kilogramsPerTonne: 1_000,
  ouncesPerPound: 16,
  standardGravityMetresPerSecondSquared: 9.80665,
});
