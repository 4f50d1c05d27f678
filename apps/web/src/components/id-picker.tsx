import { LabelledSelect } from './labelled-select';

/** A labelled choice of one record by its id (a site, a round), as the pages' top bars show it. */
export function IdPicker({ label, value, options, onPick }: { label: string; value: number | undefined; options: Array<{ id: number; text: string }>; onPick: (id: number) => void }) {
  return <LabelledSelect label={label} value={value ?? ''} options={options.map((o) => ({ value: o.id, label: o.text }))} onChange={(id) => onPick(Number(id))} />;
}
