import type { PlotGeometryInput, Site, TrialDesign } from '@friable/contracts';
import { DESIGN_RULES, designWarnings, errorStrata, plotSurfaceAreaM2, type PlotGeometry, type StratumFactor } from '@friable/field';
import { decimalToNumber } from '../common/decimal';
import type { FieldProblem } from '../common/exceptions/field-problems.exception';
import type { SiteRow } from './models/site.model';

/** The geometry in the form @friable/field takes (rectangle or round). */
export function fieldGeometry(g: Pick<PlotGeometryInput, 'shape' | 'lengthM' | 'widthM' | 'diameterCm'>): PlotGeometry {
  return g.shape === 'round' ? { diameterCm: g.diameterCm as number } : { lengthM: g.lengthM as number, widthM: g.widthM as number };
}

export function siteGeometry(row: SiteRow): PlotGeometryInput {
  return {
    shape: row.shape,
    lengthM: decimalToNumber(row.lengthM),
    widthM: decimalToNumber(row.widthM),
    diameterCm: decimalToNumber(row.diameterCm),
    containerDepthCm: decimalToNumber(row.containerDepthCm),
    soilVolumeL: decimalToNumber(row.soilVolumeL),
  };
}

/** Geometry fields a shape needs, each naming the missing field. */
export function geometryProblems(g: PlotGeometryInput): FieldProblem[] {
  if (g.shape === 'round') {
    return g.diameterCm === null ? [{ field: 'diameterCm', message: 'diameterCm is needed for round plots' }] : [];
  }
  return [
    ...(g.lengthM === null ? [{ field: 'lengthM', message: 'lengthM is needed for rectangle plots' }] : []),
    ...(g.widthM === null ? [{ field: 'widthM', message: 'widthM is needed for rectangle plots' }] : []),
  ];
}

export interface SiteContext {
  design: TrialDesign;
  treatmentCount: number;
  /** The trial's factors (name and number of levels), in order; empty for a one-factor design. */
  factors: StratumFactor[];
  plotCount: number;
  hasObservations: boolean;
}

/**
 * The design's guardrails at a site of `blocks` blocks: its warnings and its error strata. A factorial or split
 * plot is judged on its factors once they fit the design; until then a factorial on its combinations, a split
 * plot not at all (its strata need the factors).
 */
export function siteGuardrails(context: Pick<SiteContext, 'design' | 'treatmentCount' | 'factors'>, blocks: number): Pick<Site, 'warnings' | 'strata'> {
  const rule = DESIGN_RULES[context.design];
  const factorsFit = rule.maxFactors > 0 && context.factors.length >= rule.minFactors && context.factors.length <= rule.maxFactors;
  if (rule.split && !factorsFit) return { warnings: [], strata: [] };
  if (!factorsFit && context.treatmentCount === 0) return { warnings: [], strata: [] };
  const input = factorsFit ? { design: context.design, factors: context.factors, blocks } : { design: context.design, treatments: context.treatmentCount, blocks };
  const strata = errorStrata(input).map((stratum) => ({ ...stratum, terms: [...stratum.terms] }));
  return { warnings: [...designWarnings({ ...input, sites: 1 })], strata };
}

/** A site row as the API answers it, with its area and design guardrails. */
export function presentSite(row: SiteRow, context: SiteContext): Site {
  const geometry = siteGeometry(row);
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    location: row.location,
    soilDescription: row.soilDescription,
    ...geometry,
    areaM2: plotSurfaceAreaM2(fieldGeometry(geometry)),
    blocks: row.blocks,
    labelPrefix: row.labelPrefix,
    leadUserId: row.leadUserId,
    leadName: row.lead?.name ?? null,
    randomizedAt: row.randomizedAt?.toISOString() ?? null,
    randomizationSeed: row.randomizationSeed,
    plotCount: context.plotCount,
    hasObservations: context.hasObservations,
    ...siteGuardrails(context, row.blocks),
  };
}
