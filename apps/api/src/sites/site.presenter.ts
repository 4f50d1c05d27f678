import type { PlotGeometryInput, Site, TrialDesign } from '@friable/contracts';
import { designWarnings, plotSurfaceAreaM2, type PlotGeometry } from '@friable/field';
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
  plotCount: number;
  hasObservations: boolean;
}

/** A site row as the API answers it, with its area and design guardrails. */
export function presentSite(row: SiteRow, context: SiteContext): Site {
  const geometry = siteGeometry(row);
  return {
    id: row.id,
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
    warnings:
      context.treatmentCount === 0
        ? []
        : [...designWarnings({ design: context.design, treatments: context.treatmentCount, blocks: row.blocks, sites: 1 })],
  };
}
