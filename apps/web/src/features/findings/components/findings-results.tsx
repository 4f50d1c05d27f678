import { Callout } from '@blueprintjs/core';
import { isModelFindings, type FindingsModelsQuery, type TrialDetail } from '@friable/contracts';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { ApiError } from '../../../lib/api-client';
import type { useFindings } from '../api/get-findings';
import type { useFindingsSummary } from '../api/get-findings-summary';
import type { useSiteMeans } from '../hooks/use-site-means';
import type { useSiteRounds } from '../hooks/use-site-rounds';
import type { Choose } from './findings-choices';
import { FindingsCaption, FindingsResultView } from './findings-result-view';
import { ModelFindingsView } from './models/model-findings-view';
import { ModelPicker } from './models/model-picker';
import { SnapshotsPanel } from './snapshots-panel';
import { ValuesSummary } from './values-summary';

interface ResultsProps {
  trial: TrialDetail;
  findings: ReturnType<typeof useFindings>;
  summary: ReturnType<typeof useFindingsSummary>;
  treatmentNames: Record<string, string>;
  interaction: ReturnType<typeof useSiteMeans>;
  siteRounds: ReturnType<typeof useSiteRounds>;
  /** What "Save this analysis" keeps, once the analysis has answered. */
  savedQuery: FindingsModelsQuery | null;
  choose: Choose;
}

/** The analysis as it comes: the values as recorded while it is computed, then its tables and plots, its saved copies and the values again. */
export function FindingsResults({ trial, findings, summary, treatmentNames, interaction, siteRounds, savedQuery, choose }: ResultsProps) {
  const data = findings.data;
  if (findings.isPending)
    return summary.data ? (
      <>
        <p className="fr-findings-caption">
          <FindingsCaption findings={{ context: summary.data }} />
        </p>
        <ValuesSummary summary={summary.data} treatmentNames={treatmentNames} analysing />
        <LoadingState what="the analysis" />
      </>
    ) : (
      <LoadingState what="the analysis" />
    );
  if (findings.isError && !data) {
    const noData = findings.error instanceof ApiError && findings.error.status === 422 && /no values/i.test(findings.error.message);
    return noData ? <EmptyState title="No values to analyse yet" description={findings.error.message} /> : <ErrorState title="This analysis could not be made" error={findings.error} onRetry={() => findings.refetch()} />;
  }
  if (!data) return null;
  return (
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
      {isModelFindings(data) ? <ModelFindingsView findings={data} treatmentNames={treatmentNames} siteRounds={siteRounds} /> : <FindingsResultView findings={data} treatmentNames={treatmentNames} interaction={interaction} />}
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
  );
}
