import type { Site, SiteInput } from '@friable/contracts';
import { z } from 'zod';
import { numberInputText, parseNumberInput } from '../../../lib/format';
import { checkNumberTexts, numberTexts } from '../../../lib/form-rules';

/** A site as its dialog holds it (numbers as typed, the lead as the select's text), read into the body the API takes. */
export const siteSchema = z
  .object({
    name: z.string(),
    location: z.string(),
    soilDescription: z.string(),
    shape: z.enum(['rectangle', 'round']),
    lengthM: z.string(),
    widthM: z.string(),
    diameterCm: z.string(),
    containerDepthCm: z.string(),
    soilVolumeL: z.string(),
    blocks: z.string(),
    labelPrefix: z.string(),
    leadUserId: z.string(),
  })
  .superRefine((v, ctx) =>
    checkNumberTexts(
      v,
      {
        ...(v.shape === 'rectangle' ? { lengthM: 'Length', widthM: 'Width' } : { diameterCm: 'Inside diameter' }),
        containerDepthCm: 'Container depth',
        soilVolumeL: 'Soil volume',
        blocks: 'Blocks',
      },
      ctx,
    ),
  )
  .transform(
    (v): SiteInput => ({
      name: v.name.trim(),
      location: v.location.trim() || null,
      soilDescription: v.soilDescription.trim() || null,
      shape: v.shape,
      lengthM: v.shape === 'rectangle' ? parseNumberInput(v.lengthM) : null,
      widthM: v.shape === 'rectangle' ? parseNumberInput(v.widthM) : null,
      diameterCm: v.shape === 'round' ? parseNumberInput(v.diameterCm) : null,
      containerDepthCm: parseNumberInput(v.containerDepthCm),
      soilVolumeL: parseNumberInput(v.soilVolumeL),
      blocks: parseNumberInput(v.blocks) ?? 0,
      labelPrefix: v.labelPrefix.trim().toUpperCase(),
      leadUserId: v.leadUserId ? Number(v.leadUserId) : null,
    }),
  );
export type SiteValues = z.input<typeof siteSchema>;

/** What the dialog starts with: the site's own values, or a new site's (rectangular plots, 4 blocks, no lead yet). */
export function siteValues(site: Site | null): SiteValues {
  return {
    name: site?.name ?? '',
    location: site?.location ?? '',
    soilDescription: site?.soilDescription ?? '',
    shape: site?.shape ?? 'rectangle',
    ...numberTexts(site, ['lengthM', 'widthM', 'diameterCm', 'containerDepthCm', 'soilVolumeL']),
    blocks: numberInputText(site?.blocks ?? 4),
    labelPrefix: site?.labelPrefix ?? '',
    leadUserId: site?.leadUserId ? String(site.leadUserId) : '',
  };
}
