import { Button, Callout, Card, Checkbox, H2, HTMLTable, InputGroup, Tag } from '@blueprintjs/core';
import type { PublicUser } from '@friable/contracts';
import { useState, type FormEvent } from 'react';
import { ConfirmButton } from '../../../components/confirm-button';
import { Field } from '../../../components/field-errors';
import { ErrorState, LoadingState } from '../../../components/states';
import { ApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useCreatePerson } from '../api/create-person';
import { usePeople } from '../api/get-people';
import { useSetPersonActive } from '../api/set-person-active';

/** Instance administration: every account, a new account, deactivation (which signs the person out at once). */
export function PeoplePage({ me }: { me: PublicUser }) {
  const people = usePeople();
  const setActive = useSetPersonActive();
  if (!me.isAdmin) {
    return <ErrorState title="For instance administrators" error={new Error('Only an instance administrator manages accounts.')} />;
  }
  if (people.isPending) return <LoadingState what="the accounts" />;
  if (people.isError) return <ErrorState title="The accounts could not be loaded" error={people.error} onRetry={() => people.refetch()} />;
  return (
    <section aria-labelledby="people-heading" className="fr-people">
      <H2 id="people-heading">People</H2>
      <p className="fr-muted">
        Everyone with an account on this Friable. Roles on a trial are given on that trial’s Team page; here you add accounts and switch them off.
      </p>
      {setActive.error && (
        <Callout intent="danger" className="fr-gap">
          {setActive.error.message}
        </Callout>
      )}
      <div className="fr-table-scroll">
        <HTMLTable compact striped className="fr-people__table" aria-label="Accounts">
          <thead>
            <tr>
              <th>Name</th>
              <th>E-mail</th>
              <th>Account</th>
              <th>Since</th>
              <th>Last sign-in</th>
              <th>
                <span className="fr-visually-hidden">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {people.data.map((person) => (
              <tr key={person.id}>
                <td data-label="Name">{person.name}</td>
                <td data-label="E-mail">{person.email}</td>
                <td data-label="Account">
                  {person.isAdmin && (
                    <Tag minimal className="fr-people__tag">
                      Administrator
                    </Tag>
                  )}{' '}
                  {person.isActive ? (
                    <Tag minimal intent="success">
                      Active
                    </Tag>
                  ) : (
                    <Tag minimal intent="warning">
                      Deactivated
                    </Tag>
                  )}
                </td>
                <td data-label="Since">{formatDate(person.createdAt)}</td>
                <td data-label="Last sign-in">{person.lastSignInAt ? formatDate(person.lastSignInAt) : <span className="fr-muted">never</span>}</td>
                <td className="fr-people__actions">
                  {person.id === me.id ? (
                    <span className="fr-muted">you</span>
                  ) : person.isActive ? (
                    <ConfirmButton
                      text="Deactivate"
                      confirmText="Deactivate"
                      ariaLabel={`Deactivate ${person.name}`}
                      question={`${person.name} will be signed out at once and cannot sign in until reactivated. Their data and roles stay.`}
                      loading={setActive.isPending && setActive.variables?.userId === person.id}
                      onConfirm={() => setActive.mutate({ userId: person.id, active: false })}
                    />
                  ) : (
                    <Button
                      variant="minimal"
                      size="small"
                      text="Reactivate"
                      aria-label={`Reactivate ${person.name}`}
                      loading={setActive.isPending && setActive.variables?.userId === person.id}
                      onClick={() => setActive.mutate({ userId: person.id, active: true })}
                    />
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      <NewPersonForm />
    </section>
  );
}

function NewPersonForm() {
  const create = useCreatePerson();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const [isAdmin, setIsAdmin] = useState(false);
  const [created, setCreated] = useState<string | null>(null);

  function submit(event: FormEvent) {
    event.preventDefault();
    setCreated(null);
    create.mutate(
      { email, name, password, isAdmin },
      {
        onSuccess: (person) => {
          setCreated(`${person.name} (${person.email}) can now sign in.`);
          setEmail('');
          setName('');
          setPassword('');
          setIsAdmin(false);
        },
      },
    );
  }

  const general = create.error instanceof ApiError && !(create.error.details ?? []).length ? create.error.message : null;
  return (
    <Card className="fr-people__form" elevation={0}>
      <h3 className="fr-people__form-title">Add an account</h3>
      <p className="fr-muted">To bring someone into a trial, an invitation from its Team page is usually better: they choose their own password.</p>
      {created && (
        <Callout intent="success" className="fr-gap">
          {created}
        </Callout>
      )}
      {general && (
        <Callout intent="danger" className="fr-gap">
          {general}
        </Callout>
      )}
      <form onSubmit={submit} noValidate>
        <Field label="Name" field="name" error={create.error}>
          <InputGroup id="fr-field-name" value={name} onValueChange={setName} autoComplete="off" />
        </Field>
        <Field label="E-mail" field="email" error={create.error}>
          <InputGroup id="fr-field-email" type="email" value={email} onValueChange={setEmail} autoComplete="off" />
        </Field>
        <Field label="Password" field="password" error={create.error} help="At least 12 characters; tell the person to change it.">
          <InputGroup id="fr-field-password" type="password" value={password} onValueChange={setPassword} autoComplete="new-password" />
        </Field>
        <Checkbox label="Instance administrator (manages accounts, reads every trial)" checked={isAdmin} onChange={(e) => setIsAdmin(e.currentTarget.checked)} />
        <Button type="submit" intent="primary" text="Add account" loading={create.isPending} />
      </form>
    </Card>
  );
}
