import { zodResolver } from '@hookform/resolvers/zod';
import { Checkbox } from '@blueprintjs/core';
import type { AssessmentRound, RoundInput, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { FormDialog } from '../../../components/form-dialog';
import { CustomField, NumberField, TextField } from '../../../components/form-fields';
import { formatDate, formatNumber, parseNumberInput } from '../../../lib/format';
import { checkNumberTexts } from '../../../lib/form-rules';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { ProtocolTableSection } from './protocol-table-section';
import { RemovalConfirm, type PendingRemoval } from './removal-confirm';
import { RowActions } from './row-actions';
import { VersionConflict } from './version-conflict';
import { useSaveRound } from '../api/save-round';

/** When the plots are assessed: day offsets from the start date, and which measures each round reads. */
export function RoundsSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState<AssessmentRound | 'new' | null>(null);
  const [pending, setPending] = useState<PendingRemoval | null>(null);
  const remove = useDeleteProtocolItem(trial.id, 'rounds');
  const measureCode = (id: number) => trial.measures.find((m) => m.id === id)?.code ?? `#${id}`;
  const rounds = [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset);
  return (
    <ProtocolTableSection
      title="Assessment rounds"
      icon="calendar"
      addText="Add round"
      onAdd={canEdit ? () => setEditing('new') : undefined}
      empty={rounds.length === 0 ? { title: 'No rounds yet', description: 'Add when the plots are read, e.g. “Day 0”, “Week 2”, with the measures taken then.' } : null}
      heads={['Round', 'Day', 'Due', 'Measures']}
      withActions={canEdit}
      removeError={remove.error}
      after={
        <>
          {editing && <RoundDialog trial={trial} round={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
          <RemovalConfirm trial={trial} collection="rounds" removal={pending} onClose={() => setPending(null)} />
        </>
      }
    >
        {rounds.map((round) => (
          <tr key={round.id}>
            <td>{round.label}</td>
            <td>day {formatNumber(round.dayOffset, 0)}</td>
            <td>{round.dueDate ? formatDate(round.dueDate) : <span className="fr-muted">set a start date</span>}</td>
            <td>{round.measureIds.length ? round.measureIds.map(measureCode).join(', ') : <span className="fr-muted">none chosen</span>}</td>
            {canEdit && (
              <RowActions
                name={round.label}
                onEdit={() => setEditing(round)}
                remove={{
                  loading: remove.isPending && remove.variables?.id === round.id,
                  ask: () => setPending({ id: round.id, what: `Remove round ${round.label}`, confirmText: 'Remove round', proceed: (confirm) => remove.mutate({ id: round.id, confirm }) }),
                }}
              />
            )}
          </tr>
        ))}
    </ProtocolTableSection>
  );
}

/** A round as its dialog holds it (the day as typed), read into the body the API takes. */
const roundSchema = z
  .object({ label: z.string(), dayOffset: z.string(), measureIds: z.array(z.number()) })
  .superRefine((values, ctx) => checkNumberTexts(values, { dayOffset: 'Day' }, ctx))
  .transform((v): RoundInput => ({ label: v.label.trim(), dayOffset: parseNumberInput(v.dayOffset) ?? 0, measureIds: v.measureIds }));

function RoundDialog({ trial, round, onClose }: { trial: TrialDetail; round: AssessmentRound | null; onClose: () => void }) {
  const save = useSaveRound(trial.id);
  const form = useVersionedForm<RoundInput, AssessmentRound, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (round ? { roundId: round.id, version: version ?? round.version, input } : { input }),
    round,
    onClose,
  );
  const { control, handleSubmit } = useForm({
    resolver: zodResolver(roundSchema),
    defaultValues: { label: round?.label ?? '', dayOffset: round ? String(round.dayOffset) : '', measureIds: round?.measureIds ?? trial.measures.map((m) => m.id) },
  });
  const [label, dayOffset] = useWatch({ control, name: ['label', 'dayOffset'] });
  const error = save.error;
  const common = { control, serverError: error };
  const parsedDay = Number(dayOffset);
  const due = trial.startDate && dayOffset !== '' && Number.isInteger(parsedDay) ? formatDate(new Date(Date.parse(trial.startDate.slice(0, 10)) + parsedDay * 86_400_000).toISOString()) : null;
  const submit = handleSubmit((input) => form.send(input));

  return (
    <>
      <FormDialog title={round ? `Edit round ${round.label}` : 'Add round'} icon="calendar" onClose={onClose} onSubmit={() => void submit()} submitText={round ? 'Save round' : 'Add round'} pending={save.isPending} error={error} shownFields={['label', 'dayOffset', 'measureIds']}>
        <div className="fr-form-row">
          <TextField {...common} name="label" label="Label" help="e.g. Week 2" autoFocus />
          <NumberField {...common} name="dayOffset" label="Day" help={due ? `Due ${due}` : 'Days after the start date (0 = the start).'} unit="days" />
        </div>
        <CustomField {...common} name="measureIds" label="Measures read in this round">
          {(box) =>
            trial.measures.length === 0 ? (
              <p className="fr-muted">Add measures first.</p>
            ) : (
              trial.measures.map((measure) => (
                <Checkbox
                  key={measure.id}
                  label={`${measure.code} — ${measure.name}`}
                  checked={box.value.includes(measure.id)}
                  onChange={(e) => box.onChange(e.currentTarget.checked ? [...box.value, measure.id] : box.value.filter((id) => id !== measure.id))}
                />
              ))
            )
          }
        </CustomField>
      </FormDialog>
      <VersionConflict what={`round ${round?.label ?? label}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
    </>
  );
}
