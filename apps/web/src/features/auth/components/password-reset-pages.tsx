import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Card, H1 } from '@blueprintjs/core';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { FormErrorCallout } from '../../../components/field-errors';
import { TextField } from '../../../components/form-fields';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { useConfirmPasswordReset, useRequestPasswordReset } from '../api/account';
import { forgotPasswordSchema, newPasswordSchema, type ForgotPasswordValues, type NewPasswordValues } from './auth-schemas';

/** Forgotten password: the address to send a reset link to; the same answer whether or not it has an account. */
export function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const { control, handleSubmit } = useForm<ForgotPasswordValues>({ resolver: zodResolver(forgotPasswordSchema), defaultValues: { email: '' } });
  const submit = handleSubmit((values) => request.mutate(values));
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
            <TextField control={control} name="email" label="E-mail" serverError={request.error} type="email" autoComplete="username" large autoFocus />
            <FormErrorCallout error={request.error} shownFields={['email']} />
            <Button type="submit" intent="primary" large fill loading={request.isPending} text="E-mail me a link" />
          </form>
        </>
      )}
      <p className="fr-gap">
        <Link to={paths.signIn.href()}>Back to signing in</Link>
      </p>
    </Card>
  );
}

/** The e-mailed link's page: a new password, typed twice; every session of the account ends. */
export function ResetPasswordPage({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const { control, handleSubmit } = useForm<NewPasswordValues>({ resolver: zodResolver(newPasswordSchema), defaultValues: { password: '', again: '' } });
  const submit = handleSubmit(({ password }) => confirm.mutate({ token, password }));
  return (
    <Card className="fr-sign-in" elevation={1}>
      <H1 className="fr-sign-in__title">Set a new password</H1>
      {confirm.isSuccess ? (
        <>
          <Callout intent="success" role="status" className="fr-gap">
            {confirm.data.message}
          </Callout>
          <Link to={paths.signIn.href()}>Sign in with the new password</Link>
        </>
      ) : (
        <form onSubmit={submit} noValidate>
          <p className="fr-muted">At least 12 characters; very common passwords are refused. Every device signed in to your account will be signed out.</p>
          <TextField control={control} name="password" label="New password" serverError={confirm.error} type="password" autoComplete="new-password" large autoFocus />
          <TextField control={control} name="again" label="New password again" type="password" autoComplete="new-password" large />
          <FormErrorCallout error={confirm.error} shownFields={['password']} />
          {confirm.error instanceof ApiError && [404, 410].includes(confirm.error.status) && (
            <p>
              <Link to={paths.forgotPassword.href()}>Ask for a new link</Link>
            </p>
          )}
          <Button type="submit" intent="primary" large fill loading={confirm.isPending} text="Set the new password" />
        </form>
      )}
    </Card>
  );
}
