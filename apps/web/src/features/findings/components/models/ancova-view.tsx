import { Callout } from '@blueprintjs/core';
import type { ModelFindings } from '@friable/contracts';
import { AnalysisCautions } from '../analysis-cautions';
import { AnovaTable } from '../anova-table';
import { ComparisonsTable } from '../comparisons-table';
import { MeansTable } from '../means-table';
import { formatStatistic, inProtocolOrder, pClause } from '../stat-format';
import { ModelSection } from './model-parts';

type AncovaFindings = Extract<ModelFindings, { analysis: 'ancova' }>;

/** Analysis of covariance: the baseline's slope, the equal-slopes test, the baseline between treatments, then the adjusted table and means. */
export function AncovaView({ findings, names }: { findings: AncovaFindings; names: Record<string, string> }) {
  const { context } = findings;
  const answer = { ...findings, means: inProtocolOrder(findings.means, Object.keys(names)) };
  const baselineDiffers = findings.baseline !== undefined && findings.baseline.p < 0.05;
  return (
    <div className="fr-findings-view">
      {baselineDiffers && (
        <Callout intent="warning" icon="warning-sign" className="fr-findings-warnings" title="The baseline already differs by treatment">
          The covariate differs between treatments (F = {formatStatistic(findings.baseline!.f)}, {pClause(findings.baseline!.p)}) before the later values were taken: either the
          randomization left the treatments unlike at the start, or the treatments had already acted when the baseline was measured. Adjusted means then answer a different
          question; read them beside the unadjusted ANOVA.
        </Callout>
      )}
      <ModelSection id="fr-covariate-title" title="The baseline">
        <dl className="fr-findings-summary">
          {findings.covariate && (
            <>
              <div>
                <dt>Slope on the baseline</dt>
                <dd>
                  {formatStatistic(findings.covariate.slope)} ± {formatStatistic(findings.covariate.se)} ({pClause(findings.covariate.p)})
                </dd>
              </div>
              <div>
                <dt>Baseline mean</dt>
                <dd>{formatStatistic(findings.covariate.mean)}</dd>
              </div>
            </>
          )}
          {findings.slopes && (
            <div>
              <dt>Equal slopes across treatments</dt>
              <dd>
                F = {formatStatistic(findings.slopes.f)} on {findings.slopes.df1} and {findings.slopes.df2} df, {pClause(findings.slopes.p)}
              </dd>
            </div>
          )}
          {findings.baseline && (
            <div>
              <dt>Baseline between treatments</dt>
              <dd>
                F = {formatStatistic(findings.baseline.f)}, {pClause(findings.baseline.p)}
              </dd>
            </div>
          )}
        </dl>
        {findings.slopes && findings.slopes.p < 0.05 && (
          <p className="fr-error-line">The slopes differ between treatments: a single adjustment does not fit every treatment, so the adjusted means depend on the baseline chosen.</p>
        )}
        <p className="fr-muted fr-small">Means below are adjusted to the same baseline for every treatment (the baseline mean).</p>
      </ModelSection>
      <AnovaTable answer={findings} decimals={context.measure.decimals} unit={context.measure.unit} headingId="fr-ancova-table-title" />
      <MeansTable answer={answer} method={context.choices.method} control={context.controlCode ?? undefined} decimals={context.measure.decimals} unit={context.measure.unit} treatmentNames={names} />
      <ComparisonsTable answer={findings} method={context.choices.method} alpha={context.choices.alpha} decimals={context.measure.decimals} higherIsBetter={context.measure.higherIsBetter} />
      <AnalysisCautions answer={findings} />
    </div>
  );
}
