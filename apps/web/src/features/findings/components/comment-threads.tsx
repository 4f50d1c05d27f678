import { Button, Tag } from '@blueprintjs/core';
import type { SnapshotComment, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { z } from 'zod';
import { ConfirmButton } from '../../../components/confirm-button';
import { formatDate } from '../../../lib/format';
import { useAddAnalysisComment, useChangeAnalysisComment, useDeleteAnalysisComment } from '../api/add-analysis-comment';
import { useAnalysisComments } from '../api/get-analysis-comments';
import { TextAreaForm } from './text-area-form';

type Props = { trial: TrialDetail; analysisId: number; meId?: number };

/** A comment as typed: some words, at most 4,000 characters (the server checks again). */
const commentSchema = z.object({ text: z.string().trim().min(1, 'Write the comment first.').max(4000, 'A comment is at most 4,000 characters.') });

/** A text box with its send button, for a new comment, a reply or an edit. */
function CommentForm(props: { label: string; submitText: string; initial?: string; pending: boolean; error: Error | null; onSubmit: (body: string, clear: () => void) => void; onCancel?: () => void }) {
  return <TextAreaForm {...props} schema={commentSchema} maxLength={4000} icon="comment" />;
}

function History({ comment }: { comment: SnapshotComment }) {
  const [open, setOpen] = useState(false);
  if (comment.revisions.length === 0) return null;
  return (
    <>
      <Button variant="minimal" size="small" text={open ? 'Hide the history' : 'History'} onClick={() => setOpen(!open)} aria-expanded={open} />
      {open && (
        <ol className="fr-comment__history" aria-label="Earlier versions">
          {comment.revisions.map((r) => (
            <li key={r.at + r.kind}>
              <span className="fr-muted fr-small">
                {r.kind === 'edited' ? 'Before an edit' : 'Before deletion'} by {r.byName ?? 'someone'}, {formatDate(r.at)}:
              </span>{' '}
              {r.body}
            </li>
          ))}
        </ol>
      )}
    </>
  );
}

/** One comment: its text (or that it was deleted), who and when, "edited", and the author's and reviewers' actions. */
function CommentItem({ trial, analysisId, meId, comment, replies }: Props & { comment: SnapshotComment; replies?: SnapshotComment[] }) {
  const change = useChangeAnalysisComment(trial.id, analysisId);
  const remove = useDeleteAnalysisComment(trial.id, analysisId);
  const reply = useAddAnalysisComment(trial.id, analysisId);
  const [editing, setEditing] = useState(false);
  const [replying, setReplying] = useState(false);
  const mine = meId !== undefined && comment.authorId === meId;
  const thread = replies !== undefined;
  const mayResolve = mine || trial.myRoles.includes('investigator') || trial.myRoles.includes('reviewer');
  const deleted = comment.deletedAt !== null;
  return (
    <li className={`fr-comment${comment.resolvedAt ? ' fr-comment--resolved' : ''}`} aria-label={`Comment by ${comment.authorName ?? 'someone'}`}>
      <div className="fr-muted fr-small">
        {comment.authorName ?? 'Someone'}, {formatDate(comment.createdAt)}
        {comment.editedAt && !deleted && (
          <Tag minimal className="fr-comment__tag">
            edited
          </Tag>
        )}
        {comment.resolvedAt && (
          <Tag minimal intent="success" icon="tick" className="fr-comment__tag">
            Resolved by {comment.resolvedByName ?? 'someone'}
          </Tag>
        )}
      </div>
      {deleted ? (
        <p className="fr-muted fr-comment__body">
          <em>This comment was deleted on {formatDate(comment.deletedAt!)}.</em>
        </p>
      ) : editing ? (
        <CommentForm
          label="Edit your comment"
          submitText="Save the change"
          initial={comment.body}
          pending={change.isPending}
          error={change.error}
          onSubmit={(body) => change.mutate({ commentId: comment.id, version: comment.version, body }, { onSuccess: () => setEditing(false) })}
          onCancel={() => setEditing(false)}
        />
      ) : (
        <p className="fr-comment__body">{comment.body}</p>
      )}
      {!editing && (
        <div className="fr-comment__actions">
          {thread && !deleted && <Button variant="minimal" size="small" icon="comment" text="Reply" onClick={() => setReplying(true)} />}
          {mine && !deleted && <Button variant="minimal" size="small" icon="edit" text="Edit" onClick={() => setEditing(true)} />}
          {mine && !deleted && (
            <ConfirmButton
              text="Delete"
              confirmText="Delete the comment"
              ariaLabel="Delete this comment"
              loading={remove.isPending}
              question="Delete this comment? It will show as deleted; its text stays in the analysis history, and replies stay."
              onConfirm={() => remove.mutate({ commentId: comment.id, version: comment.version })}
            />
          )}
          {thread && mayResolve && !deleted && (
            <Button
              variant="minimal"
              size="small"
              icon={comment.resolvedAt ? 'refresh' : 'tick'}
              text={comment.resolvedAt ? 'Reopen' : 'Mark resolved'}
              loading={change.isPending}
              onClick={() => change.mutate({ commentId: comment.id, version: comment.version, resolved: !comment.resolvedAt })}
            />
          )}
          <History comment={comment} />
        </div>
      )}
      {(change.error || remove.error) && !editing && (
        <p className="fr-error-line" role="alert">
          {(change.error ?? remove.error)?.message}
        </p>
      )}
      {replies && replies.length > 0 && (
        <ul className="fr-comment__replies" aria-label="Replies">
          {replies.map((r) => (
            <CommentItem key={r.id} trial={trial} analysisId={analysisId} meId={meId} comment={r} />
          ))}
        </ul>
      )}
      {replying && (
        <CommentForm
          label="Your reply"
          submitText="Send the reply"
          pending={reply.isPending}
          error={reply.error}
          onSubmit={(body) => reply.mutate({ body, parentId: comment.id }, { onSuccess: () => setReplying(false) })}
          onCancel={() => setReplying(false)}
        />
      )}
    </li>
  );
}

/** The comment threads of a saved analysis: open threads first, resolved ones after, each with its replies. */
export function CommentThreads({ trial, analysisId, meId }: Props) {
  const comments = useAnalysisComments(trial.id, analysisId);
  const add = useAddAnalysisComment(trial.id, analysisId);
  const all = comments.data ?? [];
  const roots = all.filter((c) => c.parentId === null).sort((a, b) => Number(a.resolvedAt !== null) - Number(b.resolvedAt !== null) || a.id - b.id);
  return (
    <section className="fr-snapshots" aria-labelledby="fr-comments-title">
      <h3 id="fr-comments-title" className="fr-findings-heading">
        Comments
      </h3>
      {comments.isPending ? (
        <p className="fr-muted">Loading the comments…</p>
      ) : comments.isError ? (
        <p className="fr-error-line">The comments could not be loaded: {comments.error.message}</p>
      ) : roots.length === 0 ? (
        <p className="fr-muted">No comments yet.</p>
      ) : (
        <ul className="fr-snapshot-comments" aria-label="Comments">
          {roots.map((c) => (
            <CommentItem key={c.id} trial={trial} analysisId={analysisId} meId={meId} comment={c} replies={all.filter((r) => r.parentId === c.id)} />
          ))}
        </ul>
      )}
      <CommentForm label="Your comment" submitText="Add the comment" pending={add.isPending} error={add.error} onSubmit={(body, clear) => add.mutate({ body }, { onSuccess: clear })} />
    </section>
  );
}
