import { InputGroup, Tag } from '@blueprintjs/core';

/**
 * A number box that keeps what the person typed (so "0." or "1,200" survive while typing), with the
 * unit shown inside it; the form parses the text with parseNumberInput when it is sent.
 */
export function NumberText({
  id,
  value,
  onChange,
  unit,
  placeholder,
  disabled,
}: {
  id: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  placeholder?: string;
  disabled?: boolean;
}) {
  return (
    <InputGroup
      id={id}
      inputMode="decimal"
      value={value}
      placeholder={placeholder}
      disabled={disabled}
      onChange={(event) => onChange(event.target.value)}
      rightElement={unit ? <Tag minimal className="fr-unit-tag">{unit}</Tag> : undefined}
    />
  );
}
