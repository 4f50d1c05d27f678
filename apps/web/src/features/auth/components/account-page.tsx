import { Button, Callout, Card, Checkbox, H3, H4, HTMLSelect, InputGroup } from '@blueprintjs/core';
import type { PublicUser } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Field, FormErrorCallout } from '../../../components/field-errors';
import { ApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useChangePassword, useUpdateMySettings } from '../api/account';
import { logoutEverywhere } from '../api/logout';

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
  const [name, setName] = useState(me.name);
  const [locale, setLocale] = useState(me.locale ?? '');
  const [reminders, setReminders] = useState(me.emailReminders ?? true);
  const [receipts, setReceipts] = useState(me.emailReceipts ?? true);
  function submit(event: FormEvent) {
    event.preventDefault();
    update.mutate({ name: name.trim(), locale: locale || null, emailReminders: reminders, emailReceipts: receipts });
  }
  return (
    <Card elevation={0} className="fr-account__card" aria-label="Name, numbers and e-mails">
      <H4>Name, numbers and e-mails</H4>
      <form onSubmit={submit} noValidate>
        <Field label="Display name" field="name" error={update.error} help="Shown on the Team, in the Activity and on your sign-offs.">
          <InputGroup id="fr-field-name" value={name} onValueChange={setName} maxLength={120} />
        </Field>
        <Field label="Numbers and dates" field="locale" error={update.error} help="How Friable writes and reads numbers and dates for you.">
          <HTMLSelect id="fr-field-locale" value={locale} onChange={(e) => setLocale(e.currentTarget.value)} fill>
            {LOCALES.map(([tag, label]) => (
              <option key={tag} value={tag}>
                {label}
              </option>
            ))}
          </HTMLSelect>
        </Field>
        <Checkbox label="E-mail me when a round is due at my sites" checked={reminders} onChange={(e) => setReminders(e.currentTarget.checked)} />
        <Checkbox label="E-mail me a receipt after each upload" checked={receipts} onChange={(e) => setReceipts(e.currentTarget.checked)} />
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
  const [current, setCurrent] = useState('');
  const [next, setNext] = useState('');
  const [again, setAgain] = useState('');
  const mismatch = again.length > 0 && next !== again;
  function submit(event: FormEvent) {
    event.preventDefault();
    if (mismatch) return;
    change.mutate(
      { currentPassword: current, newPassword: next },
      {
        onSuccess: () => {
          setCurrent('');
          setNext('');
          setAgain('');
        },
      },
    );
  }
  return (
    <Card elevation={0} className="fr-account__card" aria-label="Password">
      <H4>Password</H4>
      <p className="fr-muted">At least 12 characters; a few unrelated words are easy to remember and hard to guess. Very common passwords are refused.</p>
      <form onSubmit={submit} noValidate>
        <Field label="Current password" field="currentPassword" error={change.error}>
          <InputGroup id="fr-field-currentPassword" type="password" autoComplete="current-password" value={current} onValueChange={setCurrent} />
        </Field>
        <Field label="New password" field="newPassword" error={change.error}>
          <InputGroup id="fr-field-newPassword" type="password" autoComplete="new-password" value={next} onValueChange={setNext} />
        </Field>
        <Field label="New password again" field="again" error={mismatch ? new ApiError(422, 'The two new passwords differ.', [{ field: 'again', message: 'The two new passwords differ.' }]) : null}>
          <InputGroup id="fr-field-again" type="password" autoComplete="new-password" value={again} onValueChange={setAgain} />
        </Field>
        <FormErrorCallout error={change.error} shownFields={['currentPassword', 'newPassword']} />
        {change.isSuccess && (
          <Callout intent="success" role="status" className="fr-gap">
            {change.data.message}
          </Callout>
        )}
        <Button type="submit" intent="primary" text="Change the password" loading={change.isPending} disabled={!current || !next || next !== again} />
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
