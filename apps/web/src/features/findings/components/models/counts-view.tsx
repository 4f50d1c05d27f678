import type { ModelFindings } from '@friable/contracts';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { SignificanceLegend } from '../anova-table';
import { formatStatistic, inProtocolOrder, pClause } from '../stat-format';
import { LazyModelChart } from './lazy-model-chart';
import { ModelSection, ModelTable, ModelWarnings, PCells, RatioTable, TreatmentCell, modelTermLabel } from './model-parts';

type CountsFindings = Extract<ModelFindings, { analysis: 'counts' }>;

/** Counts: the overdispersion check, the Poisson or quasi-Poisson tests, rate ratios to the control and each treatment's rate. */
export function CountsView({ findings, names, styles }: { findings: CountsFindings; names: Record<string, string>; styles: ReadonlyMap<string, TreatmentStyle> }) {
  const order = Object.keys(names);
  const quasi = findings.family === 'quasipoisson';
  const { overdispersion } = findings;
  return (
    <div className="fr-findings-view">
      <ModelSection id="fr-counts-fit-title" title={quasi ? 'Quasi-Poisson model' : 'Poisson model'}>
        <p>
          Spread beyond Poisson: Pearson χ² = {formatStatistic(overdispersion.pearsonChiSquare)} on {overdispersion.df} df, {pClause(overdispersion.p)} —{' '}
          {overdispersion.present ? `overdispersed (dispersion ${formatStatistic(findings.dispersion)})` : 'no overdispersion'}.{' '}
          {quasi ? 'Standard errors are widened by the dispersion and terms tested by F.' : 'Terms are tested by the change in deviance (χ²).'}
        </p>
        <ModelTable label="Tests of the count model" head={['Term', 'df', 'Deviance', quasi ? 'F' : 'χ²', 'p', '']}>
          {findings.tests.map((row) => (
            <tr key={row.term}>
              <th scope="row">{modelTermLabel(row.term)}</th>
              <td className="fr-num">{row.df}</td>
              <td className="fr-num">{formatStatistic(row.deviance)}</td>
              <td className="fr-num">{formatStatistic(quasi ? row.f : row.chiSquare)}</td>
              <PCells p={row.p} />
            </tr>
          ))}
        </ModelTable>
        <SignificanceLegend />
      </ModelSection>
      <ModelSection id="fr-rates-title" title="Rate ratios to the control">
        <p className="fr-muted fr-small">A ratio of 2 means twice the control&rsquo;s count per plot ({findings.control}).</p>
        <div className="fr-findings-columns">
          <RatioTable ratios={inProtocolOrder(findings.rateRatios, order)} names={names} label="Rate ratio" adjustment={findings.adjustment} />
          <LazyModelChart
            spec={{ chart: 'ratios', title: 'Rate ratio to the control, 95 % interval', axis: 'Rate ratio (log scale)', ratios: inProtocolOrder(findings.rateRatios, order).map((r) => ({ ...r, name: r.treatment })) }}
            styles={styles}
          />
        </div>
        <ModelTable label="Count per plot by treatment" head={['Treatment', 'Count per plot', '95 % interval']}>
          {inProtocolOrder(findings.rates, order).map((rate) => (
            <tr key={rate.treatment}>
              <TreatmentCell code={rate.treatment} names={names} />
              <td className="fr-num">{formatStatistic(rate.rate)}</td>
              <td className="fr-num">
                {formatStatistic(rate.lower)} – {formatStatistic(rate.upper)}
              </td>
            </tr>
          ))}
        </ModelTable>
      </ModelSection>
      <ModelWarnings warnings={findings.warnings} />
    </div>
  );
}
