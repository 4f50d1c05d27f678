import type { ModelFindings } from '@friable/contracts';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { RankTestPanel } from '../rank-test-panel';
import { inProtocolOrder } from '../stat-format';
import { LazyModelChart } from './lazy-model-chart';
import { LikelihoodRatioTable, ModelSection, ModelTable, ModelWarnings, RatioTable, TreatmentCell } from './model-parts';

type OrdinalFindings = Extract<ModelFindings, { analysis: 'ordinal' }>;

const share = new Intl.NumberFormat('en-US', { style: 'percent', maximumFractionDigits: 0 });

/** Scores: the proportional-odds model's tests, odds ratios to the control, predicted shares of each score, and the rank test. */
export function OrdinalView({ findings, names, styles }: { findings: OrdinalFindings; names: Record<string, string>; styles: ReadonlyMap<string, TreatmentStyle> }) {
  const order = Object.keys(names);
  const treatments = inProtocolOrder([...new Set(findings.probabilities.map((p) => p.treatment))].map((treatment) => ({ treatment })), order).map((t) => t.treatment);
  const probability = (treatment: string, category: string) => findings.probabilities.find((p) => p.treatment === treatment && p.category === category)?.probability ?? 0;
  return (
    <div className="fr-findings-view">
      <div className="fr-findings-columns">
        <ModelSection id="fr-ordinal-tests-title" title="Proportional-odds model">
          <LikelihoodRatioTable tests={findings.tests} label="Likelihood-ratio tests of the proportional-odds model" />
        </ModelSection>
        <RankTestPanel kind={findings.rankTest.test} answer={findings.rankTest} />
      </div>
      <ModelSection id="fr-odds-title" title="Odds of a higher score than the control">
        <p className="fr-muted fr-small">Above 1: plots of that treatment tend to score higher than the control ({findings.control}).</p>
        <div className="fr-findings-columns">
          <RatioTable ratios={inProtocolOrder(findings.oddsRatios, order)} names={names} label="Odds ratio" adjustment={findings.adjustment} />
          <LazyModelChart
            spec={{ chart: 'ratios', title: 'Odds ratio to the control, 95 % interval', axis: 'Odds ratio (log scale)', ratios: inProtocolOrder(findings.oddsRatios, order).map((r) => ({ ...r, name: r.treatment })) }}
            styles={styles}
          />
        </div>
      </ModelSection>
      <ModelSection id="fr-shares-title" title="Predicted share of each score">
        <div className="fr-findings-columns">
          <ModelTable label="Predicted share of plots in each score" head={['Treatment', ...findings.categories.map((c) => `Score ${c}`)]}>
            {treatments.map((treatment) => (
              <tr key={treatment}>
                <TreatmentCell code={treatment} names={names} />
                {findings.categories.map((category) => (
                  <td key={category} className="fr-num">
                    {share.format(probability(treatment, category))}
                  </td>
                ))}
              </tr>
            ))}
          </ModelTable>
          <LazyModelChart
            spec={{ chart: 'shares', title: 'Predicted share of each score', categories: findings.categories, rows: treatments.map((treatment) => ({ treatment, name: treatment, shares: findings.categories.map((c) => probability(treatment, c)) })) }}
            styles={styles}
          />
        </div>
      </ModelSection>
      <ModelWarnings warnings={findings.warnings} />
    </div>
  );
}
