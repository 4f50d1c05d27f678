import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Card, H4 } from '@blueprintjs/core';
import { TRIAL_ROLES, type TrialDetail, type TrialRole } from '@friable/contracts';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { FormErrorCallout } from '../../../components/field-errors';
import { SelectField, TextAreaField, TextField } from '../../../components/form-fields';
import { roleLabels } from '../../../lib/format';
import { emailRule, optionalTextRule } from '../../../lib/form-rules';
import { useCreateInvitation } from '../api/create-invitation';

const roleHelp: Record<TrialRole, string> = {
  collaborator: 'Runs the trial at one site and records its data there.',
  reviewer: 'Reads the protocol, data and findings; writes no data.',
  investigator: 'Manages the protocol, the sites and the team, like you.',
};

/** An invitation as typed: a collaborator needs a site (they run one garden); the others get none. */
const inviteSchema = z
  .object({
    email: emailRule,
    role: z.enum(TRIAL_ROLES),
    siteId: z.string(),
    message: optionalTextRule('A personal note', 1000),
  })
  .refine((values) => values.role !== 'collaborator' || values.siteId !== '', { path: ['siteId'], message: 'Choose the site this collaborator will run.' });
type InviteValues = z.infer<typeof inviteSchema>;

const emptyInvitation: InviteValues = { email: '', role: 'collaborator', siteId: '', message: '' };

/** The investigator's form to invite someone by e-mail, with a role and, for collaborators, a site. */
export function InviteForm({ trial }: { trial: TrialDetail }) {
  const create = useCreateInvitation(trial.id);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { control, handleSubmit, reset } = useForm<InviteValues>({ resolver: zodResolver(inviteSchema), defaultValues: emptyInvitation });
  const role = useWatch({ control, name: 'role' });

  const submit = handleSubmit((values) => {
    setSentTo(null);
    create.mutate(
      { email: values.email, role: values.role, siteId: values.role === 'collaborator' ? Number(values.siteId) : null, message: values.message || null },
      {
        onSuccess: (invitation) => {
          setSentTo(invitation.email);
          reset({ ...emptyInvitation, role: values.role, siteId: values.siteId });
        },
      },
    );
  });

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
        <TextField control={control} name="email" label="E-mail" serverError={create.error} type="email" placeholder="name@example.org" />
        <SelectField
          control={control}
          name="role"
          label="Role"
          serverError={create.error}
          help={roleHelp[role]}
          options={(['collaborator', 'reviewer', 'investigator'] as const).map((r) => ({ value: r, label: roleLabels[r] }))}
        />
        {role === 'collaborator' && (
          <SelectField
            control={control}
            name="siteId"
            label="Site"
            serverError={create.error}
            help={trial.sites.length ? 'The garden this person will run.' : 'Add the trial’s sites first: a collaborator is invited to one site.'}
            options={[{ value: '', label: 'Choose a site…' }, ...trial.sites.map((site) => ({ value: String(site.id), label: site.name }))]}
          />
        )}
        <TextAreaField control={control} name="message" label="Personal note (optional)" serverError={create.error} help="Included in the e-mail." maxLength={1000} />
        <Button type="submit" intent="primary" icon="envelope" text="Send invitation" loading={create.isPending} />
      </form>
    </Card>
  );
}
