import { Callout, FormGroup } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { ApiError } from '../lib/api-client';
import { numberProblem } from '../lib/form-rules';
import { readNumber } from '../lib/number-reading';
import { personLocale } from '../lib/person-locale';

/** The server's messages about one field (from a 422 answer), joined into one sentence. */
export function fieldError(error: unknown, field: string): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  const messages = (error.details ?? []).filter((detail) => detail.field === field || detail.field?.startsWith(`${field}.`)).map((detail) => detail.message);
  return messages.length ? messages.join('; ') : undefined;
}

/**
 * A labelled field that shows the server's message for it, in the danger colour, under the input.
 * `field` is the request body's property name the API names in its 422 answer; `message` is the
 * form's own check of the field (it comes first).
 */
export function Field({
  label,
  field,
  error,
  message: own,
  help,
  children,
  inline,
}: {
  label: string;
  field: string;
  error: unknown;
  message?: string;
  help?: ReactNode;
  children: ReactNode;
  inline?: boolean;
}) {
  const message = own ?? fieldError(error, field);
  return (
    <FormGroup label={label} labelFor={`fr-field-${field}`} helperText={message ?? help} intent={message ? 'danger' : 'none'} inline={inline} className="fr-field">
      {children}
    </FormGroup>
  );
}

/**
 * The failure of a form as a whole: the server's sentence, plus any messages that name a field this
 * form does not show (so nothing the server said is lost).
 */
export function FormErrorCallout({ error, shownFields = [] }: { error: unknown; shownFields?: string[] }) {
  if (!error) return null;
  const others =
    error instanceof ApiError
      ? (error.details ?? []).filter((detail) => !detail.field || !shownFields.some((f) => detail.field === f || detail.field?.startsWith(`${f}.`)))
      : [];
  // The server's sentence repeats the field messages, which already stand beside their fields.
  const allBesideFields = error instanceof ApiError && error.status === 422 && (error.details ?? []).length > 0 && others.length === 0;
  const message = !(error instanceof Error) ? 'Something went wrong.' : allBesideFields ? 'Some fields need another look; see the messages beside them.' : error.message;
  return (
    <Callout intent="danger" icon="error" className="fr-form-error" role="alert">
      {message}
      {others.length > 0 && (
        <ul>
          {others.map((detail, index) => (
            <li key={index}>{detail.message}</li>
          ))}
        </ul>
      )}
    </Callout>
  );
}

/**
 * Reads the number boxes of a form before it is sent. Empty boxes become null; a box that does not
 * hold a number gives an error shaped like the server's 422, so it shows beside the same field.
 */
export function parseNumberFields<K extends string>(texts: Record<K, string>, labels: Record<K, string>): { values: Record<K, number | null>; error: ApiError | null } {
  const values = {} as Record<K, number | null>;
  const details: Array<{ field: string; message: string }> = [];
  for (const field of Object.keys(texts) as K[]) {
    const reading = readNumber(texts[field], personLocale());
    const problem = numberProblem(labels[field], texts[field]);
    if (problem) details.push({ field, message: problem });
    values[field] = reading.kind === 'number' ? reading.value : reading.kind === 'empty' ? null : Number.NaN;
  }
  return { values, error: details.length ? new ApiError(422, 'Some numbers could not be read; see the fields marked below.', details) : null };
}
