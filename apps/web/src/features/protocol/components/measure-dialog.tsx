import { HTMLSelect, Radio, RadioGroup } from '@blueprintjs/core';
import { CodeNameFields } from './code-name-fields';
import { MEASURE_KINDS, type Measure, type MeasureKind, type TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Field, parseNumberFields } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { NumberText } from '../../../components/number-text';
import { measureKindLabels, numberInputText } from '../../../lib/format';
import { useSaveMeasure, type MeasureBody, type MeasureUnitId } from '../api/save-measure';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { VersionConflict } from './version-conflict';
import { measureUnitGroups, unitSymbol } from './measure-units';

const shownFields = ['code', 'name', 'unit', 'kind', 'scaleMin', 'scaleMax', 'cutoff', 'plausibleMin', 'plausibleMax', 'hardMin', 'hardMax', 'decimals', 'higherIsBetter'];
const labels = {
  scaleMin: 'Lowest score',
  scaleMax: 'Highest score',
  cutoff: 'Cut-off',
  plausibleMin: 'Plausible minimum',
  plausibleMax: 'Plausible maximum',
  hardMin: 'Hard minimum',
  hardMax: 'Hard maximum',
  decimals: 'Decimals',
};

/** Add or change a measure: its unit from the fixed list, its kind, and the ranges that catch typing slips. */
export function MeasureDialog({ trial, measure, onClose }: { trial: TrialDetail; measure: Measure | null; onClose: () => void }) {
  const save = useSaveMeasure(trial.id);
  const form = useVersionedForm<MeasureBody, Measure, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (measure ? { measureId: measure.id, version: version ?? measure.version, input } : { input }),
    measure,
    onClose,
  );
  const [localError, setLocalError] = useState<Error | null>(null);
  const [code, setCode] = useState(measure?.code ?? '');
  const [name, setName] = useState(measure?.name ?? '');
  const [unit, setUnit] = useState<MeasureUnitId>((measure?.unit as MeasureUnitId | undefined) ?? 's');
  const [kind, setKind] = useState<MeasureKind>(measure?.kind ?? 'continuous');
  const [texts, setTexts] = useState({
    scaleMin: numberInputText(measure?.scaleMin),
    scaleMax: numberInputText(measure?.scaleMax),
    cutoff: numberInputText(measure?.cutoff),
    plausibleMin: numberInputText(measure?.plausibleMin),
    plausibleMax: numberInputText(measure?.plausibleMax),
    hardMin: numberInputText(measure?.hardMin),
    hardMax: numberInputText(measure?.hardMax),
    decimals: numberInputText(measure?.decimals ?? 1),
  });
  // Asked, never assumed: a new measure starts with neither answer, except a time, where shorter is better.
  const [higherIsBetter, setHigherIsBetter] = useState<boolean | null>(measure?.higherIsBetter ?? null);
  const [directionChosen, setDirectionChosen] = useState(measure !== null);
  function chooseKind(next: MeasureKind) {
    setKind(next);
    if (!directionChosen) setHigherIsBetter(next === 'time-with-cutoff' ? false : null);
  }
  const error = localError ?? save.error;
  const symbol = unitSymbol(unit);
  const text = (field: keyof typeof texts) => ({ value: texts[field], onChange: (value: string) => setTexts((all) => ({ ...all, [field]: value })) });

  function submit() {
    const parsed = parseNumberFields(texts, labels);
    setLocalError(parsed.error);
    if (parsed.error) return;
    const v = parsed.values;
    // Without an answer the direction is left out, and the server's refusal is shown beside the question.
    const input = {
      code: code.trim(),
      name: name.trim(),
      unit,
      kind,
      scaleMin: kind === 'score' ? v.scaleMin : null,
      scaleMax: kind === 'score' ? v.scaleMax : null,
      cutoff: kind === 'time-with-cutoff' ? v.cutoff : null,
      plausibleMin: v.plausibleMin,
      plausibleMax: v.plausibleMax,
      hardMin: v.hardMin,
      hardMax: v.hardMax,
      decimals: v.decimals ?? 0,
      ...(higherIsBetter === null ? {} : { higherIsBetter }),
    } as MeasureBody;
    form.send(input);
  }

  return (
    <>
      <FormDialog title={measure ? `Edit measure ${measure.code}` : 'Add measure'} icon="timeline-line-chart" wide onClose={onClose} onSubmit={submit} submitText={measure ? 'Save measure' : 'Add measure'} pending={save.isPending} error={error} shownFields={shownFields}>
            <CodeNameFields code={code} name={name} onCode={setCode} onName={setName} codeHelp="Short, heads the CSV column, e.g. DRAIN." error={error} />
            <div className="fr-form-row">
              <Field label="Unit" field="unit" error={error}>
                <HTMLSelect id="fr-field-unit" value={unit} onChange={(e) => setUnit(e.target.value as MeasureUnitId)} fill>
                  {measureUnitGroups.map((group) => (
                    <optgroup key={group.dimension} label={group.dimension}>
                      {group.units.map((u) => (
                        <option key={u.id} value={u.id}>
                          {u.symbol} — {u.label}
                        </option>
                      ))}
                    </optgroup>
                  ))}
                </HTMLSelect>
              </Field>
              <Field label="Kind" field="kind" error={error}>
                <HTMLSelect id="fr-field-kind" value={kind} onChange={(e) => chooseKind(e.target.value as MeasureKind)} fill>
                  {MEASURE_KINDS.map((k) => (
                    <option key={k} value={k}>
                      {measureKindLabels[k]}
                    </option>
                  ))}
                </HTMLSelect>
              </Field>
            </div>
            {kind === 'score' && (
              <div className="fr-form-row">
                <Field label="Lowest score" field="scaleMin" error={error}>
                  <NumberText id="fr-field-scaleMin" {...text('scaleMin')} />
                </Field>
                <Field label="Highest score" field="scaleMax" error={error}>
                  <NumberText id="fr-field-scaleMax" {...text('scaleMax')} />
                </Field>
              </div>
            )}
            {kind === 'time-with-cutoff' && (
              <Field label="Cut-off" field="cutoff" error={error} help="A plot not finished by then is recorded as “not by the cut-off”, never as the cut-off itself.">
                <NumberText id="fr-field-cutoff" {...text('cutoff')} unit={symbol} />
              </Field>
            )}
            <div className="fr-form-row">
              <Field label="Plausible minimum" field="plausibleMin" error={error} help="Outside the plausible range: a warning.">
                <NumberText id="fr-field-plausibleMin" {...text('plausibleMin')} unit={symbol} />
              </Field>
              <Field label="Plausible maximum" field="plausibleMax" error={error}>
                <NumberText id="fr-field-plausibleMax" {...text('plausibleMax')} unit={symbol} />
              </Field>
            </div>
            <div className="fr-form-row">
              <Field label="Hard minimum" field="hardMin" error={error} help="Outside the hard limits: refused.">
                <NumberText id="fr-field-hardMin" {...text('hardMin')} unit={symbol} />
              </Field>
              <Field label="Hard maximum" field="hardMax" error={error}>
                <NumberText id="fr-field-hardMax" {...text('hardMax')} unit={symbol} />
              </Field>
            </div>
            <div className="fr-form-row">
              <Field label="Decimals" field="decimals" error={error} help="How readings are shown.">
                <NumberText id="fr-field-decimals" {...text('decimals')} />
              </Field>
              <Field label="Which way is better" field="higherIsBetter" error={error} help="Findings words each difference this way round.">
                <RadioGroup
                  name="fr-field-higherIsBetter"
                  selectedValue={higherIsBetter === null ? undefined : higherIsBetter ? 'higher' : 'lower'}
                  onChange={(e) => {
                    setDirectionChosen(true);
                    setHigherIsBetter(e.currentTarget.value === 'higher');
                  }}
                >
                  <Radio value="higher" label="Higher is better" />
                  <Radio value="lower" label="Lower is better" />
                </RadioGroup>
              </Field>
            </div>
      </FormDialog>
      <VersionConflict what={`measure ${measure?.code ?? code}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
    </>
  );
}
