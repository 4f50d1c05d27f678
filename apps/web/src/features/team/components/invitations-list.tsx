import { Button, H4, HTMLTable, Tag } from '@blueprintjs/core';
import type { Invitation } from '@friable/contracts';
import { ConfirmButton } from '../../../components/confirm-button';
import { ErrorState, LoadingState } from '../../../components/states';
import { formatDate, roleLabels } from '../../../lib/format';
import { useChangeInvitation } from '../api/change-invitation';
import { useInvitations } from '../api/get-invitations';

const statusWords: Record<Invitation['status'], string> = { pending: 'Waiting', expired: 'Expired', accepted: 'Joined', revoked: 'Withdrawn' };

/** Invitations not yet answered (waiting or expired), with Resend and Withdraw. */
export function InvitationsList({ trialId }: { trialId: number }) {
  const invitations = useInvitations(trialId, true);
  const change = useChangeInvitation(trialId);
  if (invitations.isPending) return <LoadingState what="the invitations" />;
  if (invitations.isError) return <ErrorState title="The invitations could not be loaded" error={invitations.error} onRetry={() => invitations.refetch()} />;
  const open = invitations.data.filter((i) => i.status === 'pending' || i.status === 'expired');
  return (
    <section className="fr-team__pending" aria-label="Pending invitations">
      <H4>Pending invitations</H4>
      {open.length === 0 ? (
        <p className="fr-muted">No invitations are waiting for an answer.</p>
      ) : (
        <div className="fr-team__scroll">
          <HTMLTable className="fr-team__table" compact striped>
            <thead>
              <tr>
                <th>E-mail</th>
                <th>Role</th>
                <th>Site</th>
                <th>Sent</th>
                <th>Status</th>
                <th>Actions</th>
              </tr>
            </thead>
            <tbody>
              {open.map((invitation) => {
                const busy = change.isPending && change.variables?.invitationId === invitation.id;
                return (
                  <tr key={invitation.id}>
                    <td className="fr-team__email">{invitation.email}</td>
                    <td>{roleLabels[invitation.role]}</td>
                    <td>{invitation.siteName ?? '—'}</td>
                    <td>{formatDate(invitation.sentAt)}</td>
                    <td>
                      <Tag minimal intent={invitation.status === 'expired' ? 'warning' : 'none'}>
                        {invitation.status === 'pending' ? `${statusWords.pending}, until ${formatDate(invitation.expiresAt)}` : statusWords[invitation.status]}
                      </Tag>
                    </td>
                    <td className="fr-team__actions">
                      <Button
                        variant="minimal"
                        size="small"
                        icon="refresh"
                        text="Resend"
                        aria-label={`Resend the invitation to ${invitation.email}`}
                        loading={busy && change.variables?.change === 'resend'}
                        onClick={() => change.mutate({ invitationId: invitation.id, change: 'resend' })}
                      />
                      <ConfirmButton
                        text="Withdraw"
                        confirmText="Withdraw invitation"
                        ariaLabel={`Withdraw the invitation to ${invitation.email}`}
                        question={`Withdraw the invitation to ${invitation.email}? Their link will stop working.`}
                        loading={busy && change.variables?.change === 'revoke'}
                        onConfirm={() => change.mutate({ invitationId: invitation.id, change: 'revoke' })}
                      />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
        </div>
      )}
      {change.isError && (
        <p className="fr-team__error" role="alert">
          {change.error.message}
        </p>
      )}
      {change.isSuccess && change.data.status === 'pending' && (
        <p className="fr-muted" role="status">
          A new link was sent to {change.data.email}; the earlier one no longer works.
        </p>
      )}
    </section>
  );
}
