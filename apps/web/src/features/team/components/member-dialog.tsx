import { Checkbox, FormGroup, HTMLSelect } from '@blueprintjs/core';
import type { TrialDetail, TrialRole } from '@friable/contracts';
import { useState } from 'react';
import { fieldError } from '../../../components/field-errors';
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
      {/* Own ids: the invitation form on the same page has a role field of its own. */}
      <FormGroup label="Role" labelFor="fr-member-role" helperText={fieldError(update.error, 'role')} intent={fieldError(update.error, 'role') ? 'danger' : 'none'}>
        <HTMLSelect id="fr-member-role" value={role} onChange={(e) => setRole(e.currentTarget.value as TrialRole)} fill>
          {(['investigator', 'collaborator', 'reviewer'] as const).map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </HTMLSelect>
      </FormGroup>
      {role === 'collaborator' && (
        <FormGroup label="Sites" helperText={fieldError(update.error, 'siteIds') ?? 'A collaborator records data at the sites ticked here.'} intent={fieldError(update.error, 'siteIds') ? 'danger' : 'none'}>
          <div role="group" aria-label="Sites">
            {trial.sites.map((site) => (
              <Checkbox key={site.id} label={site.name} checked={siteIds.includes(site.id)} onChange={() => toggle(site.id)} />
            ))}
          </div>
        </FormGroup>
      )}
    </FormDialog>
  );
}
