import { Button, Callout, H3, HTMLTable, Tag } from '@blueprintjs/core';
import type { Member, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { ConfirmButton } from '../../../components/confirm-button';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatDate, roleLabels } from '../../../lib/format';
import { useMembers } from '../../../lib/api/get-members';
import { useRemoveMember } from '../api/change-member';
import { InvitationsList } from './invitations-list';
import { MemberDialog } from './member-dialog';
import { teamPeople, type TeamPerson } from './team-people';
import { InviteForm } from './invite-form';

/** Team: who is on the trial with which role and site; the investigator also changes roles and sites, removes people, invites and follows up. */
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
        <MembersTable trial={trial} members={members.data} manages={manages} />
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

function MembersTable({ trial, members, manages }: { trial: TrialDetail; members: Member[]; manages: boolean }) {
  const remove = useRemoveMember(trial.id);
  const [changing, setChanging] = useState<TeamPerson | null>(null);
  const people = teamPeople(members);
  const investigators = people.filter((p) => p.roles.includes('investigator')).length;
  return (
    <div className="fr-team__scroll">
      {remove.error && (
        <Callout intent="danger" role="alert" className="fr-gap">
          {remove.error.message}
        </Callout>
      )}
      <HTMLTable className="fr-team__table" compact striped aria-label="Members">
        <thead>
          <tr>
            <th>Name</th>
            <th>E-mail</th>
            <th>Role</th>
            <th>Site</th>
            <th>Since</th>
            {manages && <th>Change</th>}
          </tr>
        </thead>
        <tbody>
          {people.map((person) => {
            const lastInvestigator = person.roles.includes('investigator') && investigators <= 1;
            return (
              <tr key={person.userId}>
                <td>{person.name}</td>
                <td className="fr-team__email">{person.email}</td>
                <td>
                  {person.roles.map((role) => (
                    <Tag key={role} minimal className={`fr-team__role fr-team__role--${role}`}>
                      {roleLabels[role]}
                    </Tag>
                  ))}
                </td>
                <td>{person.siteNames.length ? person.siteNames.join(', ') : person.roles.includes('collaborator') ? 'No site' : '—'}</td>
                <td>{formatDate(person.since)}</td>
                {manages && (
                  <td className="fr-team__actions">
                    <Button variant="minimal" size="small" icon="edit" text="Role and sites" aria-label={`Change the role and sites of ${person.name}`} onClick={() => setChanging(person)} />
                    {lastInvestigator ? (
                      <span className="fr-muted fr-small">Only investigator</span>
                    ) : (
                      <ConfirmButton
                        text="Remove"
                        ariaLabel={`Remove ${person.name} from the trial`}
                        confirmText={`Remove ${person.name}`}
                        loading={remove.isPending && remove.variables === person.userId}
                        question={
                          <>
                            <p>
                              Remove <strong>{person.name}</strong> ({person.email}) from this trial?
                            </p>
                            <p>They lose access at once and get an e-mail saying so. Everything they recorded stays in the trial under their name. To bring them back, invite them again.</p>
                          </>
                        }
                        onConfirm={() => remove.mutate(person.userId)}
                      />
                    )}
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      {changing && <MemberDialog trial={trial} person={changing} onClose={() => setChanging(null)} />}
    </div>
  );
}
