import { numberOrNull, writeNumber } from './number-reading';
import { personDateFormat, personLocale } from './person-locale';

/** "rcbd" → "Randomized complete block", for people rather than machines. */
export const designLabels: Record<string, string> = {
  crd: 'Completely randomized',
  rcbd: 'Randomized complete block',
  'factorial-crd': 'Factorial (2–4 factors), completely randomized',
  'factorial-rcbd': 'Factorial (2–4 factors) in blocks',
  'split-plot': 'Split plot in blocks',
  'split-split-plot': 'Split-split plot in blocks',
};

/** What each design does with the plots, in a sentence, for the design pickers. */
export const designHelp: Record<string, string> = {
  crd: 'Every plot gets its treatment by lot, with no blocks.',
  rcbd: 'Every treatment once in each block, shuffled anew in every block.',
  'factorial-crd': 'Every combination of 2 to 4 factors’ levels is a treatment, placed by lot with no blocks.',
  'factorial-rcbd': 'Every combination of 2 to 4 factors’ levels once in each block.',
  'split-plot': 'One factor on whole beds (whole plots shuffled within blocks), a second on parts of each bed (sub plots shuffled within whole plots).',
  'split-split-plot': 'As a split plot, with a third factor on parts of each sub plot (sub-sub plots shuffled within sub plots).',
};

export const statusLabels: Record<string, string> = {
  draft: 'Draft',
  active: 'Active',
  locked: 'Locked',
  archived: 'Archived',
};

export const roleLabels: Record<string, string> = {
  investigator: 'Investigator',
  collaborator: 'Collaborator',
  reviewer: 'Reviewer',
};

/** A day for people, in their account's locale: "3 Dec 2026" (no locale set, or en-GB), "3. Dez. 2026" (de-DE). */
export function formatDate(iso: string): string {
  return personDateFormat('day', { day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(iso));
}

const numberFormats = new Map<string, Intl.NumberFormat>();

/**
 * A number for people, in their locale: grouped thousands, at most `maxDecimals` decimals (trailing
 * zeros dropped): "1,234.5" for en-US, "1.234,5" for de-DE.
 */
export function formatNumber(value: number, maxDecimals = 2, minDecimals = 0): string {
  const locale = personLocale();
  const key = `${locale}:${minDecimals}:${maxDecimals}`;
  let format = numberFormats.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, { minimumFractionDigits: minDecimals, maximumFractionDigits: maxDecimals });
    numberFormats.set(key, format);
  }
  return format.format(value);
}

/** Decimals that keep about three significant digits for amounts people weigh out (13.8 g, 290 g, 0.64 lb). */
export function amountDecimals(value: number): number {
  const size = Math.abs(value);
  if (size === 0 || size >= 100) return 0;
  if (size >= 10) return 1;
  if (size >= 1) return 2;
  return 3;
}

/** An amount with its unit and three significant digits: "13.8 g", "1,290 g", "0.645 lb". */
export function formatAmount(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return `${formatNumber(value, amountDecimals(value))} ${unit}`;
}

/** A surface area in square metres, with ft² beside it: "1.44 m² (15.5 ft²)". */
export function formatArea(areaM2: number | null | undefined): string {
  if (areaM2 === null || areaM2 === undefined || !Number.isFinite(areaM2)) return '—';
  const squareFeet = areaM2 / 0.09290304;
  return `${formatNumber(areaM2, amountDecimals(areaM2))} m² (${formatNumber(squareFeet, amountDecimals(squareFeet))} ft²)`;
}

/** Rate units as people write them. */
export const rateUnitLabels: Record<string, string> = {
  'lb/100ft2': 'lb / 100 ft²',
  'lb/1000ft2': 'lb / 1,000 ft²',
  'lb/acre': 'lb / acre',
  'g/m2': 'g / m²',
  'kg/m2': 'kg / m²',
  'kg/ha': 'kg / ha',
  't/ha': 't / ha (tonnes)',
  'ton/acre': 'short tons / acre',
  in: 'in deep (layer)',
  cm: 'cm deep (layer)',
  'yd3/1000ft2': 'yd³ / 1,000 ft²',
};

/** A rate with its unit: "40 lb / 1,000 ft²". */
export function formatRate(value: number | null, unit: string | null): string {
  if (value === null || unit === null) return 'none';
  return `${formatNumber(value, 3)} ${rateUnitLabels[unit] ?? unit}`;
}

/** True for a depth or volume rate (a layer of compost), which is measured out in litres. */
export function isVolumeRateUnit(unit: string | null): boolean {
  return unit === 'in' || unit === 'cm' || unit === 'yd3/1000ft2';
}

export const measureKindLabels: Record<string, string> = {
  continuous: 'Continuous',
  count: 'Count',
  score: 'Score',
  'time-with-cutoff': 'Time with cut-off',
};

/**
 * What a person typed into a number box, read by the one shared reading (lib/number-reading) in
 * their locale: null when left empty, NaN when it is not a number or is still ambiguous
 * ("1,000" with a decimal point locale: the box asks which was meant).
 */
export function parseNumberInput(text: string): number | null {
  return numberOrNull(text, personLocale());
}

/** The text a number box starts with, written with the person's decimal mark and no grouping. */
export function numberInputText(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const plain = /e/i.test(String(value)) ? value.toLocaleString('en-US', { useGrouping: false, maximumFractionDigits: 20 }) : String(value);
  return writeNumber(plain, personLocale());
}

/** The amount for one plot in both unit systems: "290 g (10.2 oz)", or "24.5 L (6.47 gal)" for a layer. */
export function formatDoseShort(dose: { grams: number | null; ounces: number | null; litres: number | null; gallons: number | null } | null): string {
  if (!dose) return 'nothing to apply';
  const parts: string[] = [];
  if (dose.grams !== null) parts.push(`${formatAmount(dose.grams, 'g')} (${formatAmount(dose.ounces, 'oz')})`);
  if (dose.litres !== null) parts.push(`${formatAmount(dose.litres, 'L')} (${formatAmount(dose.gallons, 'gal')})`);
  return parts.length ? parts.join(' · ') : 'nothing to apply';
}
