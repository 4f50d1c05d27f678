import type { TrialDetail } from '@friable/contracts';
import { isFactorDesign } from '@friable/field';
import { ActivationPanel } from './activation-panel';
import { FactorsSection } from './factors-section';
import { MeasuresSection } from './measures-section';
import { protocolAccess } from './protocol-access';
import { ReadOnlyNotice } from './read-only-notice';
import { RoundsSection } from './rounds-section';
import { TreatmentsSection } from './treatments-section';
import { TrialFieldsSection } from './trial-fields-section';

/** Protocol: the trial's fields, treatments (or factors), measures and assessment rounds, and activation. */
export function ProtocolPage({ trial }: { trial: TrialDetail }) {
  const access = protocolAccess(trial);
  return (
    <div className="fr-protocol">
      <ReadOnlyNotice access={access} locked={trial.status === 'locked'} />
      <ActivationPanel trial={trial} canEdit={access.canEdit} />
      <TrialFieldsSection trial={trial} canEdit={access.canEdit} />
      {isFactorDesign(trial.design) && <FactorsSection trial={trial} canEdit={access.canEdit} />}
      <TreatmentsSection trial={trial} canEdit={access.canEdit} />
      <MeasuresSection trial={trial} canEdit={access.canEdit} />
      <RoundsSection trial={trial} canEdit={access.canEdit} />
    </div>
  );
}
