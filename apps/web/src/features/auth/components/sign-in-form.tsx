import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Card, H1 } from '@blueprintjs/core';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { TextField } from '../../../components/form-fields';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { useLogin } from '../api/login';
import { useAuth } from '../hooks/auth-context';
import { signInSchema, type SignInValues } from './auth-schemas';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const { signIn, endedReason } = useAuth();
  const login = useLogin();
  const { control, handleSubmit } = useForm<SignInValues>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });

  const submit = handleSubmit((values) =>
    login.mutate(values, {
      onSuccess: (response) => {
        signIn(response);
        onSignedIn();
      },
    }),
  );

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
        <TextField control={control} name="email" label="E-mail" type="email" autoComplete="username" large autoFocus />
        <TextField control={control} name="password" label="Password" type="password" autoComplete="current-password" large />
        <Button type="submit" intent="primary" large fill loading={login.isPending} text="Sign in" />
      </form>
      <p className="fr-gap">
        <Link to={paths.forgotPassword.href()}>Forgot your password?</Link>
      </p>
    </Card>
  );
}
