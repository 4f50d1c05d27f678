import { Button, Checkbox, HTMLTable, InputGroup, Section, SectionCard } from '@blueprintjs/core';
import type { AssessmentRound, RoundInput, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Field, parseNumberFields } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { NumberText } from '../../../components/number-text';
import { EmptyState } from '../../../components/states';
import { formatDate, formatNumber } from '../../../lib/format';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { useVersionedForm } from '../../../lib/edit-conflict';
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
    <Section
      title="Assessment rounds"
      icon="calendar"
      className="fr-section"
      rightElement={canEdit ? <Button icon="add" text="Add round" size="small" onClick={() => setEditing('new')} /> : undefined}
    >
      <SectionCard padded={rounds.length === 0}>
        {rounds.length === 0 ? (
          <EmptyState title="No rounds yet" description="Add when the plots are read, e.g. “Day 0”, “Week 2”, with the measures taken then." />
        ) : (
          <div className="fr-table-scroll">
            <HTMLTable compact striped className="fr-table">
              <thead>
                <tr>
                  <th>Round</th>
                  <th>Day</th>
                  <th>Due</th>
                  <th>Measures</th>
                  {canEdit && <th aria-label="Actions" />}
                </tr>
              </thead>
              <tbody>
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
              </tbody>
            </HTMLTable>
          </div>
        )}
        {remove.error && <p className="fr-error-line">{remove.error.message}</p>}
      </SectionCard>
      {editing && <RoundDialog trial={trial} round={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
      <RemovalConfirm trial={trial} collection="rounds" removal={pending} onClose={() => setPending(null)} />
    </Section>
  );
}

function RoundDialog({ trial, round, onClose }: { trial: TrialDetail; round: AssessmentRound | null; onClose: () => void }) {
  const save = useSaveRound(trial.id);
  const form = useVersionedForm<RoundInput, AssessmentRound, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (round ? { roundId: round.id, version: version ?? round.version, input } : { input }),
    round,
    onClose,
  );
  const [localError, setLocalError] = useState<Error | null>(null);
  const [label, setLabel] = useState(round?.label ?? '');
  const [dayOffset, setDayOffset] = useState(round ? String(round.dayOffset) : '');
  const [measureIds, setMeasureIds] = useState<number[]>(round?.measureIds ?? trial.measures.map((m) => m.id));
  const error = localError ?? save.error;
  const parsedDay = Number(dayOffset);
  const due = trial.startDate && dayOffset !== '' && Number.isInteger(parsedDay) ? formatDate(new Date(Date.parse(trial.startDate.slice(0, 10)) + parsedDay * 86_400_000).toISOString()) : null;

  function submit() {
    const parsed = parseNumberFields({ dayOffset }, { dayOffset: 'Day' });
    setLocalError(parsed.error);
    if (parsed.error) return;
    form.send({ label: label.trim(), dayOffset: parsed.values.dayOffset ?? 0, measureIds });
  }

  return (
    <>
      <FormDialog title={round ? `Edit round ${round.label}` : 'Add round'} icon="calendar" onClose={onClose} onSubmit={submit} submitText={round ? 'Save round' : 'Add round'} pending={save.isPending} error={error} shownFields={['label', 'dayOffset', 'measureIds']}>
            <div className="fr-form-row">
              <Field label="Label" field="label" error={error} help="e.g. Week 2">
                <InputGroup id="fr-field-label" value={label} onChange={(e) => setLabel(e.target.value)} autoFocus />
              </Field>
              <Field label="Day" field="dayOffset" error={error} help={due ? `Due ${due}` : 'Days after the start date (0 = the start).'}>
                <NumberText id="fr-field-dayOffset" value={dayOffset} onChange={setDayOffset} unit="days" />
              </Field>
            </div>
            <Field label="Measures read in this round" field="measureIds" error={error}>
              {trial.measures.length === 0 ? (
                <p className="fr-muted">Add measures first.</p>
              ) : (
                trial.measures.map((measure) => (
                  <Checkbox
                    key={measure.id}
                    label={`${measure.code} — ${measure.name}`}
                    checked={measureIds.includes(measure.id)}
                    onChange={(e) => {
                      const on = e.currentTarget.checked;
                      setMeasureIds((ids) => (on ? [...ids, measure.id] : ids.filter((id) => id !== measure.id)));
                    }}
                  />
                ))
              )}
            </Field>
      </FormDialog>
      <VersionConflict what={`round ${round?.label ?? label}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
    </>
  );
}
