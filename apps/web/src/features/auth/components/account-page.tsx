import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Card, H3, H4 } from '@blueprintjs/core';
import type { PublicUser } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { FormErrorCallout } from '../../../components/field-errors';
import { CheckboxField, SelectField, TextField } from '../../../components/form-fields';
import { formatDate } from '../../../lib/format';
import { useChangePassword, useUpdateMySettings } from '../api/account';
import { logoutEverywhere } from '../api/logout';
import { changePasswordSchema, settingsSchema, type ChangePasswordValues, type SettingsValues } from './auth-schemas';

/** Locales offered for numbers and dates; '' follows the browser. */
const LOCALES: Array<[string, string]> = [
  ['', 'As my browser says'],
  ['en-GB', 'English (United Kingdom): 1,234.5 · 31/12/2026'],
  ['en-US', 'English (United States): 1,234.5 · 12/31/2026'],
  ['de-DE', 'Deutsch: 1.234,5 · 31.12.2026'],
  ['fr-FR', 'Français: 1 234,5 · 31/12/2026'],
  ['nl-NL', 'Nederlands: 1.234,5 · 31-12-2026'],
  ['es-ES', 'Español: 1234,5 · 31/12/2026'],
  ['it-IT', 'Italiano: 1.234,5 · 31/12/2026'],
  ['pt-BR', 'Português (Brasil): 1.234,5 · 31/12/2026'],
  ['sv-SE', 'Svenska: 1 234,5 · 2026-12-31'],
  ['da-DK', 'Dansk: 1.234,5 · 31.12.2026'],
  ['pl-PL', 'Polski: 1234,5 · 31.12.2026'],
];

type Me = PublicUser & { locale?: string | null; emailReminders?: boolean; emailReceipts?: boolean; lastSignInAt?: string | null };

/** Account: one's display name, locale and e-mail preferences, the password, and signing out everywhere. */
export function AccountPage({ me, onSignedOutEverywhere }: { me: Me; onSignedOutEverywhere: () => void }) {
  return (
    <div className="fr-account">
      <H3>Your account</H3>
      <p className="fr-muted">
        Signed in as {me.email}
        {me.lastSignInAt ? `, last sign-in ${formatDate(me.lastSignInAt)}` : ''}.
      </p>
      <SettingsCard me={me} />
      <PasswordCard />
      <SessionsCard onSignedOutEverywhere={onSignedOutEverywhere} />
    </div>
  );
}

function SettingsCard({ me }: { me: Me }) {
  const update = useUpdateMySettings();
  const { control, handleSubmit } = useForm<SettingsValues>({
    resolver: zodResolver(settingsSchema),
    defaultValues: { name: me.name, locale: me.locale ?? '', emailReminders: me.emailReminders ?? true, emailReceipts: me.emailReceipts ?? true },
  });
  const submit = handleSubmit((values) => update.mutate({ ...values, locale: values.locale || null }));
  return (
    <Card elevation={0} className="fr-account__card" aria-label="Name, numbers and e-mails">
      <H4>Name, numbers and e-mails</H4>
      <form onSubmit={submit} noValidate>
        <TextField control={control} name="name" label="Display name" serverError={update.error} help="Shown on the Team, in the Activity and on your sign-offs." maxLength={120} />
        <SelectField
          control={control}
          name="locale"
          label="Numbers and dates"
          serverError={update.error}
          help="How Friable writes and reads numbers and dates for you."
          options={LOCALES.map(([value, label]) => ({ value, label }))}
        />
        <CheckboxField control={control} name="emailReminders" label="E-mail me when a round is due at my sites" />
        <CheckboxField control={control} name="emailReceipts" label="E-mail me a receipt after each upload" />
        <FormErrorCallout error={update.error} shownFields={['name', 'locale']} />
        {update.isSuccess && (
          <p role="status" className="fr-muted">
            Saved.
          </p>
        )}
        <Button type="submit" intent="primary" text="Save" loading={update.isPending} />
      </form>
    </Card>
  );
}

function PasswordCard() {
  const change = useChangePassword();
  const { control, handleSubmit, reset } = useForm<ChangePasswordValues>({ resolver: zodResolver(changePasswordSchema), defaultValues: { currentPassword: '', newPassword: '', again: '' } });
  const submit = handleSubmit(({ currentPassword, newPassword }) => change.mutate({ currentPassword, newPassword }, { onSuccess: () => reset() }));
  return (
    <Card elevation={0} className="fr-account__card" aria-label="Password">
      <H4>Password</H4>
      <p className="fr-muted">At least 12 characters; a few unrelated words are easy to remember and hard to guess. Very common passwords are refused.</p>
      <form onSubmit={submit} noValidate>
        <TextField control={control} name="currentPassword" label="Current password" serverError={change.error} type="password" autoComplete="current-password" />
        <TextField control={control} name="newPassword" label="New password" serverError={change.error} type="password" autoComplete="new-password" />
        <TextField control={control} name="again" label="New password again" type="password" autoComplete="new-password" />
        <FormErrorCallout error={change.error} shownFields={['currentPassword', 'newPassword']} />
        {change.isSuccess && (
          <Callout intent="success" role="status" className="fr-gap">
            {change.data.message}
          </Callout>
        )}
        <Button type="submit" intent="primary" text="Change the password" loading={change.isPending} />
      </form>
    </Card>
  );
}

function SessionsCard({ onSignedOutEverywhere }: { onSignedOutEverywhere: () => void }) {
  const end = useMutation({ mutationFn: logoutEverywhere, onSuccess: onSignedOutEverywhere });
  return (
    <Card elevation={0} className="fr-account__card" aria-label="Signed-in devices">
      <H4>Signed-in devices</H4>
      <p className="fr-muted">Lost a phone, or signed in on a shared computer? This signs you out on every device at once, this one included.</p>
      {end.error && (
        <Callout intent="danger" role="alert" className="fr-gap">
          {end.error.message}
        </Callout>
      )}
      <Button icon="log-out" text="Sign out everywhere" loading={end.isPending} onClick={() => end.mutate()} />
    </Card>
  );
}
