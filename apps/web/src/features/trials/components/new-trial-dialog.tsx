import { zodResolver } from '@hookform/resolvers/zod';
import { TRIAL_DESIGNS, type TrialCreateInput } from '@friable/contracts';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { DesignField } from '../../../components/design-field';
import { FormDialog } from '../../../components/form-dialog';
import { TextAreaField, TextField } from '../../../components/form-fields';
import { paths } from '../../../config/paths';
import { useCreateTrial } from '../api/create-trial';

const shownFields = ['code', 'title', 'design', 'question'];

/** A new trial as typed, read into the body the API takes (the server checks the code and title). */
const newTrialSchema = z
  .object({ code: z.string(), title: z.string(), design: z.enum(TRIAL_DESIGNS), question: z.string() })
  .transform((v): TrialCreateInput => ({ code: v.code.trim(), title: v.title.trim(), design: v.design, question: v.question.trim() || null }));

/** "New trial": any signed-in person starts a draft trial and lands on its Protocol. */
export function NewTrialDialog({ isOpen, onClose }: { isOpen: boolean; onClose: () => void }) {
  const navigate = useNavigate();
  const create = useCreateTrial();
  const { control, handleSubmit } = useForm({ resolver: zodResolver(newTrialSchema), defaultValues: { code: '', title: '', design: 'rcbd' as const, question: '' } });
  const submit = handleSubmit((input) => create.mutate(input, { onSuccess: (trial) => navigate(paths.trialProtocol.href(trial.id)) }));
  const common = { control, serverError: create.error };

  return (
    <FormDialog isOpen={isOpen} title="New trial" icon="add" onClose={onClose} onSubmit={() => void submit()} submitText="Create trial" pending={create.isPending} error={create.error} shownFields={shownFields}>
      <p className="fr-muted">You become the trial’s investigator. Treatments, measures, rounds and sites come next, on the Protocol and Sites pages.</p>
      <TextField {...common} name="code" label="Code" help="2 to 20 letters, digits or dashes, e.g. CLAY-27. It names the trial on sheets and files." autoFocus />
      <TextField {...common} name="title" label="Title" />
      <DesignField {...common} />
      <TextAreaField {...common} name="question" label="Question" help="What the trial should find out (optional)." autoResize />
    </FormDialog>
  );
}
