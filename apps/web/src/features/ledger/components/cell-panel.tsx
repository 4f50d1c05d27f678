import { Button, Callout, FormGroup, InputGroup } from '@blueprintjs/core';
import type { Measure, Observation, Plot } from '@friable/contracts';
import { useState, type FormEvent } from 'react';
import { MissingReasonInput } from '../../../components/missing-reason-input';
import type { CellRefusal } from '../hooks/use-cell-save';
import { cellLook, cellText } from '../../../lib/observation-text';
import { formatMoment } from '../../../lib/format-moment';
import { measureHeading } from '../../../lib/measure-heading';

const lookWords = { empty: 'no value yet', measured: 'measured', censored: 'censored: not reached by the cut-off', missing: 'missing' } as const;

/**
 * The chosen cell in full: its value, how it was recorded, its notes and missing reason, a form to
 * change all three, and the way to its history. The server's refusal stays here in its words.
 */
export function CellPanel({
  plot,
  measure,
  observation,
  refusal,
  editable,
  saving,
  onSave,
  onHistory,
}: {
  plot: Plot;
  measure: Measure;
  observation: Observation | undefined;
  refusal: CellRefusal | undefined;
  editable: boolean;
  saving: boolean;
  onSave: (edit: { value: string; missingReason: string | null; notes: string | null }) => void;
  onHistory: (observation: Observation) => void;
}) {
  const [value, setValue] = useState(refusal?.text ?? cellText(observation));
  const [missingReason, setMissingReason] = useState(observation?.missingReason ?? '');
  const [notes, setNotes] = useState(observation?.notes ?? '');
  const look = cellLook(observation);
  const heading = `${plot.label} · ${measureHeading(measure)}`;

  function submit(event: FormEvent) {
    event.preventDefault();
    onSave({ value: value.trim(), missingReason: missingReason.trim() || null, notes: notes.trim() || null });
  }

  return (
    <section className="fr-ledger-panel" aria-label={`Value of ${heading}`}>
      <h3 className="fr-ledger-panel__title">{heading}</h3>
      <p className="fr-muted fr-small">
        Block {plot.block} · {plot.treatmentCode} · {lookWords[look]}
        {observation && `, recorded by ${observation.recordedBy ?? 'someone'} on ${formatMoment(observation.recordedAt)} (version ${observation.version})`}
      </p>
      {refusal && (
        <Callout intent="danger" compact icon="error" role="alert" className="fr-gap">
          {refusal.message}
        </Callout>
      )}
      <form onSubmit={submit} noValidate className="fr-ledger-panel__form">
        <FormGroup label="Value" labelFor="fr-ledger-value" helperText="A number, “>600” when the cut-off was reached, or “NA” when missing.">
          <InputGroup id="fr-ledger-value" value={value} disabled={!editable} onChange={(event) => setValue(event.target.value)} />
        </FormGroup>
        <FormGroup label="Missing reason" labelFor="fr-ledger-reason" helperText="Needed when the value is NA: choose a common reason or type your own.">
          <MissingReasonInput id="fr-ledger-reason" label="Missing reason" value={missingReason} disabled={!editable} onChange={setMissingReason} />
        </FormGroup>
        <FormGroup label="Notes" labelFor="fr-ledger-notes">
          <InputGroup id="fr-ledger-notes" value={notes} disabled={!editable} onChange={(event) => setNotes(event.target.value)} />
        </FormGroup>
        <div className="fr-ledger-panel__actions">
          {editable && <Button type="submit" intent="primary" icon="floppy-disk" text="Save value" loading={saving} />}
          {observation && <Button icon="history" text="History" onClick={() => onHistory(observation)} />}
        </div>
      </form>
    </section>
  );
}
