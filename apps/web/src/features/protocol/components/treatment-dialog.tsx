import { Checkbox, HTMLSelect, InputGroup, Radio, RadioGroup, TextArea } from '@blueprintjs/core';
import { CodeNameFields } from './code-name-fields';
import { type RateBasis, type RateUnitId, type Treatment, type TreatmentInput, type TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Field, parseNumberFields } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { NumberText } from '../../../components/number-text';
import { RateUnitSelect } from '../../../components/rate-unit-select';
import { isVolumeRateUnit, numberInputText } from '../../../lib/format';
import { useSaveTreatment } from '../api/save-treatment';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { VersionConflict } from './version-conflict';

const shownFields = ['code', 'name', 'description', 'isControl', 'rateValue', 'rateUnit', 'rateBasis', 'incorporationDepthCm', 'product', 'purity', 'moistureBasis', 'moistureFraction', 'materialKind'];
const labels = { rateValue: 'Rate', incorporationDepthCm: 'Incorporation depth', purity: 'Purity', moistureFraction: 'Water share' };

/** Add or change one treatment: what it is, its rate and unit, and how the rate is meant. */
export function TreatmentDialog({ trial, treatment, onClose }: { trial: TrialDetail; treatment: Treatment | null; onClose: () => void }) {
  const save = useSaveTreatment(trial.id);
  const form = useVersionedForm<TreatmentInput, Treatment, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (treatment ? { treatmentId: treatment.id, version: version ?? treatment.version, input } : { input }),
    treatment,
    onClose,
  );
  const [localError, setLocalError] = useState<Error | null>(null);
  const [code, setCode] = useState(treatment?.code ?? '');
  const [name, setName] = useState(treatment?.name ?? '');
  const [description, setDescription] = useState(treatment?.description ?? '');
  const [isControl, setIsControl] = useState(treatment?.isControl ?? false);
  const [rateValue, setRateValue] = useState(numberInputText(treatment?.rateValue));
  const [rateUnit, setRateUnit] = useState<RateUnitId>(treatment?.rateUnit ?? 'lb/1000ft2');
  const [rateBasis, setRateBasis] = useState<RateBasis>(treatment?.rateBasis ?? 'area');
  const [depth, setDepth] = useState(numberInputText(treatment?.incorporationDepthCm));
  const [product, setProduct] = useState(treatment?.product ?? '');
  const [purityPercent, setPurityPercent] = useState(treatment?.purity != null ? String(treatment.purity * 100) : '');
  const [moistureBasis, setMoistureBasis] = useState<'as-is' | 'dry'>(treatment?.moistureBasis ?? 'as-is');
  const [moisturePercent, setMoisturePercent] = useState(treatment?.moistureFraction != null ? String(treatment.moistureFraction * 100) : '');
  const [materialKind, setMaterialKind] = useState<'gypsum' | 'other'>(treatment?.materialKind ?? 'other');
  const error = localError ?? save.error;
  const [pendingAdd, setPendingAdd] = useState<PendingLayoutChange | null>(null);
  const volumeRate = isVolumeRateUnit(rateUnit);

  function submit() {
    const parsed = parseNumberFields({ rateValue, incorporationDepthCm: depth, purity: purityPercent, moistureFraction: moisturePercent }, labels);
    setLocalError(parsed.error);
    if (parsed.error) return;
    const { values } = parsed;
    const hasRate = !isControl && values.rateValue !== null;
    const input: TreatmentInput = {
      code: code.trim(),
      name: name.trim(),
      description: description.trim() || null,
      isControl,
      rateValue: hasRate ? values.rateValue : null,
      rateUnit: hasRate ? rateUnit : null,
      rateBasis,
      incorporationDepthCm: hasRate && rateBasis === 'concentration' ? values.incorporationDepthCm : null,
      product: product.trim() || null,
      purity: hasRate && !volumeRate && values.purity !== null ? values.purity / 100 : null,
      moistureBasis: volumeRate ? 'as-is' : moistureBasis,
      moistureFraction: hasRate && !volumeRate && moistureBasis === 'dry' && values.moistureFraction !== null ? values.moistureFraction / 100 : null,
      materialKind,
    };
    // A new treatment clears every site's layout: once a site is randomized, that is confirmed first.
    if (!treatment && trial.sites.some((site) => site.plotCount > 0)) {
      setPendingAdd({ what: `Add treatment ${input.code}`, confirmText: 'Add treatment', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  }

  return (
    <>
      <FormDialog title={treatment ? `Edit treatment ${treatment.code}` : 'Add treatment'} icon="lab-test" wide onClose={onClose} onSubmit={submit} submitText={treatment ? 'Save treatment' : 'Add treatment'} pending={save.isPending} error={error} shownFields={shownFields}>
            <CodeNameFields code={code} name={name} onCode={setCode} onName={setName} codeHelp="Short, printed on plot labels, e.g. G40." error={error} />
            <Field label="Description" field="description" error={error} help="How it is applied, optional.">
              <TextArea id="fr-field-description" value={description} onChange={(e) => setDescription(e.target.value)} fill autoResize />
            </Field>
            <Field label="Control" field="isControl" error={error}>
              <Checkbox id="fr-field-isControl" checked={isControl} onChange={(e) => setIsControl(e.currentTarget.checked)} label="Untreated control (nothing applied)" />
            </Field>
            {!isControl && (
              <fieldset className="fr-fieldset">
                <legend>Rate</legend>
                <div className="fr-form-row">
                  <Field label="Rate" field="rateValue" error={error} help="Leave empty when no material is applied.">
                    <NumberText id="fr-field-rateValue" value={rateValue} onChange={setRateValue} />
                  </Field>
                  <Field label="Unit" field="rateUnit" error={error}>
                    <RateUnitSelect id="fr-field-rateUnit" value={rateUnit} onChange={setRateUnit} />
                  </Field>
                </div>
                <Field label="Basis" field="rateBasis" error={error}>
                  <RadioGroup selectedValue={rateBasis} onChange={(e) => setRateBasis(e.currentTarget.value as RateBasis)}>
                    <Radio value="area" label="Per area: spread over each plot’s surface" />
                    <Radio value="concentration" label="Concentration: mixed through a container’s soil, matching a field rate worked in to a depth" />
                  </RadioGroup>
                </Field>
                {rateBasis === 'concentration' && (
                  <Field label="Incorporation depth" field="incorporationDepthCm" error={error} help="How deep the field rate is mixed in; the container’s soil volume is set on the Sites page.">
                    <NumberText id="fr-field-incorporationDepthCm" value={depth} onChange={setDepth} unit="cm" />
                  </Field>
                )}
                <div className="fr-form-row">
                  <Field label="Product" field="product" error={error} help="As sold, e.g. “Garden gypsum, 40 lb bag”.">
                    <InputGroup id="fr-field-product" value={product} onChange={(e) => setProduct(e.target.value)} />
                  </Field>
                  <Field label="Material" field="materialKind" error={error} help="Gypsum rates are checked against common garden rates.">
                    <HTMLSelect id="fr-field-materialKind" value={materialKind} onChange={(e) => setMaterialKind(e.target.value as 'gypsum' | 'other')} fill>
                      <option value="other">Other material</option>
                      <option value="gypsum">Gypsum</option>
                    </HTMLSelect>
                  </Field>
                </div>
                {!volumeRate && (
                  <div className="fr-form-row">
                    <Field label="Purity" field="purity" error={error} help="Leave empty when the rate is for the product as sold.">
                      <NumberText id="fr-field-purity" value={purityPercent} onChange={setPurityPercent} unit="% active" />
                    </Field>
                    <Field label="Rate is for" field="moistureBasis" error={error}>
                      <HTMLSelect id="fr-field-moistureBasis" value={moistureBasis} onChange={(e) => setMoistureBasis(e.target.value as 'as-is' | 'dry')} fill>
                        <option value="as-is">Product as it is (moist)</option>
                        <option value="dry">Dry matter</option>
                      </HTMLSelect>
                    </Field>
                    {moistureBasis === 'dry' && (
                      <Field label="Water share as sold" field="moistureFraction" error={error}>
                        <NumberText id="fr-field-moistureFraction" value={moisturePercent} onChange={setMoisturePercent} unit="%" />
                      </Field>
                    )}
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
