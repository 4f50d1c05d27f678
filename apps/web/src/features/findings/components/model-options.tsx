import { AFT_DISTRIBUTIONS, COUNT_FAMILIES, REPEATED_COVARIANCES, isModelFindings, type FindingsAnalysis, type TrialDetail } from '@friable/contracts';
import type { useFindings } from '../api/get-findings';
import { OptionChoice } from './analysis-choices';
import { baselineChoices, COVARIANCE_LABELS, DISTRIBUTION_LABELS, FAMILY_LABELS, type Choose, type FindingsChoices } from './findings-choices';

/** The choices of the model on screen: a timed measure's time-ratio model, the repeated measures' covariance, the ANCOVA's baseline, the count model. */
export function ModelOptions({ trial, analysis, choices, data, choose }: { trial: TrialDetail; analysis: FindingsAnalysis; choices: FindingsChoices; data: ReturnType<typeof useFindings>['data']; choose: Choose }) {
  if (analysis === 'censored')
    return <OptionChoice label="Time-ratio model" value={choices.distribution ?? 'weibull'} options={AFT_DISTRIBUTIONS.map((d) => ({ value: d, label: DISTRIBUTION_LABELS[d] }))} onChange={(distribution) => choose({ distribution })} />;
  if (analysis === 'repeated')
    return <OptionChoice label="Within-plot covariance" value={choices.covariance ?? 'auto'} options={REPEATED_COVARIANCES.map((c) => ({ value: c, label: COVARIANCE_LABELS[c] }))} onChange={(covariance) => choose({ covariance })} />;
  if (analysis === 'ancova' && data && isModelFindings(data))
    return (
      <OptionChoice
        label="Baseline"
        value={`${data.context.choices.covariateMeasureId ?? ''}:${data.context.choices.covariateRoundId ?? ''}`}
        options={baselineChoices(trial, data.context.round.dayOffset, data.context.measure.id)}
        onChange={(value) => {
          const [covMeasure, covRound] = value.split(':');
          choose({ covMeasure, covRound });
        }}
      />
    );
  if (analysis === 'counts') return <OptionChoice label="Count model" value={choices.family ?? 'auto'} options={COUNT_FAMILIES.map((f) => ({ value: f, label: FAMILY_LABELS[f] }))} onChange={(family) => choose({ family })} />;
  return null;
}
