import { HTMLTable } from '@blueprintjs/core';
import type { AnovaAnswer } from '@friable/contracts';
import { formatMeasureValue, formatStatistic, significanceMarks, termLabel } from './stat-format';
import { TestCells, TestHeadings } from './test-cells';

/** The marks legend that stands beside every table with p-values. */
export function SignificanceLegend() {
  return (
    <p className="fr-findings-legend fr-small" aria-label="Significance marks">
      {significanceMarks.map((entry) => (
        <span key={entry.mark}>
          <strong>{entry.mark}</strong> {entry.words}
        </span>
      ))}
      <span>
        <strong>ns</strong> not significant
      </span>
    </p>
  );
}

/** The ANOVA table (df, SS, MS, F, p with its mark), then the grand mean, CV and the error's root mean square. */
export function AnovaTable({ answer, decimals, unit, headingId = 'fr-anova-title' }: { answer: Pick<AnovaAnswer, 'anova' | 'summary'>; decimals: number; unit?: string; headingId?: string }) {
  const { summary } = answer;
  return (
    <section className="fr-findings-block" aria-labelledby={headingId}>
      <h3 id={headingId} className="fr-findings-heading">
        Analysis of variance
      </h3>
      <div className="fr-table-scroll">
        <HTMLTable compact striped className="fr-findings-table" aria-label="Analysis of variance">
          <thead>
            <tr>
              <th scope="col">Source</th>
              <th scope="col" className="fr-num">df</th>
              <th scope="col" className="fr-num">SS</th>
              <th scope="col" className="fr-num">MS</th>
              <TestHeadings />
            </tr>
          </thead>
          <tbody>
            {answer.anova.map((row) => (
              <tr key={row.term} className={row.term === 'total' ? 'fr-findings-total' : undefined}>
                <th scope="row">{termLabel(row.term)}</th>
                <td className="fr-num">{row.df}</td>
                <td className="fr-num">{formatStatistic(row.ss)}</td>
                <td className="fr-num">{formatStatistic(row.ms)}</td>
                <TestCells f={row.f} p={row.p} />
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      <SignificanceLegend />
      <dl className="fr-findings-summary">
        <div>
          <dt>Grand mean</dt>
          <dd>
            {formatMeasureValue(summary.grandMean, decimals)}
            {unit ? ` ${unit}` : ''}
          </dd>
        </div>
        <div>
          <dt>CV</dt>
          <dd>{formatStatistic(summary.cv)} %</dd>
        </div>
        <div>
          <dt>Root mean square error</dt>
          <dd>{formatStatistic(summary.rootMse)}</dd>
        </div>
        <div>
          <dt>Values analysed</dt>
          <dd>{summary.n}</dd>
        </div>
      </dl>
    </section>
  );
}
