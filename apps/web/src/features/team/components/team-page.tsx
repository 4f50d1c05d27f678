import { Callout, H3, HTMLTable, Tag } from '@blueprintjs/core';
import type { Member, TrialDetail } from '@friable/contracts';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatDate, roleLabels } from '../../../lib/format';
import { useMembers } from '../../../lib/api/get-members';
import { InvitationsList } from './invitations-list';
import { InviteForm } from './invite-form';

/** Team: who is on the trial with which role and site; the investigator also invites people and follows up. */
export function TeamPage({ trial }: { trial: TrialDetail }) {
  const members = useMembers(trial.id);
  const manages = trial.myRoles.includes('investigator');
  return (
    <div className="fr-team">
      <div className="fr-team__head">
        <H3>Team</H3>
      </div>
      {!manages && (
        <Callout icon="info-sign" className="fr-gap">
          The investigator manages the team. You can see who takes part and where.
        </Callout>
      )}
      {members.isPending ? (
        <LoadingState what="the team" />
      ) : members.isError ? (
        <ErrorState title="The team could not be loaded" error={members.error} onRetry={() => members.refetch()} />
      ) : members.data.length === 0 ? (
        <EmptyState title="Nobody on the team yet" description="Invite the people who will run the trial at each site." />
      ) : (
        <MembersTable members={members.data} />
      )}
      {manages && (
        <>
          <InviteForm trial={trial} />
          <InvitationsList trialId={trial.id} />
        </>
      )}
    </div>
  );
}

function MembersTable({ members }: { members: Member[] }) {
  return (
    <div className="fr-team__scroll">
      <HTMLTable className="fr-team__table" compact striped aria-label="Members">
        <thead>
          <tr>
            <th>Name</th>
            <th>E-mail</th>
            <th>Role</th>
            <th>Site</th>
            <th>Since</th>
          </tr>
        </thead>
        <tbody>
          {members.map((member) => (
            <tr key={member.membershipId}>
              <td>{member.name}</td>
              <td className="fr-team__email">{member.email}</td>
              <td>
                <Tag minimal className={`fr-team__role fr-team__role--${member.role}`}>
                  {roleLabels[member.role]}
                </Tag>
              </td>
              <td>{member.siteName ?? (member.role === 'collaborator' ? 'No site' : '—')}</td>
              <td>{formatDate(member.since)}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
