import type { DoseRequest, RateBasis, RateUnitId } from '@friable/contracts';
import { computeDose, EXACT_FACTORS, type DoseInput, type PlotGeometry } from '@friable/field';
import { parseNumberInput } from '../../../lib/format';

export type GeometryMode = 'area' | 'rectangle' | 'round';
/** Plot sides in metres or feet; container diameters in centimetres or inches; areas in m² or ft². */
export type LengthUnit = 'm' | 'ft';
export type DiameterUnit = 'cm' | 'in';
export type AreaUnit = 'm2' | 'ft2';

const metresPer: Record<LengthUnit, number> = { m: 1, ft: EXACT_FACTORS.metresPerFoot };
const centimetresPer: Record<DiameterUnit, number> = { cm: 1, in: 2.54 };
const squareMetresPer: Record<AreaUnit, number> = { m2: 1, ft2: EXACT_FACTORS.squareMetresPerSquareFoot };

/** What the Rate calculator's boxes hold, as typed. */
export interface DoseFormState {
  rate: string;
  unit: RateUnitId;
  basis: RateBasis;
  depthCm: string;
  geometry: GeometryMode;
  area: string;
  areaUnit: AreaUnit;
  length: string;
  width: string;
  lengthUnit: LengthUnit;
  diameter: string;
  diameterUnit: DiameterUnit;
  soilVolumeL: string;
  purityPercent: string;
  moisturePercent: string;
  materialKind: 'gypsum' | 'other';
  plots: string;
  marginPercent: string;
}

export const initialDoseForm: DoseFormState = {
  rate: '40',
  unit: 'lb/1000ft2',
  basis: 'area',
  depthCm: '15',
  geometry: 'rectangle',
  area: '',
  areaUnit: 'm2',
  length: '1.2',
  width: '1.2',
  lengthUnit: 'm',
  diameter: '30',
  diameterUnit: 'cm',
  soilVolumeL: '',
  purityPercent: '',
  moisturePercent: '',
  materialKind: 'gypsum',
  plots: '4',
  marginPercent: '10',
};

const positive = (value: number | null): value is number => value !== null && Number.isFinite(value) && value > 0;

/**
 * Turns the boxes into a request for POST /api/rates/dose, or null while something needed is
 * missing; `missing` names it in words.
 */
export function doseRequestFrom(form: DoseFormState): { request: DoseRequest | null; missing: string | null } {
  const rate = parseNumberInput(form.rate);
  if (rate === null) return { request: null, missing: 'Type a rate.' };
  if (!Number.isFinite(rate)) return { request: null, missing: 'Check the rate box: see the note under it.' };
  const request: DoseRequest = { rate, unit: form.unit, basis: form.basis, materialKind: form.materialKind };
  if (form.geometry === 'area') {
    const area = parseNumberInput(form.area);
    if (!positive(area)) return { request: null, missing: 'Type the plot’s surface area.' };
    request.areaM2 = area * squareMetresPer[form.areaUnit];
  } else if (form.geometry === 'rectangle') {
    const length = parseNumberInput(form.length);
    const width = parseNumberInput(form.width);
    if (!positive(length) || !positive(width)) return { request: null, missing: 'Type the plot’s length and width.' };
    request.lengthM = length * metresPer[form.lengthUnit];
    request.widthM = width * metresPer[form.lengthUnit];
  } else {
    const diameter = parseNumberInput(form.diameter);
    if (!positive(diameter)) return { request: null, missing: 'Type the container’s inside diameter.' };
    request.diameterCm = diameter * centimetresPer[form.diameterUnit];
  }
  if (form.basis === 'concentration') {
    const depth = parseNumberInput(form.depthCm);
    const volume = parseNumberInput(form.soilVolumeL);
    if (!positive(depth) || !positive(volume)) return { request: null, missing: 'For a concentration rate, type the incorporation depth and the soil volume.' };
    request.depthCm = depth;
    request.soilVolumeL = volume;
  }
  const purity = parseNumberInput(form.purityPercent);
  if (purity !== null) request.purity = purity / 100;
  const moisture = parseNumberInput(form.moisturePercent);
  if (moisture !== null) request.moistureFraction = moisture / 100;
  const plots = parseNumberInput(form.plots);
  if (plots !== null && Number.isFinite(plots)) request.plots = plots;
  const margin = parseNumberInput(form.marginPercent);
  if (margin !== null && Number.isFinite(margin)) request.marginPercent = margin;
  return { request, missing: null };
}

/** The same request worked out in the browser with @friable/field, for an answer while typing. */
export function localDose(request: DoseRequest): { grams: number | null; litres: number | null; kilograms: number | null; ounces: number | null; pounds: number | null; gallons: number | null; areaM2: number; warnings: readonly string[] } | { error: string } {
  const geometry: PlotGeometry =
    request.areaM2 !== undefined ? { areaM2: request.areaM2 } : request.diameterCm !== undefined ? { diameterCm: request.diameterCm } : { lengthM: request.lengthM ?? 0, widthM: request.widthM ?? 0 };
  const input: DoseInput = {
    rate: request.rate,
    unit: request.unit,
    basis: request.basis,
    geometry,
    incorporationDepthCm: request.depthCm,
    soilVolumeL: request.soilVolumeL,
    purity: request.purity,
    moistureFraction: request.moistureFraction,
    materialKind: request.materialKind,
  };
  try {
    return computeDose(input);
  } catch (error) {
    return { error: error instanceof Error ? error.message : 'These numbers cannot be worked out.' };
  }
}
