import { Button, Callout, Card, H1, InputGroup, NonIdealState } from '@blueprintjs/core';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Field, FormErrorCallout } from '../../../components/field-errors';
import { LoadingState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { session } from '../../../lib/session';
import { formatDate, roleLabels } from '../../../lib/format';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitationPreview } from '../api/get-invitation-preview';

/** Opens the trial with a full page load, so the whole app starts again with the new session. */
const openTrial = (href: string) => window.location.assign(href);

/**
 * The page an invitation link opens: what the invitation is for, then either a name and a password
 * for a new account, or the password of the account that already has this e-mail.
 */
export function AcceptInvitationPage({ token, onJoined = openTrial }: { token: string; onJoined?: (href: string) => void }) {
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation(token);
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');

  function submit(event: FormEvent) {
    event.preventDefault();
    const existing = preview.data?.accountExists;
    accept.mutate(existing ? { password } : { name: name.trim(), password }, {
      onSuccess: (response) => {
        session.open(response);
        onJoined(paths.trial.href(response.trialId));
      },
    });
  }

  let body;
  if (preview.isPending) body = <LoadingState what="the invitation" />;
  else if (preview.isError) {
    const gone = preview.error instanceof ApiError && (preview.error.status === 410 || preview.error.status === 404);
    body = (
      <NonIdealState
        icon="envelope"
        title={gone ? 'This invitation cannot be used' : 'The invitation could not be opened'}
        description={preview.error.message}
        action={<Link to={paths.signIn.href()}>Go to sign-in</Link>}
      />
    );
  } else {
    const p = preview.data;
    body = (
      <>
        <H1 className="fr-sign-in__title">Join {p.trialTitle}</H1>
        <p>
          {p.invitedByName ?? 'The investigator'} invites <strong>{p.email}</strong> to the trial <span className="fr-code">{p.trialCode}</span> as{' '}
          <strong>{roleLabels[p.role]}</strong>
          {p.siteName ? (
            <>
              {' '}
              at <strong>{p.siteName}</strong>
            </>
          ) : null}
          .
        </p>
        <p className="fr-muted fr-team__small">This link works once, until {formatDate(p.expiresAt)}.</p>
        <FormErrorCallout error={accept.error} shownFields={['name', 'password']} />
        <form onSubmit={submit} noValidate>
          {p.accountExists ? (
            <>
              <Callout icon="person" className="fr-gap">
                You already have a Friable account with this e-mail. Enter its password to add this trial to it.
              </Callout>
              <Field label="Your Friable password" field="password" error={accept.error}>
                <InputGroup id="fr-field-password" type="password" autoComplete="current-password" value={password} onValueChange={setPassword} large />
              </Field>
            </>
          ) : (
            <>
              <Field label="Your name" field="name" error={accept.error} help="As the team will see it.">
                <InputGroup id="fr-field-name" autoComplete="name" value={name} onValueChange={setName} large />
              </Field>
              <Field label="Choose a password" field="password" error={accept.error} help="At least 12 characters; very common passwords are refused.">
                <InputGroup id="fr-field-password" type="password" autoComplete="new-password" value={password} onValueChange={setPassword} large />
              </Field>
            </>
          )}
          <Button type="submit" intent="primary" large fill loading={accept.isPending || accept.isSuccess} text="Join the trial" />
        </form>
      </>
    );
  }

  return (
    <div className="fr-sign-in-page">
      <div className="fr-sign-in-page__brand">
        <img src="/friable.svg" alt="" width={40} height={40} />
        <span>Friable</span>
      </div>
      <Card className="fr-sign-in fr-team__accept" elevation={1}>
        {body}
      </Card>
    </div>
  );
}
