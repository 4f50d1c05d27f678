import { Button, InputGroup } from '@blueprintjs/core';

/** The reasons people give most for a value they could not take; any other is typed. */
export const COMMON_MISSING_REASONS = ['plot flooded', 'plot damaged by animals', 'equipment failed', 'not measured on the day', 'sample lost'] as const;

/**
 * Why a value is missing: a box to type the reason, and the common reasons as buttons that fill it in one tap
 * (an NA is refused without a reason, on the server as here).
 */
export function MissingReasonInput({
  id,
  label,
  value,
  disabled,
  large,
  onChange,
  onChoose,
  onBlur,
}: {
  id: string;
  /** "Why drain time is missing". */
  label: string;
  value: string;
  disabled?: boolean;
  /** Touch-sized buttons (the round walk). */
  large?: boolean;
  onChange: (reason: string) => void;
  /** A common reason tapped (after onChange). */
  onChoose?: (reason: string) => void;
  onBlur?: () => void;
}) {
  return (
    <div className="fr-missing-reason">
      <InputGroup id={id} aria-label={label} placeholder="Why is it missing? Choose or type" value={value} disabled={disabled} onChange={(event) => onChange(event.target.value)} onBlur={onBlur} />
      <div className="fr-missing-reason__choices" role="group" aria-label={`${label}: common reasons`}>
        {COMMON_MISSING_REASONS.map((reason) => (
          <Button
            key={reason}
            size="small"
            className={large ? 'fr-touch' : undefined}
            variant={value.trim() === reason ? 'solid' : 'outlined'}
            intent={value.trim() === reason ? 'primary' : 'none'}
            text={reason}
            disabled={disabled}
            onClick={() => {
              onChange(reason);
              onChoose?.(reason);
            }}
          />
        ))}
      </div>
    </div>
  );
}
