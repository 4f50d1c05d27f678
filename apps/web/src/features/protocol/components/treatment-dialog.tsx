import { zodResolver } from '@hookform/resolvers/zod';
import { type Treatment, type TreatmentInput, type TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { FormDialog } from '../../../components/form-dialog';
import { CheckboxField, CustomField, NumberField, RadioField, SelectField, TextAreaField, TextField } from '../../../components/form-fields';
import { RateUnitSelect } from '../../../components/rate-unit-select';
import { isVolumeRateUnit } from '../../../lib/format';
import { useSaveTreatment } from '../api/save-treatment';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { CodeNameFields } from './code-name-fields';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { treatmentSchema, treatmentValues } from './treatment-schema';
import { VersionConflict } from './version-conflict';

const shownFields = ['code', 'name', 'description', 'isControl', 'rateValue', 'rateUnit', 'rateBasis', 'incorporationDepthCm', 'product', 'purity', 'moistureBasis', 'moistureFraction', 'materialKind'];
const basisOptions = [
  { value: 'area', label: 'Per area: spread over each plot’s surface' },
  { value: 'concentration', label: 'Concentration: mixed through a container’s soil, matching a field rate worked in to a depth' },
];
const materialOptions = [
  { value: 'other', label: 'Other material' },
  { value: 'gypsum', label: 'Gypsum' },
];
const moistureOptions = [
  { value: 'as-is', label: 'Product as it is (moist)' },
  { value: 'dry', label: 'Dry matter' },
];

/** Add or change one treatment: what it is, its rate and unit, and how the rate is meant. */
export function TreatmentDialog({ trial, treatment, onClose }: { trial: TrialDetail; treatment: Treatment | null; onClose: () => void }) {
  const save = useSaveTreatment(trial.id);
  const form = useVersionedForm<TreatmentInput, Treatment, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (treatment ? { treatmentId: treatment.id, version: version ?? treatment.version, input } : { input }),
    treatment,
    onClose,
  );
  const { control, handleSubmit } = useForm({ resolver: zodResolver(treatmentSchema), defaultValues: treatmentValues(treatment) });
  const [code, isControl, rateUnit, rateBasis, moistureBasis] = useWatch({ control, name: ['code', 'isControl', 'rateUnit', 'rateBasis', 'moistureBasis'] });
  const error = save.error;
  const common = { control, serverError: error };
  const [pendingAdd, setPendingAdd] = useState<PendingLayoutChange | null>(null);

  const submit = handleSubmit((input) => {
    // A new treatment clears every site's layout: once a site is randomized, that is confirmed first.
    if (!treatment && trial.sites.some((site) => site.plotCount > 0)) {
      setPendingAdd({ what: `Add treatment ${input.code}`, confirmText: 'Add treatment', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  });

  return (
    <>
      <FormDialog title={treatment ? `Edit treatment ${treatment.code}` : 'Add treatment'} icon="lab-test" wide onClose={onClose} onSubmit={() => void submit()} submitText={treatment ? 'Save treatment' : 'Add treatment'} pending={save.isPending} error={error} shownFields={shownFields}>
        <CodeNameFields control={control} codeHelp="Short, printed on plot labels, e.g. G40." error={error} />
        <TextAreaField {...common} name="description" label="Description" help="How it is applied, optional." autoResize />
        <CheckboxField {...common} name="isControl" heading="Control" label="Untreated control (nothing applied)" />
        {!isControl && (
          <fieldset className="fr-fieldset">
            <legend>Rate</legend>
            <div className="fr-form-row">
              <NumberField {...common} name="rateValue" label="Rate" help="Leave empty when no material is applied." />
              <CustomField {...common} name="rateUnit" label="Unit">
                {(box, id) => <RateUnitSelect id={id} value={box.value} onChange={box.onChange} />}
              </CustomField>
            </div>
            <RadioField {...common} name="rateBasis" label="Basis" options={basisOptions} />
            {rateBasis === 'concentration' && (
              <NumberField {...common} name="incorporationDepthCm" label="Incorporation depth" help="How deep the field rate is mixed in; the container’s soil volume is set on the Sites page." unit="cm" />
            )}
            <div className="fr-form-row">
              <TextField {...common} name="product" label="Product" help="As sold, e.g. “Garden gypsum, 40 lb bag”." />
              <SelectField {...common} name="materialKind" label="Material" help="Gypsum rates are checked against common garden rates." options={materialOptions} />
            </div>
            {!isVolumeRateUnit(rateUnit) && (
              <div className="fr-form-row">
                <NumberField {...common} name="purity" label="Purity" help="Leave empty when the rate is for the product as sold." unit="% active" />
                <SelectField {...common} name="moistureBasis" label="Rate is for" options={moistureOptions} />
                {moistureBasis === 'dry' && <NumberField {...common} name="moistureFraction" label="Water share as sold" unit="%" />}
              </div>
            )}
          </fieldset>
        )}
      </FormDialog>
      <VersionConflict what={`treatment ${treatment?.code ?? code}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
      <LayoutChangeConfirm trial={trial} change={pendingAdd} onClose={() => setPendingAdd(null)} />
    </>
  );
}
