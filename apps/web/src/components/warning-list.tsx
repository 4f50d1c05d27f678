import { Callout } from '@blueprintjs/core';

/** Things worth a second look, as a list under a warning heading; nothing when there are none. */
export function WarningList({ title, warnings, className = 'fr-gap' }: { title: string; warnings: readonly string[]; className?: string }) {
  if (warnings.length === 0) return null;
  return (
    <Callout intent="warning" icon="warning-sign" compact title={title} className={className}>
      <ul>
        {warnings.map((warning) => (
          <li key={warning}>{warning}</li>
        ))}
      </ul>
    </Callout>
  );
}
