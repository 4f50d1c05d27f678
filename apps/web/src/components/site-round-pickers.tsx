import type { AssessmentRound, TrialDetail } from '@friable/contracts';
import { LabelledSelect } from './labelled-select';

/** The site select of a page that shows one site at a time; the person's own sites are marked. */
export function SitePicker({ trial, value, onChange }: { trial: TrialDetail; value: number; onChange: (siteId: number) => void }) {
  const options = trial.sites.map((s) => ({ value: s.id, label: `${s.name}${trial.mySiteIds.includes(s.id) ? ' (your site)' : ''}` }));
  return <LabelledSelect label="Site" value={value} options={options} onChange={(id) => onChange(Number(id))} />;
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
  const options = [...(every ? [{ value: '', label: every }] : []), ...rounds.map((r) => ({ value: r.id, label: r.label }))];
  return <LabelledSelect label={label} value={value ?? ''} options={options} onChange={(id) => onChange(id ? Number(id) : null)} />;
}
