import { Button, Callout, Tag } from '@blueprintjs/core';
import { isModelFindings, type TrialDetail } from '@friable/contracts';
import { ErrorState, LoadingState } from '../../../components/states';
import { formatDate } from '../../../lib/format';
import { useAnalysis } from '../../../lib/api/get-analysis';
import { CommentThreads } from './comment-threads';
import { FindingsCaption, FindingsResultView } from './findings-result-view';
import { ModelFindingsView } from './models/model-findings-view';
import { ReviewPanel } from './review-panel';

/** One saved analysis: its stored numbers (never recomputed), a notice when the data changed since, its review and comment threads. */
export function SnapshotView({
  trial,
  analysisId,
  treatmentNames,
  meId,
  onClose,
}: {
  trial: TrialDetail;
  analysisId: number;
  treatmentNames?: Record<string, string>;
  /** The signed-in person, whose own comments and sign-off the page recognises. */
  meId?: number;
  onClose: () => void;
}) {
  const snapshot = useAnalysis(trial.id, analysisId);
  if (snapshot.isPending) return <LoadingState what="the saved analysis" />;
  if (snapshot.isError) return <ErrorState title="This saved analysis could not be opened" error={snapshot.error} onRetry={() => snapshot.refetch()} />;
  const s = snapshot.data;
  return (
    <div className="fr-findings fr-snapshot">
      <div className="fr-findings-actions">
        <Button icon="arrow-left" text="Back to the live analysis" onClick={onClose} />
      </div>
      <h3 className="fr-findings-heading">Saved analysis: {s.title}</h3>
      <p className="fr-findings-caption">
        <FindingsCaption findings={s.result} /> · {s.analysisLabel} · saved by {s.createdBy ?? 'someone'} on {formatDate(s.createdAt)}
        {' '}
        <Tag intent={s.review.expected > 0 && s.review.signed >= s.review.expected ? 'success' : 'none'} minimal icon="endorsed">
          {s.review.label}
        </Tag>
      </p>
      {s.dataChanged ? (
        <Callout intent="warning" icon="history" role="status" className="fr-gap" title="The data have changed since this analysis was saved">
          These are the numbers as they were saved. Values of this measure and round have been added or changed since; the live analysis shows today’s numbers.
        </Callout>
      ) : (
        <p className="fr-muted fr-small">The data have not changed since this analysis was saved.</p>
      )}
      {isModelFindings(s.result) ? (
        <>
          <p className="fr-muted fr-small">{s.result.context.modelChoice.why}</p>
          <ModelFindingsView findings={s.result} treatmentNames={treatmentNames ?? Object.fromEntries(trial.treatments.map((t) => [t.code, t.name]))} />
        </>
      ) : (
        <FindingsResultView findings={s.result} treatmentNames={treatmentNames} />
      )}
      <ReviewPanel trial={trial} snapshot={s} meId={meId} />
      <CommentThreads trial={trial} analysisId={analysisId} meId={meId} />
    </div>
  );
}
