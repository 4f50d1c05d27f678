import { Button, Callout, Checkbox, Section, SectionCard } from '@blueprintjs/core';
import type { IntakeResult } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';
import { IntakeChanges } from './intake-changes';
import { IntakeProblems } from './intake-problems';

/** What a checked file would do, its unusual values to confirm, and the button that saves it. */
export function CheckResult({
  checked,
  acceptWarnings,
  onAcceptWarnings,
  saving,
  onSave,
}: {
  checked: IntakeResult;
  acceptWarnings: boolean;
  onAcceptWarnings: (accept: boolean) => void;
  saving: boolean;
  onSave: () => void;
}) {
  const warnings = checked.warnings;
  return (
    <Section title="What this upload would do" icon="changes" className="fr-section">
      <SectionCard>
        {checked.identicalToPrevious ? (
          <Callout icon="tick" intent="success">
            This file is byte for byte the one uploaded last time for this site and round: nothing would change.
          </Callout>
        ) : (
          <IntakeChanges result={checked} />
        )}
        {warnings.length > 0 && (
          <Callout intent="warning" icon="warning-sign" title={`${formatNumber(warnings.length, 0)} values look unusual`} className="fr-gap">
            <IntakeProblems problems={warnings} caption="Warnings about the file" />
            <Checkbox checked={acceptWarnings} onChange={(event) => onAcceptWarnings(event.currentTarget.checked)} label="I have checked these values against the field sheets and they are right." />
          </Callout>
        )}
        <div className="fr-intake__actions">
          <Button intent="primary" icon="floppy-disk" text="Save these values" disabled={saving || (warnings.length > 0 && !acceptWarnings) || checked.identicalToPrevious} loading={saving} onClick={onSave} />
        </div>
      </SectionCard>
    </Section>
  );
}
