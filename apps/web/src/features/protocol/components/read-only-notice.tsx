import { Callout } from '@blueprintjs/core';
import type { ProtocolAccess } from './protocol-access';

/** Says once, at the top of a page, why there is nothing to edit. Locked trials get the stronger look. */
export function ReadOnlyNotice({ access, locked }: { access: ProtocolAccess; locked: boolean }) {
  if (!access.readOnlyReason) return null;
  return (
    <Callout intent={locked ? 'warning' : 'none'} icon={locked ? 'lock' : 'eye-open'} className="fr-readonly-notice" compact>
      {access.readOnlyReason}
    </Callout>
  );
}
