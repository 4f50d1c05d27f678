import { Button, Callout, HTMLSelect } from '@blueprintjs/core';
import {
  AFT_DISTRIBUTIONS,
  COUNT_FAMILIES,
  FINDINGS_ANALYSES,
  REPEATED_COVARIANCES,
  isModelFindings,
  type AftDistribution,
  type CountFamilyChoice,
  type FindingsAnalysis,
  type FindingsModelsQuery,
  type FindingsQuery,
  type RepeatedCovariance,
  type SeparationMethod,
  type TrialDetail,
} from '@friable/contracts';
import { useEffect, useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { preloadPlotly } from '../../../lib/preload-plotly';
import { useDownloadBundle } from '../api/download-bundle';
import { useDownloadExport } from '../api/download-export';
import { findingsQueryOptions, getAnovaFindings, useFindings } from '../api/get-findings';
import { useFindingsSummary } from '../api/get-findings-summary';
import { useSiteRounds } from '../hooks/use-site-rounds';
import { useSiteMeans } from '../hooks/use-site-means';
import { AnalysisChoices, Choice, defaultAnalysisOptions, type AnalysisOptions } from './analysis-choices';
import { FindingsCaption, FindingsResultView } from './findings-result-view';
import { ModelFindingsView } from './models/model-findings-view';
import { ModelPicker } from './models/model-picker';
import { SnapshotView } from './snapshot-view';
import { SnapshotsPanel } from './snapshots-panel';
import { ValuesSummary } from './values-summary';

const oneOf = <T extends string>(allowed: readonly T[], value: string | null): T | undefined => (allowed.includes(value as T) ? (value as T) : undefined);

const DISTRIBUTION_LABELS: Record<AftDistribution, string> = { weibull: 'Weibull', lognormal: 'Log-normal', loglogistic: 'Log-logistic' };
const COVARIANCE_LABELS: Record<RepeatedCovariance, string> = { auto: 'Best by AIC', cs: 'Compound symmetry', ar1: 'AR(1) in days', unstructured: 'Unstructured' };
const FAMILY_LABELS: Record<CountFamilyChoice, string> = { auto: 'Poisson, quasi if overdispersed', poisson: 'Poisson', quasipoisson: 'Quasi-Poisson' };

/** Each measure at each round before the analysed one (and other measures at the same round), as a baseline to adjust for. */
function baselineChoices(trial: TrialDetail, dayOffset: number, measureId: number) {
  return [...trial.rounds]
    .sort((a, b) => a.dayOffset - b.dayOffset)
    .filter((r) => r.dayOffset <= dayOffset)
    .flatMap((r) =>
      trial.measures
        .filter((m) => r.measureIds.includes(m.id) && (r.dayOffset < dayOffset || m.id !== measureId))
        .map((m) => ({ value: `${m.id}:${r.id}`, label: `${m.name} at ${r.label}` })),
    );
}

/** The page's choices, read from the address so a view can be shared and reloaded. */
function readChoices(params: URLSearchParams): Partial<FindingsModelsQuery> & AnalysisOptions {
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

/** Findings: one measure and round analysed at one site or all sites combined, with plots, saved analyses and exports. */
export function FindingsPage({ trial, meId }: { trial: TrialDetail; meId?: number }) {
  useEffect(preloadPlotly, []);
  const [params, setParams] = useSearchParams();
  const choices = readChoices(params);
  const measures = useMemo(() => [...trial.measures].sort((a, b) => a.position - b.position), [trial.measures]);
  const measure = measures.find((m) => m.id === choices.measureId) ?? measures[0];
  const rounds = useMemo(
    () => [...trial.rounds].filter((r) => (measure ? r.measureIds.includes(measure.id) : false)).sort((a, b) => b.dayOffset - a.dayOffset),
    [trial.rounds, measure],
  );
  // With no round chosen the server analyses the latest round holding values, and says which.
  const chosenRound = rounds.find((r) => r.id === choices.roundId);
  const combinable = trial.design !== 'crd' && trial.sites.length > 1;
  const siteId = choices.siteId ?? (combinable ? undefined : trial.sites[0]?.id);
  const options: AnalysisOptions = { method: choices.method, transform: choices.transform, alpha: choices.alpha, sitesAre: choices.sitesAre };
  const query: FindingsModelsQuery | null =
    measure && rounds.length > 0
      ? {
          measureId: measure.id,
          ...(chosenRound ? { roundId: chosenRound.id } : {}),
          ...(siteId ? { siteId } : {}),
          sitesAre: options.sitesAre,
          transform: options.transform,
          method: options.method,
          alpha: options.alpha,
          ...(choices.analysis ? { analysis: choices.analysis } : {}),
          ...(choices.distribution ? { distribution: choices.distribution } : {}),
          ...(choices.covariance ? { covariance: choices.covariance } : {}),
          ...(choices.family ? { family: choices.family } : {}),
          ...(choices.covariateMeasureId ? { covariateMeasureId: choices.covariateMeasureId } : {}),
          ...(choices.covariateRoundId ? { covariateRoundId: choices.covariateRoundId } : {}),
        }
      : null;
  const findings = useFindings(trial.id, query);
  // The values as recorded answer at once (no engine): the first table on screen while the analysis is computed.
  const summary = useFindingsSummary(trial.id, query && { measureId: query.measureId, ...(query.roundId ? { roundId: query.roundId } : {}), ...(query.siteId ? { siteId: query.siteId } : {}) });
  const noData = findings.error instanceof ApiError && findings.error.status === 422 && /no values/i.test(findings.error.message);
  const analysedRoundId = findings.data?.context.choices.roundId;
  const round = chosenRound ?? rounds.find((r) => r.id === analysedRoundId) ?? rounds[0];
  const shownAnalysis: FindingsAnalysis = findings.data ? (isModelFindings(findings.data) ? findings.data.analysis : 'anova') : (choices.analysis ?? 'anova');
  // The exact choices of the analysis on screen, round included, for saving and for the per-site plots.
  const { analysis: _analysis, distribution: _distribution, covariance: _covariance, family: _family, covariateMeasureId: _cm, covariateRoundId: _cr, ...anovaQuery } = query ?? { measureId: 0 };
  const shownQuery: FindingsQuery | null = query && analysedRoundId ? { ...anovaQuery, roundId: analysedRoundId } : query && anovaQuery;
  // What "Save this analysis" keeps: the analysis on screen with its model options, round included.
  const savedQuery: FindingsModelsQuery | null = query && analysedRoundId ? { ...query, roundId: analysedRoundId, analysis: shownAnalysis } : null;

  const combined = query !== null && !query.siteId && combinable;
  // The per-site analyses feed only the interaction plot (ANOVA) and the per-site means over time (rounds over time):
  // asked once the combined one has answered, so they neither delay the first table nor run for a round that has no values.
  const interaction = useSiteMeans(
    combined && findings.isSuccess && shownAnalysis === 'anova'
      ? trial.sites.map((site) => {
          const siteQuery = { ...shownQuery!, siteId: site.id };
          return { name: site.name, options: { queryKey: findingsQueryOptions(trial.id, { ...siteQuery, analysis: 'anova' }).queryKey, queryFn: () => getAnovaFindings(trial.id, siteQuery) } };
        })
      : [],
  );
  const siteRounds = useSiteRounds(
    trial.id,
    combined && findings.isSuccess && shownAnalysis === 'repeated' && query ? { ...query, ...(analysedRoundId ? { roundId: analysedRoundId } : {}), analysis: 'repeated' } : null,
    trial.sites,
  );
  const download = useDownloadExport();
  const bundle = useDownloadBundle();
  const treatmentNames = useMemo(() => Object.fromEntries(trial.treatments.map((t) => [t.code, t.name])), [trial.treatments]);

  function choose(
    next: Partial<Record<'measure' | 'round' | 'site' | 'sites' | 'transform' | 'method' | 'alpha' | 'analysis' | 'model' | 'distribution' | 'covariance' | 'family' | 'covMeasure' | 'covRound', string | undefined>>,
  ) {
    const merged = new URLSearchParams(params);
    for (const [key, value] of Object.entries(next)) {
      if (value === undefined || value === '') merged.delete(key);
      else merged.set(key, value);
    }
    setParams(merged, { replace: true });
  }

  if (!measure) return <EmptyState title="No measures yet" description="The protocol needs a measure before there is anything to analyse." />;
  if (!round) return <EmptyState title="No rounds for this measure" description={`No assessment round records ${measure.name} yet.`} />;
  const openAnalysis = Number(params.get('analysis')) || null;
  if (openAnalysis) return <SnapshotView trial={trial} analysisId={openAnalysis} treatmentNames={treatmentNames} meId={meId} onClose={() => choose({ analysis: undefined })} />;
  const data = findings.data;
  const dunnettAllowed = trial.treatments.some((t) => t.isControl);

  return (
    <div className="fr-findings">
      <AnalysisChoices
        options={options}
        onChange={(next) => choose({ sites: next.sitesAre, transform: next.transform, method: next.method, alpha: String(next.alpha) })}
        showSites={combined && (shownAnalysis === 'anova' || shownAnalysis === 'ancova')}
        showTransform={shownAnalysis === 'anova'}
        showSeparation={shownAnalysis === 'anova' || shownAnalysis === 'ancova'}
        dunnettAllowed={dunnettAllowed}
        after={
          shownAnalysis === 'censored' ? (
            <Choice label="Time-ratio model">
              <HTMLSelect aria-label="Time-ratio model" value={choices.distribution ?? 'weibull'} onChange={(e) => choose({ distribution: e.target.value })}>
                {AFT_DISTRIBUTIONS.map((d) => (
                  <option key={d} value={d}>
                    {DISTRIBUTION_LABELS[d]}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
          ) : shownAnalysis === 'repeated' ? (
            <Choice label="Within-plot covariance">
              <HTMLSelect aria-label="Within-plot covariance" value={choices.covariance ?? 'auto'} onChange={(e) => choose({ covariance: e.target.value })}>
                {REPEATED_COVARIANCES.map((c) => (
                  <option key={c} value={c}>
                    {COVARIANCE_LABELS[c]}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
          ) : shownAnalysis === 'ancova' && data && isModelFindings(data) ? (
            <Choice label="Baseline">
              <HTMLSelect
                aria-label="Baseline"
                value={`${data.context.choices.covariateMeasureId ?? ''}:${data.context.choices.covariateRoundId ?? ''}`}
                onChange={(e) => {
                  const [covMeasure, covRound] = e.target.value.split(':');
                  choose({ covMeasure, covRound });
                }}
              >
                {baselineChoices(trial, data.context.round.dayOffset, data.context.measure.id).map((option) => (
                  <option key={option.value} value={option.value}>
                    {option.label}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
          ) : shownAnalysis === 'counts' ? (
            <Choice label="Count model">
              <HTMLSelect aria-label="Count model" value={choices.family ?? 'auto'} onChange={(e) => choose({ family: e.target.value })}>
                {COUNT_FAMILIES.map((f) => (
                  <option key={f} value={f}>
                    {FAMILY_LABELS[f]}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
          ) : null
        }
        before={
          <>
            <Choice label="Measure">
              <HTMLSelect aria-label="Measure" value={measure.id} onChange={(e) => choose({ measure: e.target.value, round: undefined, model: undefined, covMeasure: undefined, covRound: undefined })}>
                {measures.map((m) => (
                  <option key={m.id} value={m.id}>
                    {m.name}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
            <Choice label="Round">
              <HTMLSelect aria-label="Round" value={round.id} onChange={(e) => choose({ round: e.target.value })}>
                {rounds.map((r) => (
                  <option key={r.id} value={r.id}>
                    {r.label}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
            <Choice label="Scope">
              <HTMLSelect aria-label="Scope" value={siteId ?? ''} onChange={(e) => choose({ site: e.target.value || undefined })}>
                {combinable && <option value="">All sites combined</option>}
                {trial.sites.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name}
                  </option>
                ))}
              </HTMLSelect>
            </Choice>
          </>
        }
      />
      <div className="fr-findings-actions">
        <Button icon="download" text="Tidy CSV" loading={download.isPending && download.variables?.kind === 'csv'} onClick={() => download.mutate({ trialId: trial.id, kind: 'csv', fallbackName: `${trial.code}.csv` })} />
        <Button icon="th" text="Workbook" loading={download.isPending && download.variables?.kind === 'xlsx'} onClick={() => download.mutate({ trialId: trial.id, kind: 'xlsx', fallbackName: `${trial.code}.xlsx` })} />
        <Button
          icon="archive"
          text="Analysis with R script"
          title="This analysis as a zip: the data it used, an R script that reproduces its tables, and Friable's answer"
          disabled={!query || !findings.data}
          loading={bundle.isPending}
          onClick={() =>
            query &&
            bundle.mutate({ trialId: trial.id, query: { ...query, ...(analysedRoundId ? { roundId: analysedRoundId } : {}), analysis: shownAnalysis }, fallbackName: `${trial.code}-analysis.zip` })
          }
        />
        <Link
          to={paths.trialReport.href(trial.id, {
            round: analysedRoundId ?? chosenRound?.id,
            site: query?.siteId,
            sites: combined && options.sitesAre === 'fixed' ? 'fixed' : undefined,
            method: options.method,
            alpha: options.alpha,
          })}
          className="bp6-button fr-findings-report-link"
        >
          <span className="bp6-button-text">Printable report</span>
        </Link>
      </div>
      {(download.error ?? bundle.error) && (
        <p className="fr-error-line" role="alert">
          {(download.error ?? bundle.error)!.message}
        </p>
      )}
      {findings.isPending ? (
        summary.data ? (
          <>
            <p className="fr-findings-caption">
              <FindingsCaption findings={{ context: summary.data }} />
            </p>
            <ValuesSummary summary={summary.data} treatmentNames={treatmentNames} analysing />
            <LoadingState what="the analysis" />
          </>
        ) : (
          <LoadingState what="the analysis" />
        )
      ) : findings.isError && !data ? (
        noData ? (
          <EmptyState title="No values to analyse yet" description={findings.error.message} />
        ) : (
          <ErrorState title="This analysis could not be made" error={findings.error} onRetry={() => findings.refetch()} />
        )
      ) : data ? (
        <>
          {findings.isError && (
            <Callout intent="warning" role="alert" compact className="fr-gap">
              {findings.error.message} The analysis below is the previous one.
            </Callout>
          )}
          <p className="fr-findings-caption">
            <FindingsCaption findings={data} />
            {findings.isFetching && <span className="fr-muted"> · updating…</span>}
          </p>
          {data.context.modelChoice && (
            <ModelPicker choice={data.context.modelChoice} pending={findings.isFetching} onChoose={(analysis) => choose({ model: analysis === data.context.modelChoice!.defaultAnalysis ? undefined : analysis })} />
          )}
          {isModelFindings(data) ? (
            <ModelFindingsView findings={data} treatmentNames={treatmentNames} siteRounds={siteRounds} />
          ) : (
            <FindingsResultView findings={data} treatmentNames={treatmentNames} interaction={interaction} />
          )}
          {savedQuery && (
            <SnapshotsPanel
              trial={trial}
              query={savedQuery}
              defaultTitle={`${data.context.measure.name}, ${data.context.round.label}, ${data.context.scope.label}${isModelFindings(data) ? ` (${data.context.modelChoice.options.find((o) => o.analysis === data.analysis)?.label.toLowerCase() ?? data.analysis})` : ''}`}
              onOpen={(id) => choose({ analysis: String(id) })}
            />
          )}
          {summary.data && summary.data.round.id === data.context.round.id && <ValuesSummary summary={summary.data} treatmentNames={treatmentNames} />}
        </>
      ) : null}
    </div>
  );
}
