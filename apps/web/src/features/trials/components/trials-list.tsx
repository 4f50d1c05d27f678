import { Button, Card, H2, H3, Tag } from '@blueprintjs/core';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { designLabels, formatDate, roleLabels } from '../../../lib/format';
import { useTrials } from '../api/get-trials';
import { TrialStatusTag } from '../../../components/trial-status-tag';
import { NewTrialDialog } from './new-trial-dialog';

export function TrialsList() {
  const trials = useTrials();
  const [creating, setCreating] = useState(false);
  if (trials.isPending) return <LoadingState what="your trials" />;
  if (trials.isError) return <ErrorState title="Your trials could not be loaded" error={trials.error} onRetry={() => trials.refetch()} />;
  return (
    <section aria-labelledby="trials-heading">
      <div className="fr-page-head">
        <H2 id="trials-heading">Trials</H2>
        <Button icon="add" intent="primary" text="New trial" onClick={() => setCreating(true)} />
      </div>
      <NewTrialDialog isOpen={creating} onClose={() => setCreating(false)} />
      {trials.data.length === 0 ? (
        <EmptyState
          title="No trials yet"
          description="When an investigator adds you to a trial, or you start one yourself, it appears here."
        />
      ) : (
        <ul className="fr-card-list">
          {trials.data.map((trial) => (
            <li key={trial.id}>
              <Card interactive elevation={0} className="fr-trial-card">
                <Link to={paths.trial.href(trial.id)} className="fr-trial-card__link">
                  <H3 className="fr-trial-card__title">{trial.title}</H3>
                </Link>
                <div className="fr-trial-card__meta">
                  <span className="fr-code">{trial.code}</span>
                  <TrialStatusTag status={trial.status} />
                  <span>{designLabels[trial.design] ?? trial.design}</span>
                  <span className="fr-muted">updated {formatDate(trial.updatedAt)}</span>
                </div>
                <div className="fr-trial-card__roles" aria-label="Your roles">
                  {trial.myRoles.length === 0 ? (
                    <Tag minimal>Administrator (read only)</Tag>
                  ) : (
                    trial.myRoles.map((role) => (
                      <Tag key={role} minimal className={`fr-role fr-role--${role}`}>
                        {roleLabels[role]}
                      </Tag>
                    ))
                  )}
                </div>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
