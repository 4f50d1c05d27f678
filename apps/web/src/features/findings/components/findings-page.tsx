import { isModelFindings, type FindingsAnalysis, type FindingsModelsQuery, type FindingsQuery, type TrialDetail } from '@friable/contracts';
import { useEffect, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { preloadPlotly } from '../../../lib/preload-plotly';
import { findingsQueryOptions, getAnovaFindings, useFindings } from '../api/get-findings';
import { useFindingsSummary } from '../api/get-findings-summary';
import { useSiteRounds } from '../hooks/use-site-rounds';
import { useSiteMeans } from '../hooks/use-site-means';
import { AnalysisChoices, OptionChoice, type AnalysisOptions } from './analysis-choices';
import { readChoices, type Choose } from './findings-choices';
import { FindingsActions } from './findings-actions';
import { FindingsResults } from './findings-results';
import { ModelOptions } from './model-options';
import { SnapshotView } from './snapshot-view';

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
  const treatmentNames = useMemo(() => Object.fromEntries(trial.treatments.map((t) => [t.code, t.name])), [trial.treatments]);

  const choose: Choose = (next) => {
    const merged = new URLSearchParams(params);
    for (const [key, value] of Object.entries(next)) {
      if (value === undefined || value === '') merged.delete(key);
      else merged.set(key, value);
    }
    setParams(merged, { replace: true });
  };

  if (!measure) return <EmptyState title="No measures yet" description="The protocol needs a measure before there is anything to analyse." />;
  if (!round) return <EmptyState title="No rounds for this measure" description={`No assessment round records ${measure.name} yet.`} />;
  const openAnalysis = Number(params.get('analysis')) || null;
  if (openAnalysis) return <SnapshotView trial={trial} analysisId={openAnalysis} treatmentNames={treatmentNames} meId={meId} onClose={() => choose({ analysis: undefined })} />;
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
        after={<ModelOptions trial={trial} analysis={shownAnalysis} choices={choices} data={findings.data} choose={choose} />}
        before={
          <>
            <OptionChoice
              label="Measure"
              value={measure.id}
              options={measures.map((m) => ({ value: m.id, label: m.name }))}
              onChange={(value) => choose({ measure: value, round: undefined, model: undefined, covMeasure: undefined, covRound: undefined })}
            />
            <OptionChoice label="Round" value={round.id} options={rounds.map((r) => ({ value: r.id, label: r.label }))} onChange={(value) => choose({ round: value })} />
            <OptionChoice
              label="Scope"
              value={siteId ?? ''}
              options={[...(combinable ? [{ value: '', label: 'All sites combined' }] : []), ...trial.sites.map((s) => ({ value: s.id, label: s.name }))]}
              onChange={(value) => choose({ site: value || undefined })}
            />
          </>
        }
      />
      <FindingsActions
        trial={trial}
        bundleQuery={query && findings.data ? { ...query, ...(analysedRoundId ? { roundId: analysedRoundId } : {}), analysis: shownAnalysis } : null}
        reportHref={paths.trialReport.href(trial.id, {
          round: analysedRoundId ?? chosenRound?.id,
          site: query?.siteId,
          sites: combined && options.sitesAre === 'fixed' ? 'fixed' : undefined,
          method: options.method,
          alpha: options.alpha,
        })}
      />
      <FindingsResults trial={trial} findings={findings} summary={summary} treatmentNames={treatmentNames} interaction={interaction} siteRounds={siteRounds} savedQuery={savedQuery} choose={choose} />
    </div>
  );
}
