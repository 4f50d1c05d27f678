import type { DoseAnswer, PlotAmount, PlotGeometryInput, Treatment } from '@friable/contracts';
import { computeDose, trialTotal, type DoseInput } from '@friable/field';
import { fieldGeometry } from '../sites/site.presenter';

/** The soil volume of one container: as given, or surface area × container depth (1 m² × 1 cm = 10 L). */
export function containerSoilVolumeL(geometry: PlotGeometryInput, areaM2: number): number | undefined {
  if (geometry.soilVolumeL !== null) return geometry.soilVolumeL;
  return geometry.containerDepthCm !== null ? areaM2 * geometry.containerDepthCm * 10 : undefined;
}

/** The Rate calculator's input for one treatment on one site's plot, or null for a treatment without a rate. */
export function doseInputFor(treatment: Treatment, geometry: PlotGeometryInput, areaM2: number): DoseInput | null {
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
  const input = doseInputFor(treatment, site, site.areaM2);
  if (!input) return { ...base, perPlot: null, siteTotal: null };
  let dose;
  try {
    dose = computeDose(input);
  } catch (error) {
    return { ...base, perPlot: null, siteTotal: null, problem: error instanceof Error ? error.message : String(error) };
  }
  const perPlot: DoseAnswer = { ...dose, ratePerM2: { ...dose.ratePerM2 }, warnings: [...dose.warnings] };
  if (plots < 1) return { ...base, perPlot, siteTotal: null };
  const grams = dose.grams === null ? null : trialTotal({ dosePerPlotGrams: dose.grams, plots, marginPercent }).grams;
  const litres = dose.litres === null ? null : dose.litres * plots * (1 + marginPercent / 100);
  return { ...base, perPlot, siteTotal: { grams, litres } };
}
