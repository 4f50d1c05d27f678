import type { CensoredAnswer, ModelFindings } from '@friable/contracts';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { formatMeasureValue, formatStatistic, inProtocolOrder, pClause, significanceMark } from '../stat-format';
import { LazyModelChart } from './lazy-model-chart';
import type { ModelChartSpec } from './model-chart-spec';
import { LikelihoodRatioTable, ModelSection, ModelTable, ModelWarnings, RatioTable, TreatmentCell } from './model-parts';

type CensoredFindings = Extract<ModelFindings, { analysis: 'censored' }>;

const DISTRIBUTION_WORDS: Record<CensoredAnswer['distribution'], string> = { weibull: 'Weibull', lognormal: 'log-normal', loglogistic: 'log-logistic' };

function curveSpec(title: string, unit: string, curves: CensoredAnswer['curves'], names: Record<string, string>, order: string[]): ModelChartSpec {
  return { chart: 'not-drained', title, unit, band: true, curves: inProtocolOrder(curves, order).map((c) => ({ treatment: c.treatment, name: names[c.treatment] ?? c.treatment, points: c.points })) };
}

/** A median with its interval, or "not reached" when more than half the plots had not drained. */
function medianText(median: { median: number | null; lower: number | null; upper: number | null }, decimals: number, unit: string): string {
  if (median.median === null) return 'not reached';
  const limit = (value: number | null) => (value === null ? 'not reached' : formatMeasureValue(value, decimals));
  return `${formatMeasureValue(median.median, decimals)} ${unit} (${limit(median.lower)} – ${limit(median.upper)})`;
}

/** Censored drain times: not-drained curves (combined and per site), medians, the stratified log-rank test and time ratios. */
export function CensoredView({ findings, names, styles }: { findings: CensoredFindings; names: Record<string, string>; styles: ReadonlyMap<string, TreatmentStyle> }) {
  const { context } = findings;
  const order = Object.keys(names);
  const { unit, decimals } = context.measure;
  const counts = new Map(findings.treatments.map((t) => [t.treatment, t]));
  return (
    <div className="fr-findings-view">
      <ModelSection id="fr-curves-title" title="Share of plots not yet drained">
        <p className="fr-muted fr-small">
          Each step is a plot draining; the shaded band is the 95 % pointwise interval. A plot not drained by the cut-off keeps the curve up: its time is longer than the
          cut-off, not equal to it.
        </p>
        <div className="fr-findings-plots">
          <LazyModelChart spec={curveSpec(context.scope.label === 'all sites combined' ? 'All sites combined' : context.scope.label, unit, findings.curves, names, order)} styles={styles} />
          {(findings.bySite ?? []).map((site) => (
            <LazyModelChart key={site.site} spec={curveSpec(site.site, unit, site.curves, names, order)} styles={styles} />
          ))}
        </div>
      </ModelSection>
      <div className="fr-findings-columns">
        <ModelSection id="fr-medians-title" title="Median drain time">
          <ModelTable label="Median drain time per treatment" head={['Treatment', 'Plots', 'Drained', 'Not drained', 'Median (95 % interval)']}>
            {inProtocolOrder(findings.medians, order).map((median) => (
              <tr key={median.treatment}>
                <TreatmentCell code={median.treatment} names={names} />
                <td className="fr-num">{counts.get(median.treatment)?.plots ?? '—'}</td>
                <td className="fr-num">{counts.get(median.treatment)?.drained ?? '—'}</td>
                <td className="fr-num">{counts.get(median.treatment)?.notDrained ?? '—'}</td>
                <td className="fr-num">{medianText(median, decimals, unit)}</td>
              </tr>
            ))}
          </ModelTable>
          {(findings.bySite ?? []).length > 0 && (
            <details className="fr-small">
              <summary>Medians at each site</summary>
              {findings.bySite!.map((site) => (
                <p key={site.site}>
                  <strong>{site.site}:</strong> {inProtocolOrder(site.medians, order).map((m) => `${m.treatment} ${medianText(m, decimals, unit)}`).join('; ')}
                </p>
              ))}
            </details>
          )}
        </ModelSection>
        <ModelSection id="fr-logrank-title" title="Log-rank test">
          <p>
            Treatments differ in how fast plots drain? χ² = {formatStatistic(findings.logRank.chiSquare)} on {findings.logRank.df} df, {pClause(findings.logRank.p)}{' '}
            <span className="fr-findings-mark">{significanceMark(findings.logRank.p)}</span>
          </p>
          <p className="fr-muted fr-small">
            Compared within each of {findings.logRank.strata} {context.scope.siteNames.length > 1 ? 'site × block strata' : 'blocks'}, so a wetter block or garden does not pass for a
            treatment effect.
          </p>
        </ModelSection>
      </div>
      <ModelSection id="fr-ratios-title" title={`Time ratios to the control (${DISTRIBUTION_WORDS[findings.distribution]} model)`}>
        {findings.timeRatios.length > 0 ? (
          <>
            <p className="fr-muted fr-small">
              A ratio of 0.5 means plots of that treatment typically drain in half the control&rsquo;s time; above 1, slower. Control: {findings.control}.
            </p>
            <div className="fr-findings-columns">
              <RatioTable ratios={inProtocolOrder(findings.timeRatios, order)} names={names} label="Time ratio" adjustment={findings.adjustment} />
              <LazyModelChart
                spec={{
                  chart: 'ratios',
                  title: 'Time ratio to the control, 95 % interval',
                  axis: 'Time ratio (log scale)',
                  ratios: inProtocolOrder(findings.timeRatios, order).map((r) => ({ ...r, name: r.treatment })),
                }}
                styles={styles}
              />
            </div>
          </>
        ) : (
          <p className="fr-muted">The time-ratio model could not be fitted (see below).</p>
        )}
        {findings.tests.length > 0 && (
          <>
            <h4 className="fr-small">Each term dropped from the model (likelihood ratio)</h4>
            <LikelihoodRatioTable tests={findings.tests} label="Likelihood-ratio tests of the time-ratio model" />
            <p className="fr-muted fr-small">
              Log-likelihood {formatStatistic(findings.logLik)}, scale {formatStatistic(findings.scale)}.
            </p>
          </>
        )}
      </ModelSection>
      <ModelWarnings warnings={findings.warnings} />
    </div>
  );
}
