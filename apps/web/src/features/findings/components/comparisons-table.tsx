import { HTMLTable } from '@blueprintjs/core';
import type { AnovaAnswer, SeparationMethod } from '@friable/contracts';
import { SignificanceLegend } from './anova-table';
import { formatMeasureValue, formatP, formatStatistic, methodLabels, significanceMark } from './stat-format';

/** Every pair the chosen method compares: the difference, its confidence interval, p and the verdict. */
export function ComparisonsTable({ answer, method, alpha, decimals }: { answer: AnovaAnswer; method: SeparationMethod; alpha: number; decimals: number }) {
  const comparisons = answer.comparisons[method];
  if (!comparisons) return null;
  const confidence = `${formatStatistic(100 * (1 - alpha))} %`;
  return (
    <section className="fr-findings-block" aria-labelledby="fr-pairs-title">
      <h3 id="fr-pairs-title" className="fr-findings-heading">
        Comparisons ({methodLabels[method]})
      </h3>
      <div className="fr-table-scroll">
        <HTMLTable compact striped className="fr-findings-table" aria-label="Comparisons">
          <thead>
            <tr>
              <th scope="col">Pair</th>
              <th scope="col" className="fr-num">Difference</th>
              <th scope="col" className="fr-num">{confidence} interval</th>
              <th scope="col" className="fr-num">p</th>
              <th scope="col">Significant</th>
            </tr>
          </thead>
          <tbody>
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
                <td>{pair.significant ? 'yes' : 'no'}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      <SignificanceLegend />
      {comparisons.leastSignificantDifference !== null && (
        <p className="fr-muted fr-small">
          Least significant difference at α = {formatStatistic(alpha)}: {formatMeasureValue(comparisons.leastSignificantDifference, decimals)}.
        </p>
      )}
    </section>
  );
}
