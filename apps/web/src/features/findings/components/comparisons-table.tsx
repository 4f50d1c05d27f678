import type { AnovaAnswer, SeparationMethod } from '@friable/contracts';
import { SignificanceLegend } from './anova-table';
import { FindingsTable, numeric } from './findings-table';
import { formatMeasureValue, formatP, formatStatistic, methodLabels, significanceMark } from './stat-format';

/** The line under the table naming the smallest difference that counts; "least significant difference" only for LSD. */
const SMALLEST_DIFFERENCE: Record<SeparationMethod, string | null> = {
  lsd: 'Least significant difference (LSD)',
  tukey: 'Honestly significant difference (HSD)',
  dunnett: 'Smallest difference from the control that counts (Dunnett)',
  bonferroni: 'Smallest difference that counts (Bonferroni)',
  holm: null,
};

/** "HL-G40 better", "no difference shown": the verdict of one pair in the measure's own direction. */
export function pairVerdict(pair: { a: string; b: string; diff: number; significant: boolean }, higherIsBetter: boolean | undefined): string {
  if (!pair.significant) return 'no difference shown';
  if (higherIsBetter === undefined) return pair.diff > 0 ? `${pair.a} higher` : `${pair.b} higher`;
  const aBetter = higherIsBetter ? pair.diff > 0 : pair.diff < 0;
  return `${aBetter ? pair.a : pair.b} better`;
}

/** Every pair the chosen method compares: the difference, its confidence interval, p and the verdict (which is better, in the measure's direction). */
export function ComparisonsTable({
  answer,
  method,
  alpha,
  decimals,
  higherIsBetter,
}: {
  answer: AnovaAnswer;
  method: SeparationMethod;
  alpha: number;
  decimals: number;
  /** The measure's direction; absent (a quick analysis): the verdict says which is higher. */
  higherIsBetter?: boolean;
}) {
  const comparisons = answer.comparisons[method];
  if (!comparisons) return null;
  const confidence = `${formatStatistic(100 * (1 - alpha))} %`;
  return (
    <section className="fr-findings-block" aria-labelledby="fr-pairs-title">
      <h3 id="fr-pairs-title" className="fr-findings-heading">
        Comparisons ({methodLabels[method]})
      </h3>
      <FindingsTable label="Comparisons" columns={['Pair', numeric('Difference'), numeric(`${confidence} interval`), numeric('p'), 'Verdict']}>
        {comparisons.pairs.map((pair) => (
          <tr key={`${pair.a}|${pair.b}`}>
            <th scope="row" className="fr-findings-pair">
              <span className="fr-code">{pair.a}</span> − <span className="fr-code">{pair.b}</span>
            </th>
            <td className="fr-num">{formatMeasureValue(pair.diff, decimals)}</td>
            <td className="fr-num">
              {formatMeasureValue(pair.lower, decimals)} to {formatMeasureValue(pair.upper, decimals)}
            </td>
            <td className="fr-num">
              {formatP(pair.p)} <span className="fr-findings-mark">{significanceMark(pair.p)}</span>
            </td>
            <td>{pairVerdict(pair, higherIsBetter)}</td>
          </tr>
        ))}
      </FindingsTable>
      <SignificanceLegend />
      {higherIsBetter !== undefined && <p className="fr-muted fr-small">{higherIsBetter ? 'Higher values are better for this measure.' : 'Lower values are better for this measure.'}</p>}
      {comparisons.leastSignificantDifference !== null && SMALLEST_DIFFERENCE[method] && (
        <p className="fr-muted fr-small">
          {SMALLEST_DIFFERENCE[method]} at α = {formatStatistic(alpha)}: {formatMeasureValue(comparisons.leastSignificantDifference, decimals)}.
        </p>
      )}
    </section>
  );
}
