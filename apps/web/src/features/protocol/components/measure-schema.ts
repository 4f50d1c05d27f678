import { MEASURE_KINDS, type Measure, type MeasureKind } from '@friable/contracts';
import { z } from 'zod';
import { parseNumberInput, numberInputText } from '../../../lib/format';
import { checkNumberTexts, numberTexts } from '../../../lib/form-rules';
import type { MeasureBody, MeasureUnitId } from '../api/save-measure';

const numberLabels = {
  scaleMin: 'Lowest score',
  scaleMax: 'Highest score',
  cutoff: 'Cut-off',
  plausibleMin: 'Plausible minimum',
  plausibleMax: 'Plausible maximum',
  hardMin: 'Hard minimum',
  hardMax: 'Hard maximum',
  decimals: 'Decimals',
};

/** The number boxes a measure of this kind shows: a score's scale, a timed measure's cut-off, and the ranges. */
function shownNumbers(kind: MeasureKind): Partial<typeof numberLabels> {
  const { scaleMin, scaleMax, cutoff, ...always } = numberLabels;
  return { ...(kind === 'score' ? { scaleMin, scaleMax } : {}), ...(kind === 'time-with-cutoff' ? { cutoff } : {}), ...always };
}

/** A measure as its dialog holds it (numbers as typed, the direction '' until answered), read into the body the API takes. */
export const measureSchema = z
  .object({
    code: z.string(),
    name: z.string(),
    unit: z.string(),
    kind: z.enum(MEASURE_KINDS),
    scaleMin: z.string(),
    scaleMax: z.string(),
    cutoff: z.string(),
    plausibleMin: z.string(),
    plausibleMax: z.string(),
    hardMin: z.string(),
    hardMax: z.string(),
    decimals: z.string(),
    higherIsBetter: z.enum(['', 'higher', 'lower']),
  })
  .superRefine((values, ctx) => checkNumberTexts(values, shownNumbers(values.kind), ctx))
  .transform(
    (v): MeasureBody => ({
      code: v.code.trim(),
      name: v.name.trim(),
      unit: v.unit as MeasureUnitId,
      kind: v.kind,
      scaleMin: v.kind === 'score' ? parseNumberInput(v.scaleMin) : null,
      scaleMax: v.kind === 'score' ? parseNumberInput(v.scaleMax) : null,
      cutoff: v.kind === 'time-with-cutoff' ? parseNumberInput(v.cutoff) : null,
      plausibleMin: parseNumberInput(v.plausibleMin),
      plausibleMax: parseNumberInput(v.plausibleMax),
      hardMin: parseNumberInput(v.hardMin),
      hardMax: parseNumberInput(v.hardMax),
      decimals: parseNumberInput(v.decimals) ?? 0,
      // Without an answer the direction is left out, and the server's refusal is shown beside the question.
      ...(v.higherIsBetter === '' ? {} : { higherIsBetter: v.higherIsBetter === 'higher' }),
    }) as MeasureBody,
  );
export type MeasureValues = z.input<typeof measureSchema>;

/** What the dialog starts with: the measure's own values, or a new measure's (seconds, continuous, one decimal, no direction). */
export function measureValues(measure: Measure | null): MeasureValues {
  const direction = measure?.higherIsBetter;
  return {
    code: measure?.code ?? '',
    name: measure?.name ?? '',
    unit: measure?.unit ?? 's',
    kind: measure?.kind ?? 'continuous',
    ...numberTexts(measure, ['scaleMin', 'scaleMax', 'cutoff', 'plausibleMin', 'plausibleMax', 'hardMin', 'hardMax']),
    decimals: numberInputText(measure?.decimals ?? 1),
    higherIsBetter: direction === true ? 'higher' : direction === false ? 'lower' : '',
  };
}
