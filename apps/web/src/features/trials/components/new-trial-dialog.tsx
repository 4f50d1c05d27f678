import { HTMLSelect, InputGroup, TextArea } from '@blueprintjs/core';
import { TRIAL_DESIGNS, type TrialDesign } from '@friable/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { paths } from '../../../config/paths';
import { designHelp, designLabels } from '../../../lib/format';
import { useCreateTrial } from '../api/create-trial';

const shownFields = ['code', 'title', 'design', 'question'];

/** "New trial": any signed-in person starts a draft trial and lands on its Protocol. */
export function NewTrialDialog({ isOpen, onClose }: { isOpen: boolean; onClose: () => void }) {
  const navigate = useNavigate();
  const create = useCreateTrial();
  const [code, setCode] = useState('');
  const [title, setTitle] = useState('');
  const [design, setDesign] = useState<TrialDesign>('rcbd');
  const [question, setQuestion] = useState('');

  function submit() {
    create.mutate(
      { code: code.trim(), title: title.trim(), design, question: question.trim() || null },
      { onSuccess: (trial) => navigate(paths.trialProtocol.href(trial.id)) },
    );
  }

  return (
    <FormDialog isOpen={isOpen} title="New trial" icon="add" onClose={onClose} onSubmit={submit} submitText="Create trial" pending={create.isPending} error={create.error} shownFields={shownFields}>
          <p className="fr-muted">You become the trial’s investigator. Treatments, measures, rounds and sites come next, on the Protocol and Sites pages.</p>
          <Field label="Code" field="code" error={create.error} help="2 to 20 letters, digits or dashes, e.g. CLAY-27. It names the trial on sheets and files.">
            <InputGroup id="fr-field-code" value={code} onChange={(e) => setCode(e.target.value)} autoFocus />
          </Field>
          <Field label="Title" field="title" error={create.error}>
            <InputGroup id="fr-field-title" value={title} onChange={(e) => setTitle(e.target.value)} />
          </Field>
          <Field label="Design" field="design" error={create.error} help={designHelp[design]}>
            <HTMLSelect id="fr-field-design" value={design} onChange={(e) => setDesign(e.target.value as TrialDesign)} fill>
              {TRIAL_DESIGNS.map((d) => (
                <option key={d} value={d}>
                  {designLabels[d]}
                </option>
              ))}
            </HTMLSelect>
          </Field>
          <Field label="Question" field="question" error={create.error} help="What the trial should find out (optional).">
            <TextArea id="fr-field-question" value={question} onChange={(e) => setQuestion(e.target.value)} fill autoResize />
          </Field>
    </FormDialog>
  );
}
