import { Button, HTMLSelect, InputGroup, Section, SectionCard, TextArea } from '@blueprintjs/core';
import { TRIAL_DESIGNS, type TrialDesign, type TrialDetail, type TrialUpdateInput } from '@friable/contracts';
import { useState } from 'react';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { designHelp, designLabels, formatDate, statusLabels } from '../../../lib/format';
import { useUpdateTrial } from '../api/update-trial';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { VersionConflict } from './version-conflict';

const shownFields = ['title', 'question', 'design', 'startDate', 'seed', 'safetyNotes', 'noControlReason'];

/** The trial's own fields: what it asks, how it is laid out, when it starts, and its safety notes. */
export function TrialFieldsSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  return (
    <Section
      title="Trial"
      icon="properties"
      className="fr-section"
      rightElement={canEdit ? <Button icon="edit" text="Edit trial" size="small" onClick={() => setEditing(true)} /> : undefined}
    >
      <SectionCard>
        <dl className="fr-facts-list">
          <dt>Code</dt>
          <dd className="fr-code">{trial.code}</dd>
          <dt>Title</dt>
          <dd>{trial.title}</dd>
          <dt>Question</dt>
          <dd>{trial.question || <span className="fr-muted">Not written yet</span>}</dd>
          <dt>Design</dt>
          <dd>{designLabels[trial.design] ?? trial.design}</dd>
          <dt>Status</dt>
          <dd>{statusLabels[trial.status] ?? trial.status}</dd>
          <dt>Start date</dt>
          <dd>{trial.startDate ? formatDate(trial.startDate) : <span className="fr-muted">Not set (rounds get due dates once it is)</span>}</dd>
          <dt>Seed</dt>
          <dd>
            <span className="fr-code">{trial.seed}</span> <span className="fr-muted">— the same seed always gives the same plot plans</span>
          </dd>
          <dt>Safety notes</dt>
          <dd className="fr-prewrap">{trial.safetyNotes || <span className="fr-muted">None written</span>}</dd>
          {trial.noControlReason && (
            <>
              <dt>Why no control</dt>
              <dd>{trial.noControlReason}</dd>
            </>
          )}
        </dl>
      </SectionCard>
      {editing && <TrialFieldsDialog trial={trial} onClose={() => setEditing(false)} />}
    </Section>
  );
}

function TrialFieldsDialog({ trial, onClose }: { trial: TrialDetail; onClose: () => void }) {
  const update = useUpdateTrial(trial.id);
  const [title, setTitle] = useState(trial.title);
  const [question, setQuestion] = useState(trial.question ?? '');
  const [design, setDesign] = useState<TrialDesign>(trial.design);
  const [startDate, setStartDate] = useState(trial.startDate?.slice(0, 10) ?? '');
  const [seed, setSeed] = useState(trial.seed);
  const [safetyNotes, setSafetyNotes] = useState(trial.safetyNotes ?? '');
  const [noControlReason, setNoControlReason] = useState(trial.noControlReason ?? '');
  const hasControl = trial.treatments.some((t) => t.isControl);

  const form = useVersionedForm<Omit<TrialUpdateInput, 'version'>, TrialDetail, TrialUpdateInput>(update, (input, version) => ({ ...input, version: version ?? trial.version }), trial, onClose);

  const [pendingDesign, setPendingDesign] = useState<PendingLayoutChange | null>(null);

  function submit() {
    const input = {
        title: title.trim(),
        question: question.trim() || null,
        design,
        startDate: startDate || null,
        seed: seed.trim(),
        safetyNotes: safetyNotes.trim() || null,
        noControlReason: noControlReason.trim() || null,
      };
    // A new design clears every site's layout: once a site is randomized, that is confirmed first.
    if (design !== trial.design && trial.sites.some((site) => site.plotCount > 0)) {
      setPendingDesign({ what: `Change the design to ${designLabels[design] ?? design}`, confirmText: 'Change the design', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  }

  return (
    <>
      <FormDialog title="Edit trial" icon="edit" onClose={onClose} onSubmit={submit} submitText="Save trial" pending={update.isPending} error={update.error} shownFields={shownFields}>
            <Field label="Title" field="title" error={update.error}>
              <InputGroup id="fr-field-title" value={title} onChange={(e) => setTitle(e.target.value)} />
            </Field>
            <Field label="Question" field="question" error={update.error} help="What the trial should find out, e.g. “Does gypsum at 40 lb/1,000 ft² shorten drain time on heavy clay?”">
              <TextArea id="fr-field-question" value={question} onChange={(e) => setQuestion(e.target.value)} fill autoResize />
            </Field>
            <Field label="Design" field="design" error={update.error} help={designHelp[design]}>
              <HTMLSelect id="fr-field-design" value={design} onChange={(e) => setDesign(e.target.value as TrialDesign)} fill>
                {TRIAL_DESIGNS.map((d) => (
                  <option key={d} value={d}>
                    {designLabels[d]}
                  </option>
                ))}
              </HTMLSelect>
            </Field>
            <div className="fr-form-row">
              <Field label="Start date" field="startDate" error={update.error} help="Day 0 of the assessment rounds.">
                <InputGroup id="fr-field-startDate" type="date" value={startDate} onChange={(e) => setStartDate(e.target.value)} />
              </Field>
              <Field label="Seed" field="seed" error={update.error} help="Any text; it fixes the randomization.">
                <InputGroup id="fr-field-seed" value={seed} onChange={(e) => setSeed(e.target.value)} />
              </Field>
            </div>
            <Field label="Safety notes" field="safetyNotes" error={update.error} help="Printed on every site’s sheets: masks for powders, gloves for compost and manure, lifting.">
              <TextArea id="fr-field-safetyNotes" value={safetyNotes} onChange={(e) => setSafetyNotes(e.target.value)} fill autoResize />
            </Field>
            {!hasControl && (
              <Field label="Why there is no untreated control" field="noControlReason" error={update.error} help="Without a control no effect can be claimed; say why it is left out.">
                <TextArea id="fr-field-noControlReason" value={noControlReason} onChange={(e) => setNoControlReason(e.target.value)} fill autoResize />
              </Field>
            )}
      </FormDialog>
      <VersionConflict what={`trial ${trial.code}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
      <LayoutChangeConfirm trial={trial} change={pendingDesign} onClose={() => setPendingDesign(null)} />
    </>
  );
}
