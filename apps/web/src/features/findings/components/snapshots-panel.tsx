import { Button, InputGroup, Tag } from '@blueprintjs/core';
import type { FindingsModelsQuery, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { formatDate } from '../../../lib/format';
import { useAnalyses } from '../../../lib/api/get-analyses';
import { useSaveAnalysis } from '../api/save-analysis';
import { DATA_CHANGED_WORDS } from './review-panel';

/** "Save this analysis" (investigators and reviewers) — the classical ANOVA or the model on screen, with its options — and the list of saved analyses, each opened with its stored numbers. */
export function SnapshotsPanel({ trial, query, defaultTitle, onOpen }: { trial: TrialDetail; query: FindingsModelsQuery; defaultTitle: string; onOpen: (analysisId: number) => void }) {
  const analyses = useAnalyses(trial.id);
  const save = useSaveAnalysis(trial.id);
  const [title, setTitle] = useState('');
  const canSave = trial.myRoles.includes('investigator') || trial.myRoles.includes('reviewer');
  return (
    <section className="fr-snapshots" aria-labelledby="fr-snapshots-title">
      <h3 id="fr-snapshots-title" className="fr-findings-heading">
        Saved analyses
      </h3>
      {canSave && (
        <form
          className="fr-findings-actions"
          onSubmit={(event) => {
            event.preventDefault();
            save.mutate({ ...query, title: title.trim() || defaultTitle }, { onSuccess: () => setTitle('') });
          }}
        >
          <InputGroup aria-label="Title of the saved analysis" placeholder={defaultTitle} value={title} onChange={(e) => setTitle(e.target.value)} />
          <Button type="submit" icon="floppy-disk" intent="primary" text="Save this analysis" loading={save.isPending} />
        </form>
      )}
      {save.error && (
        <p className="fr-error-line" role="alert">
          {save.error.message}
        </p>
      )}
      {save.isSuccess && <p className="fr-muted" role="status">Saved as “{save.data.title}”.</p>}
      {analyses.isPending ? (
        <p className="fr-muted">Loading the saved analyses…</p>
      ) : analyses.isError ? (
        <p className="fr-error-line">The saved analyses could not be loaded: {analyses.error.message}</p>
      ) : analyses.data.length === 0 ? (
        <p className="fr-muted">No analysis of this trial has been saved yet.</p>
      ) : (
        <ul className="fr-snapshots__list" aria-label="Saved analyses">
          {analyses.data.map((a) => (
            <li key={a.id}>
              <Button variant="minimal" intent="primary" text={a.title} onClick={() => onOpen(a.id)} aria-label={`Open the saved analysis ${a.title}`} />
              <span className="fr-muted fr-small">
                {a.measureName} · {a.roundLabel} · {a.scopeLabel} · {a.analysisLabel} · saved by {a.createdBy ?? 'someone'} on {formatDate(a.createdAt)}
                {a.commentCount > 0 ? ` · ${a.commentCount} comment${a.commentCount === 1 ? '' : 's'}` : ''}
              </span>
              <Tag intent={a.review.expected > 0 && a.review.signed >= a.review.expected ? 'success' : 'none'} minimal icon="endorsed">
                {a.review.label}
              </Tag>
              {a.signOffs.some((s) => s.state === 'data-changed') && (
                <Tag intent="warning" minimal icon="history">
                  {DATA_CHANGED_WORDS}
                </Tag>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
