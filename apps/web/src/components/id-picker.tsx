import { HTMLSelect } from '@blueprintjs/core';

/** A labelled choice of one record by its id (a site, a round), as the pages' top bars show it. */
export function IdPicker({ label, value, options, onPick }: { label: string; value: number | undefined; options: Array<{ id: number; text: string }>; onPick: (id: number) => void }) {
  return (
    <label className="fr-site-picker">
      <span>{label}</span>
      <HTMLSelect aria-label={label} value={value} onChange={(event) => onPick(Number(event.target.value))}>
        {options.map((option) => (
          <option key={option.id} value={option.id}>
            {option.text}
          </option>
        ))}
      </HTMLSelect>
    </label>
  );
}
