import { Button, Callout, Card, H1, InputGroup } from '@blueprintjs/core';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Field, FormErrorCallout } from '../../../components/field-errors';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { useConfirmPasswordReset, useRequestPasswordReset } from '../api/account';

/** Forgotten password: the address to send a reset link to; the same answer whether or not it has an account. */
export function ForgotPasswordPage() {
  const signInHref = paths.signIn.href();
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  function submit(event: FormEvent) {
    event.preventDefault();
    request.mutate({ email: email.trim() });
  }
  return (
    <Card className="fr-sign-in" elevation={1}>
      <H1 className="fr-sign-in__title">Forgotten password</H1>
      {request.isSuccess ? (
        <Callout intent="success" role="status" className="fr-gap">
          {request.data.message}
        </Callout>
      ) : (
        <>
          <p className="fr-muted">Friable e-mails a link to set a new password. It works once and for a limited time.</p>
          <form onSubmit={submit} noValidate>
            <Field label="E-mail" field="email" error={request.error}>
              <InputGroup id="fr-field-email" type="email" autoComplete="username" value={email} onValueChange={setEmail} large autoFocus />
            </Field>
            <FormErrorCallout error={request.error} shownFields={['email']} />
            <Button type="submit" intent="primary" large fill loading={request.isPending} text="E-mail me a link" disabled={!email.trim()} />
          </form>
        </>
      )}
      <p className="fr-gap">
        <Link to={signInHref}>Back to signing in</Link>
      </p>
    </Card>
  );
}

/** The e-mailed link's page: a new password, typed twice; every session of the account ends. */
export function ResetPasswordPage({ token }: { token: string }) {
  const signInHref = paths.signIn.href();
  const confirm = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const mismatch = again.length > 0 && password !== again;
  function submit(event: FormEvent) {
    event.preventDefault();
    if (!mismatch) confirm.mutate({ token, password });
  }
  return (
    <Card className="fr-sign-in" elevation={1}>
      <H1 className="fr-sign-in__title">Set a new password</H1>
      {confirm.isSuccess ? (
        <>
          <Callout intent="success" role="status" className="fr-gap">
            {confirm.data.message}
          </Callout>
          <Link to={signInHref}>Sign in with the new password</Link>
        </>
      ) : (
        <form onSubmit={submit} noValidate>
          <p className="fr-muted">At least 12 characters; very common passwords are refused. Every device signed in to your account will be signed out.</p>
          <Field label="New password" field="password" error={confirm.error}>
            <InputGroup id="fr-field-password" type="password" autoComplete="new-password" value={password} onValueChange={setPassword} large autoFocus />
          </Field>
          <Field label="New password again" field="again" error={mismatch ? new ApiError(422, 'The two passwords differ.', [{ field: 'again', message: 'The two passwords differ.' }]) : null}>
            <InputGroup id="fr-field-again" type="password" autoComplete="new-password" value={again} onValueChange={setAgain} large />
          </Field>
          <FormErrorCallout error={confirm.error} shownFields={['password']} />
          {confirm.error instanceof ApiError && [404, 410].includes(confirm.error.status) && (
            <p>
              <Link to={paths.forgotPassword.href()}>Ask for a new link</Link>
            </p>
          )}
          <Button type="submit" intent="primary" large fill loading={confirm.isPending} text="Set the new password" disabled={!password || password !== again} />
        </form>
      )}
    </Card>
  );
}
