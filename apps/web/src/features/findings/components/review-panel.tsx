import { Button, Callout, Tag, TextArea } from '@blueprintjs/core';
import type { AnalysisSnapshot, SignOff, TrialDetail } from '@friable/contracts';
import { useState, type ReactNode } from 'react';
import { formatDate, roleLabels } from '../../../lib/format';
import { useRequestReview, useSignOffAnalysis } from '../api/sign-off-analysis';
import { OwnSignOffActions } from './own-sign-off-actions';

/** The words beside a sign-off whose data moved on after it. */
export const DATA_CHANGED_WORDS = 'Data changed after sign-off';

/** One sign-off: who, in which role, when, their statement (and whether amended), and whether the data changed since or it was withdrawn. */
export function SignOffLine({ signOff, children }: { signOff: SignOff; children?: ReactNode }) {
  const withdrawn = signOff.state === 'withdrawn';
  return (
    <li className={`fr-sign-off${withdrawn ? ' fr-sign-off--withdrawn' : ''}`}>
      <span>
        <strong>{signOff.name}</strong> <span className="fr-muted">({roleLabels[signOff.role]}), {formatDate(signOff.signedAt)}</span>{' '}
        {withdrawn ? (
          <Tag minimal icon="undo">
            Withdrawn on {formatDate(signOff.withdrawnAt!)}
          </Tag>
        ) : signOff.state === 'data-changed' ? (
          <Tag intent="warning" minimal icon="history">
            {DATA_CHANGED_WORDS}
          </Tag>
        ) : (
          <Tag intent="success" minimal icon="endorsed">
            Signed
          </Tag>
        )}
      </span>
      <q className="fr-sign-off__statement">{signOff.statement}</q>
      {signOff.amendedAt && <span className="fr-muted fr-small">Statement amended on {formatDate(signOff.amendedAt)}.</span>}
      {withdrawn && <span className="fr-small">Why withdrawn: {signOff.withdrawalReason}</span>}
      <span className="fr-muted fr-small">
        Data {signOff.dataHash.slice(0, 12)}…, engine {signOff.engineVersion}
      </span>
      {children}
    </li>
  );
}

/**
 * Review of a saved analysis: where it stands ("Signed by 1 of 2 reviewers"), each sign-off, the investigator's
 * request for review, and the sign-off form for a reviewer (or the investigator of a trial without reviewers).
 */
export function ReviewPanel({ trial, snapshot, meId }: { trial: TrialDetail; snapshot: AnalysisSnapshot; meId?: number }) {
  const { review, signOffs } = snapshot;
  const investigator = trial.myRoles.includes('investigator');
  const mayRole = trial.myRoles.includes('reviewer') || (investigator && review.expectedRole === 'investigator');
  const signedByMe = meId !== undefined && signOffs.some((s) => s.userId === meId && s.state !== 'withdrawn');
  return (
    <section className="fr-snapshots fr-review" aria-labelledby="fr-review-title">
      <h3 id="fr-review-title" className="fr-findings-heading">
        Review{' '}
        <Tag intent={review.expected > 0 && review.signed >= review.expected ? 'success' : 'none'} minimal round>
          {review.label}
        </Tag>
      </h3>
      <p className="fr-muted fr-small">
        {review.awaiting.length > 0 ? `Awaiting: ${review.awaiting.join(', ')}. ` : ''}
        {review.lastRequestedAt ? `Review last requested on ${formatDate(review.lastRequestedAt)}.` : 'No review requested yet.'}
      </p>
      {signOffs.length > 0 && (
        <ul className="fr-sign-offs" aria-label="Sign-offs">
          {signOffs.map((s) => (
            <SignOffLine key={s.id} signOff={s}>
              {meId !== undefined && s.userId === meId && s.state !== 'withdrawn' && <OwnSignOffActions trialId={trial.id} signOff={s} />}
            </SignOffLine>
          ))}
        </ul>
      )}
      {investigator && review.expectedRole === 'reviewer' && <RequestReview trialId={trial.id} analysisId={snapshot.id} />}
      {mayRole && !signedByMe && <SignOffForm trial={trial} snapshot={snapshot} />}
    </section>
  );
}

function RequestReview({ trialId, analysisId }: { trialId: number; analysisId: number }) {
  const request = useRequestReview(trialId, analysisId);
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState('');
  if (!open) {
    return (
      <>
        <Button icon="envelope" text="Ask the reviewers to review" onClick={() => setOpen(true)} />
        {request.isSuccess && (
          <p role="status" className="fr-muted">
            E-mailed {request.data.notified.join(', ') || 'nobody (the e-mails could not be sent)'}.
          </p>
        )}
      </>
    );
  }
  return (
    <form
      className="fr-review__form"
      onSubmit={(event) => {
        event.preventDefault();
        request.mutate(
          { message: message.trim() || null },
          {
            onSuccess: () => {
              setOpen(false);
              setMessage('');
            },
          },
        );
      }}
    >
      <label className="fr-small" htmlFor="fr-review-message">
        A note for the reviewers (optional)
      </label>
      <TextArea id="fr-review-message" value={message} onChange={(e) => setMessage(e.target.value)} fill rows={2} maxLength={2000} />
      {request.error && (
        <p className="fr-error-line" role="alert">
          {request.error.message}
        </p>
      )}
      <div className="fr-findings-actions">
        <Button type="submit" icon="envelope" intent="primary" text="Send the review request" loading={request.isPending} />
        <Button text="Cancel" onClick={() => setOpen(false)} />
      </div>
    </form>
  );
}

function SignOffForm({ trial, snapshot }: { trial: TrialDetail; snapshot: AnalysisSnapshot }) {
  const signOff = useSignOffAnalysis(trial.id, snapshot.id);
  const [statement, setStatement] = useState('');
  if (trial.status !== 'locked') {
    return (
      <Callout icon="lock" className="fr-gap" compact>
        Sign-off opens once the investigator locks the trial, so the data cannot change under your signature.
      </Callout>
    );
  }
  if (snapshot.dataChanged) {
    return (
      <Callout icon="history" intent="warning" className="fr-gap" compact>
        The data changed after this analysis was saved, so it cannot be signed off. Save the analysis again and sign the new one.
      </Callout>
    );
  }
  const ready = statement.trim().length > 0;
  return (
    <form
      className="fr-review__form"
      aria-label="Sign off this analysis"
      onSubmit={(event) => {
        event.preventDefault();
        if (ready) signOff.mutate({ statement: statement.trim() }, { onSuccess: () => setStatement('') });
      }}
    >
      <label className="fr-small" htmlFor="fr-sign-off-statement">
        Your statement (what you checked, in a sentence or two)
      </label>
      <TextArea
        id="fr-sign-off-statement"
        value={statement}
        onChange={(e) => setStatement(e.target.value)}
        // Typed text that arrives without a change event (autofill, some test drivers) still counts.
        onInput={(e) => setStatement((e.target as HTMLTextAreaElement).value)}
        fill
        rows={3}
        maxLength={1000}
      />
      {signOff.error && (
        <p className="fr-error-line" role="alert">
          {signOff.error.message}
        </p>
      )}
      <Button type="submit" icon="endorsed" intent="success" text="Sign off with this statement" loading={signOff.isPending} disabled={!ready} className="fr-gap" />
    </form>
  );
}
