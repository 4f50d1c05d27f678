import type { FieldValues, Path } from 'react-hook-form';
import { TextField, type FormControl } from '../../../components/form-fields';

/** The Code and Name boxes that open a treatment's or a measure's dialog, side by side. */
export function CodeNameFields<T extends FieldValues & { code: string; name: string }>({ control, codeHelp, error }: { control: FormControl<T>; codeHelp: string; error: unknown }) {
  return (
    <div className="fr-form-row">
      <TextField control={control} name={'code' as Path<T>} label="Code" serverError={error} help={codeHelp} autoFocus />
      <TextField control={control} name={'name' as Path<T>} label="Name" serverError={error} />
    </div>
  );
}
