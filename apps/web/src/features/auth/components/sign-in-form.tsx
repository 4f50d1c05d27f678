import { Button, Callout, Card, FormGroup, H1, InputGroup } from '@blueprintjs/core';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { useLogin } from '../api/login';
import { useAuth } from '../hooks/auth-context';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const { signIn, endedReason } = useAuth();
  const login = useLogin();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  function submit(event: FormEvent) {
    event.preventDefault();
    login.mutate(
      { email, password },
      {
        onSuccess: (response) => {
          signIn(response);
          onSignedIn();
        },
      },
    );
  }

  const error = login.error instanceof ApiError ? login.error : login.error ? new ApiError(0, login.error.message) : null;

  return (
    <Card className="fr-sign-in" elevation={1}>
      <H1 className="fr-sign-in__title">Sign in to Friable</H1>
      <p className="fr-muted">Trials of soil amendments and garden treatments, across every garden that runs them.</p>
      {endedReason && !error && (
        <Callout intent="warning" className="fr-gap">
          {endedReason}
        </Callout>
      )}
      {error && (
        <Callout intent="danger" className="fr-gap" title="Not signed in">
          {error.details?.length ? error.details.map((d) => d.message).join('; ') : error.message}
        </Callout>
      )}
      <form onSubmit={submit} noValidate>
        <FormGroup label="E-mail" labelFor="sign-in-email">
          <InputGroup id="sign-in-email" type="email" autoComplete="username" value={email} onValueChange={setEmail} large autoFocus />
        </FormGroup>
        <FormGroup label="Password" labelFor="sign-in-password">
          <InputGroup id="sign-in-password" type="password" autoComplete="current-password" value={password} onValueChange={setPassword} large />
        </FormGroup>
        <Button type="submit" intent="primary" large fill loading={login.isPending} text="Sign in" />
      </form>
      <p className="fr-gap">
        <Link to={paths.forgotPassword.href()}>Forgot your password?</Link>
      </p>
    </Card>
  );
}
