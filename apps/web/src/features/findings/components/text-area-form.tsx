import { Button, TextArea, type Intent } from '@blueprintjs/core';
import type { IconName } from '@blueprintjs/icons';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';

/** The schema of a one-text form: its words for an empty or too long text (the server checks again). */
export type TextSchema = z.ZodObject<{ text: z.ZodString }>;

/**
 * One text box with its send button and the form's or server's refusal beneath: a comment, a reply, an edit,
 * an amended statement or the reason for withdrawing a sign-off. `onSubmit` gets the text and a way to empty the box.
 */
export function TextAreaForm({
  label,
  schema,
  maxLength,
  submitText,
  icon,
  intent,
  initial = '',
  rows = 2,
  pending,
  error,
  onSubmit,
  onCancel,
}: {
  label: string;
  schema: TextSchema;
  maxLength: number;
  submitText: string;
  icon?: IconName;
  intent?: Intent;
  initial?: string;
  rows?: number;
  pending: boolean;
  error: Error | null;
  onSubmit: (text: string, clear: () => void) => void;
  onCancel?: () => void;
}) {
  const { control, handleSubmit, reset, formState } = useForm<{ text: string }>({ resolver: zodResolver(schema), defaultValues: { text: initial } });
  const problem = formState.errors.text?.message ?? error?.message;
  return (
    <form className="fr-comment-form" noValidate onSubmit={handleSubmit(({ text }) => onSubmit(text.trim(), () => reset({ text: '' })))}>
      <Controller
        control={control}
        name="text"
        render={({ field }) => (
          <TextArea aria-label={label} name={field.name} value={field.value} onChange={(e) => field.onChange(e.target.value)} onBlur={field.onBlur} inputRef={field.ref} fill rows={rows} maxLength={maxLength} />
        )}
      />
      {problem && (
        <p className="fr-error-line" role="alert">
          {problem}
        </p>
      )}
      <div className="fr-findings-actions">
        <Button type="submit" icon={icon} intent={intent} text={submitText} loading={pending} />
        {onCancel && <Button text="Cancel" onClick={onCancel} />}
      </div>
    </form>
  );
}
