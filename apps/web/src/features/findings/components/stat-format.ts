import { formatNumber } from '../../../lib/format';

const significant = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 });

/**
 * A statistic for people: four significant digits below 1,000 (0.008889, 14.44), whole and grouped
 * above (12,346); "—" where the answer has no value (an untested term's F).
 */
export function formatStatistic(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (Math.abs(value) >= 1000) return formatNumber(value, 0);
  return significant.format(value);
}

/** A p-value with three significant digits, or "< 0.0001" for smaller ones. */
export function formatP(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '—';
  if (p < 0.0001) return '< 0.0001';
  return Number(p.toPrecision(3)).toString();
}

/** "p = 0.0314" or "p < 0.0001", for a sentence. */
export function pClause(p: number | null | undefined): string {
  const text = formatP(p);
  return text.startsWith('<') ? `p ${text}` : `p = ${text}`;
}

/** Friable's significance marks, strongest first; the legend beside every table lists them. */
export const significanceMarks = [
  { below: 0.001, mark: '***', words: 'p < 0.001' },
  { below: 0.01, mark: '**', words: 'p < 0.01' },
  { below: 0.05, mark: '*', words: 'p < 0.05' },
  { below: 0.1, mark: '·', words: 'p < 0.1' },
] as const;

/** "***" for p < 0.001 … "·" for p < 0.1, "ns" above, "" where there is no test. */
export function significanceMark(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '';
  return significanceMarks.find((entry) => p < entry.below)?.mark ?? 'ns';
}

/** A mean or difference with the measure's decimals plus one, so close means stay apart. */
export function formatMeasureValue(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return formatNumber(value, decimals + 1, Math.min(decimals + 1, 2));
}

export const termLabels: Record<string, string> = {
  treatment: 'Treatments',
  block: 'Blocks',
  site: 'Sites',
  'block:site': 'Blocks within sites',
  'site:treatment': 'Site × treatment',
  error: 'Error',
  total: 'Total',
};

/** "Blocks", or a factorial's own names: "Spacing × Density" for "spacing:density". */
export function termLabel(term: string): string {
  if (termLabels[term]) return termLabels[term]!;
  return term
    .split(':')
    .map((part) => part.charAt(0).toUpperCase() + part.slice(1))
    .join(' × ');
}

export const methodLabels: Record<string, string> = {
  lsd: "Fisher's protected LSD",
  tukey: "Tukey's HSD",
  dunnett: "Dunnett's test against the control",
  bonferroni: 'Bonferroni-adjusted t tests',
  holm: 'Holm-adjusted t tests',
};

export const transformLabels: Record<string, string> = {
  none: 'None',
  log: 'Logarithm',
  sqrt: 'Square root',
  'arcsine-sqrt': 'Arcsine of the square root',
};

/** Rows in the protocol's treatment order (control and amendments as the investigator listed them); others after, as they came. */
export function inProtocolOrder<T extends { treatment: string }>(rows: readonly T[], codes: readonly string[]): T[] {
  const rank = new Map(codes.map((code, index) => [code, index]));
  return rows
    .map((row, index) => ({ row, index }))
    .sort((a, b) => (rank.get(a.row.treatment) ?? codes.length + a.index) - (rank.get(b.row.treatment) ?? codes.length + b.index))
    .map(({ row }) => row);
}
