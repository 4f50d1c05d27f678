import { HTMLSelect } from '@blueprintjs/core';

export interface SelectOption {
  value: string | number;
  label: string;
}

/** A select with its label before it, as the pages' top bars and the Findings choices show them; the label names it for screen readers too. */
export function LabelledSelect({
  label,
  ariaLabel = label,
  className = 'fr-site-picker',
  value,
  options,
  onChange,
}: {
  label: string;
  ariaLabel?: string;
  className?: string;
  value: string | number;
  options: SelectOption[];
  onChange: (value: string) => void;
}) {
  return (
    <label className={className}>
      <span>{label}</span>
      <HTMLSelect aria-label={ariaLabel} value={value} onChange={(event) => onChange(event.target.value)}>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </HTMLSelect>
    </label>
  );
}
