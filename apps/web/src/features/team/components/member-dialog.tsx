import { Checkbox, HTMLSelect } from '@blueprintjs/core';
import type { TrialDetail, TrialRole } from '@friable/contracts';
import { useState } from 'react';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { roleLabels } from '../../../lib/format';
import { useUpdateMember } from '../api/change-member';
import type { TeamPerson } from './team-people';

/** The investigator changes a person's role and, for a collaborator, their sites. */
export function MemberDialog({ trial, person, onClose }: { trial: TrialDetail; person: TeamPerson; onClose: () => void }) {
  const update = useUpdateMember(trial.id);
  const [role, setRole] = useState<TrialRole>(person.roles[0]);
  const [siteIds, setSiteIds] = useState<number[]>(person.siteIds);
  const toggle = (id: number) => setSiteIds((ids) => (ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id]));
  return (
    <FormDialog
      title={`Change ${person.name}'s place on the trial`}
      icon="people"
      onClose={onClose}
      onSubmit={() => update.mutate({ userId: person.userId, role, ...(role === 'collaborator' ? { siteIds } : {}) }, { onSuccess: onClose })}
      submitText="Save the change"
      pending={update.isPending}
      error={update.error}
      shownFields={['role', 'siteIds']}
    >
      <p className="fr-muted">The change takes effect at once, and {person.name} gets an e-mail saying what changed.</p>
      <Field label="Role" field="role" error={update.error}>
        <HTMLSelect id="fr-field-role" value={role} onChange={(e) => setRole(e.currentTarget.value as TrialRole)} fill>
          {(['investigator', 'collaborator', 'reviewer'] as const).map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </HTMLSelect>
      </Field>
      {role === 'collaborator' && (
        <Field label="Sites" field="siteIds" error={update.error} help="A collaborator records data at the sites ticked here.">
          <div id="fr-field-siteIds" role="group" aria-label="Sites">
            {trial.sites.map((site) => (
              <Checkbox key={site.id} label={site.name} checked={siteIds.includes(site.id)} onChange={() => toggle(site.id)} />
            ))}
          </div>
        </Field>
      )}
    </FormDialog>
  );
}
