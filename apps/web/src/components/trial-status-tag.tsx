import { Tag, type Intent } from '@blueprintjs/core';
import type { TrialStatus } from '@friable/contracts';
import { statusLabels } from '../lib/format';

const intents: Record<TrialStatus, Intent> = { draft: 'none', active: 'success', locked: 'warning', archived: 'none' };

export function TrialStatusTag({ status }: { status: TrialStatus }) {
  return (
    <Tag minimal round intent={intents[status]} className={`fr-status fr-status--${status}`}>
      {statusLabels[status] ?? status}
    </Tag>
  );
}
