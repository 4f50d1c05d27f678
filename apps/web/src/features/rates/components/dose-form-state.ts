import type { DoseRequest, RateBasis, RateUnitId } from '@friable/contracts';
import { computeDose, type DoseInput, type PlotGeometry } from '@friable/field';
import { parseNumberInput } from '../../../lib/format';

export type GeometryMode = 'area' | 'rectangle' | 'round';

/** What the Rate calculator's boxes hold, as typed. */
export interface DoseFormState {
  rate: string;
  unit: RateUnitId;
  basis: RateBasis;
  depthCm: string;
  geometry: GeometryMode;
  areaM2: string;
  lengthM: string;
  widthM: string;
  diameterCm: string;
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
  areaM2: '',
  lengthM: '1.2',
  widthM: '1.2',
  diameterCm: '30',
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
  if (rate === null || !Number.isFinite(rate)) return { request: null, missing: 'Type a rate.' };
  const request: DoseRequest = { rate, unit: form.unit, basis: form.basis, materialKind: form.materialKind };
  if (form.geometry === 'area') {
    const area = parseNumberInput(form.areaM2);
    if (!positive(area)) return { request: null, missing: 'Type the plot’s surface area.' };
    request.areaM2 = area;
  } else if (form.geometry === 'rectangle') {
    const length = parseNumberInput(form.lengthM);
    const width = parseNumberInput(form.widthM);
    if (!positive(length) || !positive(width)) return { request: null, missing: 'Type the plot’s length and width.' };
    request.lengthM = length;
    request.widthM = width;
  } else {
    const diameter = parseNumberInput(form.diameterCm);
    if (!positive(diameter)) return { request: null, missing: 'Type the container’s inside diameter.' };
    request.diameterCm = diameter;
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
  if (plots !== null) request.plots = plots;
  const margin = parseNumberInput(form.marginPercent);
  if (margin !== null) request.marginPercent = margin;
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
