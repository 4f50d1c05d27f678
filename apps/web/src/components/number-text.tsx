import { Button, HTMLSelect, InputGroup, Tag } from '@blueprintjs/core';
import { formatNumber } from '../lib/format';
import { readNumber, writeNumber, type NumberMeaning } from '../lib/number-reading';
import { usePersonLocale } from '../lib/person-locale';

function decimalsOf(meaning: NumberMeaning): number {
  return meaning.decimalText.split('.')[1]?.length ?? 0;
}

/** "1,000" read both ways, in words a person can choose between. */
function AmbiguityQuestion({ text, thousands, decimal, onChoose }: { text: string; thousands: NumberMeaning; decimal: NumberMeaning; onChoose: (meaning: NumberMeaning) => void }) {
  const places = decimalsOf(decimal);
  return (
    <div className="fr-number-question" role="group" aria-label={`What does ${text} mean?`}>
      <span>“{text}” could be read two ways. Which did you mean?</span>
      <span className="fr-number-question__choices">
        <Button size="small" text={formatNumber(thousands.value, 0)} aria-label={`${formatNumber(thousands.value, 0)} (thousands)`} onClick={() => onChoose(thousands)} />
        <Button size="small" text={formatNumber(decimal.value, places, places)} aria-label={`${formatNumber(decimal.value, places, places)} (decimals)`} onClick={() => onChoose(decimal)} />
      </span>
    </div>
  );
}

/**
 * A number box that keeps what the person typed (so "0." or "1 200" survive while typing), with the
 * unit shown inside it. A decimal comma and a decimal point are both read (the shared reading in
 * lib/number-reading, in the person's locale); an entry that could be read two ways ("1,000") asks
 * which was meant, and on leaving the box the number is written back in the person's own way.
 * The form reads the text with parseNumberInput when it is sent.
 */
export function NumberText({
  id,
  value,
  onChange,
  unit,
  placeholder,
  disabled,
  large,
  ariaLabel,
  unitChoice,
}: {
  id: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  placeholder?: string;
  disabled?: boolean;
  large?: boolean;
  ariaLabel?: string;
  /** A unit the person picks beside the number (m or ft), in place of a fixed `unit`. */
  unitChoice?: { label: string; value: string; options: Array<{ value: string; label: string }>; onChange: (value: string) => void };
}) {
  const locale = usePersonLocale();
  const reading = readNumber(value, locale);
  const invalid = reading.kind === 'invalid';
  return (
    <div className="fr-number">
      <InputGroup
        id={id}
        inputMode="decimal"
        autoComplete="off"
        value={value}
        placeholder={placeholder}
        disabled={disabled}
        size={large ? 'large' : undefined}
        aria-label={ariaLabel}
        aria-invalid={invalid || reading.kind === 'ambiguous' ? true : undefined}
        intent={invalid ? 'danger' : reading.kind === 'ambiguous' ? 'warning' : 'none'}
        onChange={(event) => onChange(event.target.value)}
        onBlur={() => {
          // Written back the person's way, so they see what was read: "0,5" → "0.5" (en), "1 200" → "1200".
          if (reading.kind !== 'number') return;
          const written = writeNumber(reading.decimalText, locale);
          if (written !== value) onChange(written);
        }}
        rightElement={
          unitChoice ? (
            <HTMLSelect
              minimal
              className="fr-unit-select"
              aria-label={unitChoice.label}
              value={unitChoice.value}
              disabled={disabled}
              onChange={(event) => unitChoice.onChange(event.target.value)}
              options={unitChoice.options}
            />
          ) : unit ? (
            <Tag minimal className="fr-unit-tag">
              {unit}
            </Tag>
          ) : undefined
        }
      />
      {reading.kind === 'ambiguous' && !disabled && (
        <AmbiguityQuestion text={value.trim()} thousands={reading.thousands} decimal={reading.decimal} onChoose={(meaning) => onChange(writeNumber(meaning.decimalText, locale))} />
      )}
      {invalid && !disabled && <div className="fr-number-problem">Not a number Friable can read: type digits, with a decimal comma or point.</div>}
    </div>
  );
}
