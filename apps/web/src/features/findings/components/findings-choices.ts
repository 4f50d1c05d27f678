import {
  AFT_DISTRIBUTIONS,
  COUNT_FAMILIES,
  FINDINGS_ANALYSES,
  REPEATED_COVARIANCES,
  type AftDistribution,
  type CountFamilyChoice,
  type FindingsAnalysis,
  type FindingsModelsQuery,
  type RepeatedCovariance,
  type SeparationMethod,
  type TrialDetail,
} from '@friable/contracts';
import { defaultAnalysisOptions, type AnalysisOptions } from './analysis-choices';

const oneOf = <T extends string>(allowed: readonly T[], value: string | null): T | undefined => (allowed.includes(value as T) ? (value as T) : undefined);

export const DISTRIBUTION_LABELS: Record<AftDistribution, string> = { weibull: 'Weibull', lognormal: 'Log-normal', loglogistic: 'Log-logistic' };
export const COVARIANCE_LABELS: Record<RepeatedCovariance, string> = { auto: 'Best by AIC', cs: 'Compound symmetry', ar1: 'AR(1) in days', unstructured: 'Unstructured' };
export const FAMILY_LABELS: Record<CountFamilyChoice, string> = { auto: 'Poisson, quasi if overdispersed', poisson: 'Poisson', quasipoisson: 'Quasi-Poisson' };

/** Each measure at each round before the analysed one (and other measures at the same round), as a baseline to adjust for. */
export function baselineChoices(trial: TrialDetail, dayOffset: number, measureId: number) {
  return [...trial.rounds]
    .sort((a, b) => a.dayOffset - b.dayOffset)
    .filter((r) => r.dayOffset <= dayOffset)
    .flatMap((r) =>
      trial.measures
        .filter((m) => r.measureIds.includes(m.id) && (r.dayOffset < dayOffset || m.id !== measureId))
        .map((m) => ({ value: `${m.id}:${r.id}`, label: `${m.name} at ${r.label}` })),
    );
}

export type FindingsChoices = Partial<FindingsModelsQuery> & AnalysisOptions;

/** The address keys the Findings page keeps its choices under. */
export type ChoiceKey = 'measure' | 'round' | 'site' | 'sites' | 'transform' | 'method' | 'alpha' | 'analysis' | 'model' | 'distribution' | 'covariance' | 'family' | 'covMeasure' | 'covRound';
export type Choose = (next: Partial<Record<ChoiceKey, string | undefined>>) => void;

/** The page's choices, read from the address so a view can be shared and reloaded. */
export function readChoices(params: URLSearchParams): FindingsChoices {
  const number = (key: string) => (params.get(key) ? Number(params.get(key)) : undefined);
  return {
    analysis: oneOf<FindingsAnalysis>(FINDINGS_ANALYSES, params.get('model')),
    distribution: oneOf<AftDistribution>(AFT_DISTRIBUTIONS, params.get('distribution')),
    covariance: oneOf<RepeatedCovariance>(REPEATED_COVARIANCES, params.get('covariance')),
    family: oneOf<CountFamilyChoice>(COUNT_FAMILIES, params.get('family')),
    covariateMeasureId: number('covMeasure'),
    covariateRoundId: number('covRound'),
    measureId: number('measure'),
    roundId: number('round'),
    siteId: number('site'),
    sitesAre: params.get('sites') === 'fixed' ? 'fixed' : 'random',
    transform: (params.get('transform') as AnalysisOptions['transform']) ?? defaultAnalysisOptions.transform,
    method: (params.get('method') as SeparationMethod) ?? defaultAnalysisOptions.method,
    alpha: number('alpha') ?? defaultAnalysisOptions.alpha,
  };
}
