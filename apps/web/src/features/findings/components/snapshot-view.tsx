import { Button, Callout, Tag, TextArea } from '@blueprintjs/core';
import type { TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { ErrorState, LoadingState } from '../../../components/states';
import { formatDate } from '../../../lib/format';
import { useAddAnalysisComment } from '../api/add-analysis-comment';
import { useAnalysis } from '../../../lib/api/get-analysis';
import { useAnalysisComments } from '../api/get-analysis-comments';
import { useSignOffAnalysis } from '../api/sign-off-analysis';
import { FindingsCaption, FindingsResultView } from './findings-result-view';

/** One saved analysis: its stored numbers (never recomputed), a notice when the data changed since, the sign-off and the review comments. */
export function SnapshotView({ trial, analysisId, treatmentNames, onClose }: { trial: TrialDetail; analysisId: number; treatmentNames?: Record<string, string>; onClose: () => void }) {
  const snapshot = useAnalysis(trial.id, analysisId);
  const signOff = useSignOffAnalysis(trial.id, analysisId);
  const investigator = trial.myRoles.includes('investigator');
  if (snapshot.isPending) return <LoadingState what="the saved analysis" />;
  if (snapshot.isError) return <ErrorState title="This saved analysis could not be opened" error={snapshot.error} onRetry={() => snapshot.refetch()} />;
  const s = snapshot.data;
  return (
    <div className="fr-findings fr-snapshot">
      <div className="fr-findings-actions">
        <Button icon="arrow-left" text="Back to the live analysis" onClick={onClose} />
        {investigator && !s.signedOffAt && <Button icon="endorsed" intent="success" text="Sign off this analysis" loading={signOff.isPending} onClick={() => signOff.mutate()} />}
      </div>
      <h3 className="fr-findings-heading">Saved analysis: {s.title}</h3>
      <p className="fr-findings-caption">
        <FindingsCaption findings={s.result} /> · saved by {s.createdBy ?? 'someone'} on {formatDate(s.createdAt)}
        {s.signedOffAt && (
          <>
            {' '}
            <Tag intent="success" minimal icon="endorsed">
              Signed off{s.signedOffBy ? ` by ${s.signedOffBy}` : ''} on {formatDate(s.signedOffAt)}
            </Tag>
          </>
        )}
      </p>
      {signOff.error && (
        <Callout intent="warning" role="alert" compact className="fr-gap">
          {signOff.error.message}
        </Callout>
      )}
      {s.dataChanged ? (
        <Callout intent="warning" icon="history" role="status" className="fr-gap" title="The data have changed since this analysis was saved">
          These are the numbers as they were saved. Values of this measure and round have been added or changed since; the live analysis shows today’s numbers.
        </Callout>
      ) : (
        <p className="fr-muted fr-small">The data have not changed since this analysis was saved.</p>
      )}
      <FindingsResultView findings={s.result} treatmentNames={treatmentNames} />
      <SnapshotComments trialId={trial.id} analysisId={analysisId} />
    </div>
  );
}

function SnapshotComments({ trialId, analysisId }: { trialId: number; analysisId: number }) {
  const comments = useAnalysisComments(trialId, analysisId);
  const add = useAddAnalysisComment(trialId, analysisId);
  const [body, setBody] = useState('');
  return (
    <section className="fr-snapshots" aria-labelledby="fr-comments-title">
      <h3 id="fr-comments-title" className="fr-findings-heading">
        Comments
      </h3>
      {comments.isPending ? (
        <p className="fr-muted">Loading the comments…</p>
      ) : comments.isError ? (
        <p className="fr-error-line">The comments could not be loaded: {comments.error.message}</p>
      ) : comments.data.length === 0 ? (
        <p className="fr-muted">No comments yet.</p>
      ) : (
        <ul className="fr-snapshot-comments" aria-label="Comments">
          {comments.data.map((c) => (
            <li key={c.id}>
              <span className="fr-muted fr-small">
                {c.authorName ?? 'Someone'}, {formatDate(c.createdAt)}:
              </span>{' '}
              {c.body}
            </li>
          ))}
        </ul>
      )}
      <form
        onSubmit={(event) => {
          event.preventDefault();
          if (body.trim()) add.mutate({ body: body.trim() }, { onSuccess: () => setBody('') });
        }}
      >
        <TextArea aria-label="Your comment" value={body} onChange={(e) => setBody(e.target.value)} fill rows={3} placeholder="What should the investigator look at?" />
        {add.error && (
          <p className="fr-error-line" role="alert">
            {add.error.message}
          </p>
        )}
        <Button type="submit" icon="comment" text="Add the comment" loading={add.isPending} disabled={!body.trim()} className="fr-gap" />
      </form>
    </section>
  );
}
