import { HTMLSelect } from '@blueprintjs/core';
import type { AssessmentRound, TrialDetail } from '@friable/contracts';

/** The site select of a page that shows one site at a time; the person's own sites are marked. */
export function SitePicker({ trial, value, onChange }: { trial: TrialDetail; value: number; onChange: (siteId: number) => void }) {
  return (
    <label className="fr-site-picker">
      <span>Site</span>
      <HTMLSelect aria-label="Site" value={value} onChange={(event) => onChange(Number(event.target.value))}>
        {trial.sites.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
            {trial.mySiteIds.includes(s.id) ? ' (your site)' : ''}
          </option>
        ))}
      </HTMLSelect>
    </label>
  );
}

/** The round select; with `every`, a first choice meaning all rounds (value null). */
export function RoundPicker({
  rounds,
  value,
  onChange,
  label = 'Round',
  every,
}: {
  rounds: AssessmentRound[];
  value: number | null;
  onChange: (roundId: number | null) => void;
  label?: string;
  every?: string;
}) {
  return (
    <label className="fr-site-picker">
      <span>{label}</span>
      <HTMLSelect aria-label={label} value={value ?? ''} onChange={(event) => onChange(event.target.value ? Number(event.target.value) : null)}>
        {every && <option value="">{every}</option>}
        {rounds.map((r) => (
          <option key={r.id} value={r.id}>
            {r.label}
          </option>
        ))}
      </HTMLSelect>
    </label>
  );
}
