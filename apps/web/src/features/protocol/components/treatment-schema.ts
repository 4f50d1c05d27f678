import { RATE_BASES, RATE_UNIT_IDS, type Treatment, type TreatmentInput } from '@friable/contracts';
import { z } from 'zod';
import { isVolumeRateUnit, numberInputText, parseNumberInput } from '../../../lib/format';
import { checkNumberTexts } from '../../../lib/form-rules';

/** A treatment as its dialog holds it (numbers as typed, purity and water as percents), read into the body the API takes. */
export const treatmentSchema = z
  .object({
    code: z.string(),
    name: z.string(),
    description: z.string(),
    isControl: z.boolean(),
    rateValue: z.string(),
    rateUnit: z.enum(RATE_UNIT_IDS),
    rateBasis: z.enum(RATE_BASES),
    incorporationDepthCm: z.string(),
    product: z.string(),
    purity: z.string(),
    moistureBasis: z.enum(['as-is', 'dry']),
    moistureFraction: z.string(),
    materialKind: z.enum(['gypsum', 'other']),
  })
  .superRefine((v, ctx) => {
    // The boxes a control, an area rate or a volume unit hide are not read.
    if (v.isControl) return;
    const volume = isVolumeRateUnit(v.rateUnit);
    checkNumberTexts(
      v,
      {
        rateValue: 'Rate',
        ...(v.rateBasis === 'concentration' ? { incorporationDepthCm: 'Incorporation depth' } : {}),
        ...(volume ? {} : { purity: 'Purity' }),
        ...(!volume && v.moistureBasis === 'dry' ? { moistureFraction: 'Water share' } : {}),
      },
      ctx,
    );
  })
  .transform((v): TreatmentInput => {
    const rateValue = parseNumberInput(v.rateValue);
    const hasRate = !v.isControl && rateValue !== null;
    const volume = isVolumeRateUnit(v.rateUnit);
    const purity = parseNumberInput(v.purity);
    const moisture = parseNumberInput(v.moistureFraction);
    return {
      code: v.code.trim(),
      name: v.name.trim(),
      description: v.description.trim() || null,
      isControl: v.isControl,
      rateValue: hasRate ? rateValue : null,
      rateUnit: hasRate ? v.rateUnit : null,
      rateBasis: v.rateBasis,
      incorporationDepthCm: hasRate && v.rateBasis === 'concentration' ? parseNumberInput(v.incorporationDepthCm) : null,
      product: v.product.trim() || null,
      purity: hasRate && !volume && purity !== null ? purity / 100 : null,
      moistureBasis: volume ? 'as-is' : v.moistureBasis,
      moistureFraction: hasRate && !volume && v.moistureBasis === 'dry' && moisture !== null ? moisture / 100 : null,
      materialKind: v.materialKind,
    };
  });
export type TreatmentValues = z.input<typeof treatmentSchema>;

/** What the dialog starts with: the treatment's own values, or a new one's (an area rate in lb per 1,000 ft² of some other material). */
export function treatmentValues(treatment: Treatment | null): TreatmentValues {
  return {
    code: treatment?.code ?? '',
    name: treatment?.name ?? '',
    description: treatment?.description ?? '',
    isControl: treatment?.isControl ?? false,
    rateValue: numberInputText(treatment?.rateValue),
    rateUnit: treatment?.rateUnit ?? 'lb/1000ft2',
    rateBasis: treatment?.rateBasis ?? 'area',
    incorporationDepthCm: numberInputText(treatment?.incorporationDepthCm),
    product: treatment?.product ?? '',
    purity: treatment?.purity != null ? String(treatment.purity * 100) : '',
    moistureBasis: treatment?.moistureBasis ?? 'as-is',
    moistureFraction: treatment?.moistureFraction != null ? String(treatment.moistureFraction * 100) : '',
    materialKind: treatment?.materialKind ?? 'other',
  };
}
