import type { DoseAnswer, PlotAmount, PlotGeometryInput, Treatment } from '@friable/contracts';
import { computeDose, trialTotal, type DoseInput } from '@friable/field';
import { fieldGeometry } from '../sites/site.presenter';

/** The soil volume of one container: as given, or surface area × container depth (1 m² × 1 cm = 10 L). */
export function containerSoilVolumeL(geometry: PlotGeometryInput, areaM2: number): number | undefined {
  if (geometry.soilVolumeL !== null) return geometry.soilVolumeL;
  return geometry.containerDepthCm !== null ? areaM2 * geometry.containerDepthCm * 10 : undefined;
}

type RateFields = Pick<Treatment, 'rateValue' | 'rateUnit' | 'rateBasis' | 'incorporationDepthCm' | 'purity' | 'moistureBasis' | 'moistureFraction' | 'materialKind'>;

/** The Rate calculator's input for one treatment (or factor level) on one site's plot, or null for one without a rate. */
export function doseInputFor(treatment: RateFields, geometry: PlotGeometryInput, areaM2: number): DoseInput | null {
  if (treatment.rateValue === null || treatment.rateUnit === null) return null;
  return {
    rate: treatment.rateValue,
    unit: treatment.rateUnit,
    basis: treatment.rateBasis,
    geometry: fieldGeometry(geometry),
    ...(treatment.rateBasis === 'concentration'
      ? { incorporationDepthCm: treatment.incorporationDepthCm ?? undefined, soilVolumeL: containerSoilVolumeL(geometry, areaM2) }
      : {}),
    ...(treatment.purity !== null ? { purity: treatment.purity } : {}),
    ...(treatment.moistureBasis === 'dry' && treatment.moistureFraction !== null ? { moistureFraction: treatment.moistureFraction } : {}),
    materialKind: treatment.materialKind,
  };
}

/**
 * Plot amount — how much of a treatment's material one plot of a site gets, and the site's total.
 * Uses @friable/field's computeDose (per plot) and trialTotal (all the site's plots, with the margin);
 * litres are scaled the same way for depth rates. A rate the calculator cannot use (e.g. a rate per
 * soil volume at a site without a container volume) gives perPlot null with the reason in `problem`.
 */
export function plotAmount(
  site: { id: number; areaM2: number } & PlotGeometryInput,
  treatment: Treatment,
  plots: number,
  marginPercent: number,
): PlotAmount & { problem?: string } {
  const base = { siteId: site.id, treatmentId: treatment.id, treatmentCode: treatment.code, plots };
  const { perUnit: perPlot, siteTotal, problem } = unitAmount(doseInputFor(treatment, site, site.areaM2), plots, marginPercent);
  return { ...base, perPlot, siteTotal, ...(problem ? { problem } : {}) };
}

/**
 * Unit amount — the Rate calculator's answer for one unit (a plot, or a split plot's whole plot) and for `units`
 * of them with the margin; null amounts for nothing to apply, and the calculator's sentence when it cannot work.
 */
export function unitAmount(input: DoseInput | null, units: number, marginPercent: number): { perUnit: DoseAnswer | null; siteTotal: PlotAmount['siteTotal']; problem?: string } {
  if (!input) return { perUnit: null, siteTotal: null };
  let dose;
  try {
    dose = computeDose(input);
  } catch (error) {
    return { perUnit: null, siteTotal: null, problem: error instanceof Error ? error.message : String(error) };
  }
  const perUnit: DoseAnswer = { ...dose, ratePerM2: { ...dose.ratePerM2 }, warnings: [...dose.warnings] };
  if (units < 1) return { perUnit, siteTotal: null };
  const grams = dose.grams === null ? null : trialTotal({ dosePerPlotGrams: dose.grams, plots: units, marginPercent }).grams;
  const litres = dose.litres === null ? null : dose.litres * units * (1 + marginPercent / 100);
  return { perUnit, siteTotal: { grams, litres } };
}

/**
 * The dose input for a factor level on its applied unit: `plotsPerUnit` plots side by side (a whole plot of a split
 * plot holds its sub plots), so the surface (and a container's soil volume) is the plot's times that many.
 */
export function levelDoseInput(level: RateFields, site: { areaM2: number } & PlotGeometryInput, plotsPerUnit: number): DoseInput | null {
  const input = doseInputFor(level, site, site.areaM2);
  if (!input || plotsPerUnit === 1) return input;
  return {
    ...input,
    geometry: { areaM2: site.areaM2 * plotsPerUnit },
    ...(input.soilVolumeL !== undefined ? { soilVolumeL: input.soilVolumeL * plotsPerUnit } : {}),
  };
}
