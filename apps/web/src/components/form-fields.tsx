import { Checkbox, HTMLSelect, InputGroup, TextArea, type InputGroupProps } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { Field } from './field-errors';

// Fields of a react-hook-form form in Blueprint's look: each shows, under it, the form's own check
// (its schema's message, in people's words) or else what the server said about that field (a 422).

interface FieldProps<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  /** The request body's property the server names in a 422; the form's own name when left out. */
  field?: string;
  /** The failed request, whose messages about this field show under it. */
  serverError?: unknown;
  help?: ReactNode;
}

/** One line of text (e-mail, name, password…). */
export function TextField<T extends FieldValues>({ control, name, label, field = name, serverError, help, ...input }: FieldProps<T> & Omit<InputGroupProps, 'value' | 'onValueChange' | 'name' | 'id'>) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <InputGroup {...input} id={`fr-field-${field}`} name={box.name} value={(box.value as string | undefined) ?? ''} onValueChange={box.onChange} onBlur={box.onBlur} inputRef={box.ref} />
    </Field>
  );
}

/** Several lines of text (a note, a comment). */
export function TextAreaField<T extends FieldValues>({ control, name, label, field = name, serverError, help, rows = 2, maxLength }: FieldProps<T> & { rows?: number; maxLength?: number }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <TextArea id={`fr-field-${field}`} name={box.name} value={(box.value as string | undefined) ?? ''} onChange={(e) => box.onChange(e.currentTarget.value)} onBlur={box.onBlur} inputRef={box.ref} rows={rows} maxLength={maxLength} fill />
    </Field>
  );
}

/** A choice from a list. */
export function SelectField<T extends FieldValues>({ control, name, label, field = name, serverError, help, options }: FieldProps<T> & { options: Array<{ value: string; label: string }> }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <HTMLSelect id={`fr-field-${field}`} name={box.name} value={(box.value as string | undefined) ?? ''} onChange={(e) => box.onChange(e.currentTarget.value)} onBlur={box.onBlur} fill>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </HTMLSelect>
    </Field>
  );
}

/** A yes-or-no choice, its label beside the box. */
export function CheckboxField<T extends FieldValues>({ control, name, label }: { control: Control<T>; name: Path<T>; label: string }) {
  const { field: box } = useController({ control, name });
  return <Checkbox name={box.name} label={label} checked={Boolean(box.value)} onChange={(e) => box.onChange(e.currentTarget.checked)} onBlur={box.onBlur} inputRef={box.ref} />;
}
