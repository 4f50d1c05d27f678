import { zodResolver } from '@hookform/resolvers/zod';
import { MEASURE_KINDS, type Measure, type MeasureKind, type TrialDetail } from '@friable/contracts';
import { useEffect, useRef } from 'react';
import { useForm, useWatch, type UseFormReturn } from 'react-hook-form';
import { FormDialog } from '../../../components/form-dialog';
import { NumberField, RadioField, SelectField } from '../../../components/form-fields';
import { measureKindLabels } from '../../../lib/format';
import { useSaveMeasure, type MeasureBody } from '../api/save-measure';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { VersionConflict } from './version-conflict';
import { CodeNameFields } from './code-name-fields';
import { measureSchema, measureValues, type MeasureValues } from './measure-schema';
import { measureUnitGroups, unitSymbol } from './measure-units';

const shownFields = ['code', 'name', 'unit', 'kind', 'scaleMin', 'scaleMax', 'cutoff', 'plausibleMin', 'plausibleMax', 'hardMin', 'hardMax', 'decimals', 'higherIsBetter'];
const unitOptions = measureUnitGroups.map((group) => ({ group: group.dimension, options: group.units.map((u) => ({ value: u.id, label: `${u.symbol} — ${u.label}` })) }));
const kindOptions = MEASURE_KINDS.map((k) => ({ value: k, label: measureKindLabels[k] }));
const directionOptions = [
  { value: 'higher', label: 'Higher is better' },
  { value: 'lower', label: 'Lower is better' },
];

/** Add or change a measure: its unit from the fixed list, its kind, and the ranges that catch typing slips. */
export function MeasureDialog({ trial, measure, onClose }: { trial: TrialDetail; measure: Measure | null; onClose: () => void }) {
  const save = useSaveMeasure(trial.id);
  const form = useVersionedForm<MeasureBody, Measure, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (measure ? { measureId: measure.id, version: version ?? measure.version, input } : { input }),
    measure,
    onClose,
  );
  const methods = useForm({ resolver: zodResolver(measureSchema), defaultValues: measureValues(measure) });
  const { control, handleSubmit } = methods;
  const [kind, unit, code] = useWatch({ control, name: ['kind', 'unit', 'code'] });
  useDirectionFollowsKind(measure === null, kind, methods);
  const error = save.error;
  const symbol = unitSymbol(unit);
  const common = { control, serverError: error };
  const submit = handleSubmit((input) => form.send(input));

  return (
    <>
      <FormDialog title={measure ? `Edit measure ${measure.code}` : 'Add measure'} icon="timeline-line-chart" wide onClose={onClose} onSubmit={() => void submit()} submitText={measure ? 'Save measure' : 'Add measure'} pending={save.isPending} error={error} shownFields={shownFields}>
        <CodeNameFields control={control} codeHelp="Short, heads the CSV column, e.g. DRAIN." error={error} />
        <div className="fr-form-row">
          <SelectField {...common} name="unit" label="Unit" options={unitOptions} />
          <SelectField {...common} name="kind" label="Kind" options={kindOptions} />
        </div>
        {kind === 'score' && (
          <div className="fr-form-row">
            <NumberField {...common} name="scaleMin" label="Lowest score" />
            <NumberField {...common} name="scaleMax" label="Highest score" />
          </div>
        )}
        {kind === 'time-with-cutoff' && (
          <NumberField {...common} name="cutoff" label="Cut-off" help="A plot not finished by then is recorded as “not by the cut-off”, never as the cut-off itself." unit={symbol} />
        )}
        <div className="fr-form-row">
          <NumberField {...common} name="plausibleMin" label="Plausible minimum" help="Outside the plausible range: a warning." unit={symbol} />
          <NumberField {...common} name="plausibleMax" label="Plausible maximum" unit={symbol} />
        </div>
        <div className="fr-form-row">
          <NumberField {...common} name="hardMin" label="Hard minimum" help="Outside the hard limits: refused." unit={symbol} />
          <NumberField {...common} name="hardMax" label="Hard maximum" unit={symbol} />
        </div>
        <div className="fr-form-row">
          <NumberField {...common} name="decimals" label="Decimals" help="How readings are shown." />
          <RadioField {...common} name="higherIsBetter" label="Which way is better" help="Findings words each difference this way round." options={directionOptions} />
        </div>
      </FormDialog>
      <VersionConflict what={`measure ${measure?.code ?? code}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
    </>
  );
}

/**
 * Asked, never assumed: a new measure starts with neither answer to which way is better, except a
 * time, where shorter is better; once the person answers, changing the kind leaves their answer.
 */
function useDirectionFollowsKind(isNew: boolean, kind: MeasureKind, { watch, setValue }: Pick<UseFormReturn<MeasureValues, unknown, MeasureBody>, 'watch' | 'setValue'>) {
  const following = useRef(isNew);
  useEffect(() => {
    const subscription = watch((_, { name, type }) => {
      if (name === 'higherIsBetter' && type === 'change') following.current = false;
    });
    return () => subscription.unsubscribe();
  }, [watch]);
  useEffect(() => {
    if (following.current) setValue('higherIsBetter', kind === 'time-with-cutoff' ? 'lower' : '');
  }, [kind, setValue]);
}
