import { TRIAL_DESIGNS } from '@friable/contracts';
import { useWatch, type FieldValues, type Path } from 'react-hook-form';
import { designHelp, designLabels } from '../lib/format';
import { SelectField, type FormControl } from './form-fields';

const designOptions = TRIAL_DESIGNS.map((d) => ({ value: d, label: designLabels[d] ?? d }));

/** The trial's design, picked from the list, with a sentence under it on what the chosen design does with the plots. */
export function DesignField<T extends FieldValues & { design: string }>({ control, serverError }: { control: FormControl<T>; serverError: unknown }) {
  const name = 'design' as Path<T>;
  const design = useWatch({ control, name }) as string;
  return <SelectField control={control} name={name} label="Design" serverError={serverError} help={designHelp[design]} options={designOptions} />;
}
