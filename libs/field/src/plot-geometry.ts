import { invalidInput, requirePositive } from './checks';

/** A plot's or container's soil surface: a known area, a round container, or a rectangle. */
export type PlotGeometry =
  | { readonly areaM2: number }
  | { readonly diameterCm: number }
  | { readonly lengthM: number; readonly widthM: number };

/** Shared by the functions that take a geometry, so errors name the function called. */
export function surfaceAreaFor(functionName: string, geometry: PlotGeometry): number {
  const given = geometry as Partial<Record<'areaM2' | 'diameterCm' | 'lengthM' | 'widthM', unknown>>;
  const shapes = [
    given.areaM2 !== undefined,
    given.diameterCm !== undefined,
    given.lengthM !== undefined || given.widthM !== undefined,
  ].filter(Boolean).length;
  if (shapes !== 1) {
    throw invalidInput(
      functionName,
      'geometry',
      'exactly one of {areaM2}, {diameterCm} or {lengthM, widthM}',
      geometry,
    );
  }
  if (given.areaM2 !== undefined) return requirePositive(functionName, 'geometry.areaM2', given.areaM2);
  if (given.diameterCm !== undefined) {
    const radiusM = requirePositive(functionName, 'geometry.diameterCm', given.diameterCm) / 200;
    return Math.PI * radiusM ** 2;
  }
  return (
    requirePositive(functionName, 'geometry.lengthM', given.lengthM) *
    requirePositive(functionName, 'geometry.widthM', given.widthM)
  );
}

/**
 * Plot surface area — the soil surface of a plot or container in square metres.
 *
 * Purpose: a per-area rate is scaled by this area. Rectangle: length × width. Round
 * container: π·(D/2)² with D the inside diameter at the soil surface (not the rim's outside,
 * and not the base of a tapered pot).
 * Reference: DOMAIN.md, "Rate arithmetic the Rate calculator must do".
 * Throws: RangeError when a size is not a finite number above 0, or when the geometry mixes
 * or omits shapes.
 * Example: `plotSurfaceAreaM2({ diameterCm: 30 })` → 0.07068583470577035
 */
export function plotSurfaceAreaM2(geometry: PlotGeometry): number {
  return surfaceAreaFor('plotSurfaceAreaM2', geometry);
}
