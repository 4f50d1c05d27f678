import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Section, SectionCard } from '@blueprintjs/core';
import { TRIAL_DESIGNS, type TrialDetail, type TrialUpdateInput } from '@friable/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { DesignField } from '../../../components/design-field';
import { FormDialog } from '../../../components/form-dialog';
import { TextAreaField, TextField } from '../../../components/form-fields';
import { designLabels, formatDate, statusLabels } from '../../../lib/format';
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

/** The trial's fields as typed, read into the body the API takes (empty texts become null). */
const trialFieldsSchema = z
  .object({ title: z.string(), question: z.string(), design: z.enum(TRIAL_DESIGNS), startDate: z.string(), seed: z.string(), safetyNotes: z.string(), noControlReason: z.string() })
  .transform(
    (v): Omit<TrialUpdateInput, 'version'> => ({
      title: v.title.trim(),
      question: v.question.trim() || null,
      design: v.design,
      startDate: v.startDate || null,
      seed: v.seed.trim(),
      safetyNotes: v.safetyNotes.trim() || null,
      noControlReason: v.noControlReason.trim() || null,
    }),
  );

function TrialFieldsDialog({ trial, onClose }: { trial: TrialDetail; onClose: () => void }) {
  const update = useUpdateTrial(trial.id);
  const { control, handleSubmit } = useForm({
    resolver: zodResolver(trialFieldsSchema),
    defaultValues: {
      title: trial.title,
      question: trial.question ?? '',
      design: trial.design,
      startDate: trial.startDate?.slice(0, 10) ?? '',
      seed: trial.seed,
      safetyNotes: trial.safetyNotes ?? '',
      noControlReason: trial.noControlReason ?? '',
    },
  });
  const hasControl = trial.treatments.some((t) => t.isControl);
  const common = { control, serverError: update.error };
  const form = useVersionedForm<Omit<TrialUpdateInput, 'version'>, TrialDetail, TrialUpdateInput>(update, (input, version) => ({ ...input, version: version ?? trial.version }), trial, onClose);
  const [pendingDesign, setPendingDesign] = useState<PendingLayoutChange | null>(null);

  const submit = handleSubmit((input) => {
    const design = input.design ?? trial.design;
    // A new design clears every site's layout: once a site is randomized, that is confirmed first.
    if (design !== trial.design && trial.sites.some((site) => site.plotCount > 0)) {
      setPendingDesign({ what: `Change the design to ${designLabels[design] ?? design}`, confirmText: 'Change the design', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  });

  return (
    <>
      <FormDialog title="Edit trial" icon="edit" onClose={onClose} onSubmit={() => void submit()} submitText="Save trial" pending={update.isPending} error={update.error} shownFields={shownFields}>
        <TextField {...common} name="title" label="Title" />
        <TextAreaField {...common} name="question" label="Question" help="What the trial should find out, e.g. “Does gypsum at 40 lb/1,000 ft² shorten drain time on heavy clay?”" autoResize />
        <DesignField {...common} />
        <div className="fr-form-row">
          <TextField {...common} name="startDate" label="Start date" help="Day 0 of the assessment rounds." type="date" />
          <TextField {...common} name="seed" label="Seed" help="Any text; it fixes the randomization." />
        </div>
        <TextAreaField {...common} name="safetyNotes" label="Safety notes" help="Printed on every site’s sheets: masks for powders, gloves for compost and manure, lifting." autoResize />
        {!hasControl && (
          <TextAreaField {...common} name="noControlReason" label="Why there is no untreated control" help="Without a control no effect can be claimed; say why it is left out." autoResize />
        )}
      </FormDialog>
      <VersionConflict what={`trial ${trial.code}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
      <LayoutChangeConfirm trial={trial} change={pendingDesign} onClose={() => setPendingDesign(null)} />
    </>
  );
}
