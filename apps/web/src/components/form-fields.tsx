import { Checkbox, HTMLSelect, InputGroup, Radio, RadioGroup, TextArea, type InputGroupProps } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { useController, type Control, type ControllerRenderProps, type FieldValues, type Path } from 'react-hook-form';
import { Field } from './field-errors';
import { NumberText } from './number-text';

// Fields of a react-hook-form form in Blueprint's look: each shows, under it, the form's own check
// (its schema's message, in people's words) or else what the server said about that field (a 422).

/** A form's control, whatever its schema reads the values into when sent. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type FormControl<T extends FieldValues> = Control<T, any, any>;

interface FieldProps<T extends FieldValues> {
  control: FormControl<T>;
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

/** Several lines of text (a note, a comment); with `autoResize` the box grows with what is typed. */
export function TextAreaField<T extends FieldValues>({ control, name, label, field = name, serverError, help, rows = 2, maxLength, autoResize }: FieldProps<T> & { rows?: number; maxLength?: number; autoResize?: boolean }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <TextArea id={`fr-field-${field}`} name={box.name} value={(box.value as string | undefined) ?? ''} onChange={(e) => box.onChange(e.currentTarget.value)} onBlur={box.onBlur} inputRef={box.ref} rows={rows} maxLength={maxLength} autoResize={autoResize} fill />
    </Field>
  );
}

interface Option {
  value: string;
  label: string;
}
/** Options under a heading of a select (a unit's dimension, say). */
interface OptionGroup {
  group: string;
  options: Option[];
}

function optionElements(options: Option[]) {
  return options.map((option) => (
    <option key={option.value} value={option.value}>
      {option.label}
    </option>
  ));
}

/** A choice from a list, plain or in groups. */
export function SelectField<T extends FieldValues>({ control, name, label, field = name, serverError, help, options }: FieldProps<T> & { options: Array<Option | OptionGroup> }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <HTMLSelect id={`fr-field-${field}`} name={box.name} value={(box.value as string | undefined) ?? ''} onChange={(e) => box.onChange(e.currentTarget.value)} onBlur={box.onBlur} fill>
        {options.map((option) =>
          'group' in option ? (
            <optgroup key={option.group} label={option.group}>
              {optionElements(option.options)}
            </optgroup>
          ) : (
            optionElements([option])
          ),
        )}
      </HTMLSelect>
    </Field>
  );
}

/** A choice among a few, as radio buttons; an empty value selects none (a question not answered yet). */
export function RadioField<T extends FieldValues>({ control, name, label, field = name, serverError, help, options, inline }: FieldProps<T> & { options: Option[]; inline?: boolean }) {
  const { field: box, fieldState } = useController({ control, name });
  const value = (box.value as string | undefined) ?? '';
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <RadioGroup name={`fr-field-${field}`} inline={inline} selectedValue={value === '' ? undefined : value} onChange={(e) => box.onChange(e.currentTarget.value)}>
        {options.map((option) => (
          <Radio key={option.value} value={option.value} label={option.label} />
        ))}
      </RadioGroup>
    </Field>
  );
}

/**
 * A number box (lib/number-reading reads a decimal comma or point, and asks what "1,000" means); the
 * form keeps the text as typed and its schema reads it (numberTextsRule in lib/form-rules).
 */
export function NumberField<T extends FieldValues>({ control, name, label, field = name, serverError, help, unit, placeholder }: FieldProps<T> & { unit?: string; placeholder?: string }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      <NumberText id={`fr-field-${field}`} value={(box.value as string | undefined) ?? ''} onChange={box.onChange} unit={unit} placeholder={placeholder} />
    </Field>
  );
}

/** A field whose input is drawn by the caller (a unit list, a set of boxes), labelled and checked like the others. */
export function CustomField<T extends FieldValues, N extends Path<T>>({
  control,
  name,
  label,
  field = name,
  serverError,
  help,
  children,
}: Omit<FieldProps<T>, 'name'> & { name: N; children: (box: ControllerRenderProps<T, N>, id: string) => ReactNode }) {
  const { field: box, fieldState } = useController({ control, name });
  return (
    <Field label={label} field={field} error={serverError} message={fieldState.error?.message} help={help}>
      {children(box, `fr-field-${field}`)}
    </Field>
  );
}

/** A yes-or-no choice, its label beside the box; with `heading`, under a field label of its own. */
export function CheckboxField<T extends FieldValues>({ control, name, label, heading, serverError }: { control: FormControl<T>; name: Path<T>; label: string; heading?: string; serverError?: unknown }) {
  const { field: box } = useController({ control, name });
  const checkbox = <Checkbox id={`fr-field-${name}`} name={box.name} label={label} checked={Boolean(box.value)} onChange={(e) => box.onChange(e.currentTarget.checked)} onBlur={box.onBlur} inputRef={box.ref} />;
  return heading ? (
    <Field label={heading} field={name} error={serverError}>
      {checkbox}
    </Field>
  ) : (
    checkbox
  );
}
