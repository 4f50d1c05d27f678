import { Button, Callout, Card, H4, HTMLSelect, InputGroup, TextArea } from '@blueprintjs/core';
import type { TrialDetail, TrialRole } from '@friable/contracts';
import { useState, type FormEvent } from 'react';
import { Field, FormErrorCallout } from '../../../components/field-errors';
import { roleLabels } from '../../../lib/format';
import { useCreateInvitation } from '../api/create-invitation';

const roleHelp: Record<TrialRole, string> = {
  collaborator: 'Runs the trial at one site and records its data there.',
  reviewer: 'Reads the protocol, data and findings; writes no data.',
  investigator: 'Manages the protocol, the sites and the team, like you.',
};

/** The investigator's form to invite someone by e-mail, with a role and, for collaborators, a site. */
export function InviteForm({ trial }: { trial: TrialDetail }) {
  const create = useCreateInvitation(trial.id);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<TrialRole>('collaborator');
  const [siteId, setSiteId] = useState<string>('');
  const [message, setMessage] = useState('');
  const [sentTo, setSentTo] = useState<string | null>(null);

  function submit(event: FormEvent) {
    event.preventDefault();
    setSentTo(null);
    create.mutate(
      { email: email.trim(), role, siteId: role === 'collaborator' && siteId ? Number(siteId) : null, message: message.trim() || null },
      {
        onSuccess: (invitation) => {
          setSentTo(invitation.email);
          setEmail('');
          setMessage('');
        },
      },
    );
  }

  return (
    <Card elevation={0} className="fr-team__invite" aria-label="Invite someone">
      <H4>Invite someone</H4>
      <p className="fr-muted">Friable e-mails them a link to join. The link works once and expires; the e-mail says when.</p>
      {sentTo && (
        <Callout intent="success" icon="envelope" className="fr-gap" role="status">
          Invitation sent to {sentTo}.
        </Callout>
      )}
      <FormErrorCallout error={create.error} shownFields={['email', 'role', 'siteId', 'message']} />
      <form onSubmit={submit} noValidate className="fr-team__form">
        <Field label="E-mail" field="email" error={create.error}>
          <InputGroup id="fr-field-email" type="email" value={email} onValueChange={setEmail} placeholder="name@example.org" />
        </Field>
        <Field label="Role" field="role" error={create.error} help={roleHelp[role]}>
          <HTMLSelect id="fr-field-role" value={role} onChange={(e) => setRole(e.currentTarget.value as TrialRole)} fill>
            {(['collaborator', 'reviewer', 'investigator'] as const).map((r) => (
              <option key={r} value={r}>
                {roleLabels[r]}
              </option>
            ))}
          </HTMLSelect>
        </Field>
        {role === 'collaborator' && (
          <Field
            label="Site"
            field="siteId"
            error={create.error}
            help={trial.sites.length ? 'The garden this person will run.' : 'Add the trial’s sites first: a collaborator is invited to one site.'}
          >
            <HTMLSelect id="fr-field-siteId" value={siteId} onChange={(e) => setSiteId(e.currentTarget.value)} fill>
              <option value="">Choose a site…</option>
              {trial.sites.map((site) => (
                <option key={site.id} value={site.id}>
                  {site.name}
                </option>
              ))}
            </HTMLSelect>
          </Field>
        )}
        <Field label="Personal note (optional)" field="message" error={create.error} help="Included in the e-mail.">
          <TextArea id="fr-field-message" value={message} onChange={(e) => setMessage(e.currentTarget.value)} rows={2} fill maxLength={1000} />
        </Field>
        <Button type="submit" intent="primary" icon="envelope" text="Send invitation" loading={create.isPending} />
      </form>
    </Card>
  );
}
