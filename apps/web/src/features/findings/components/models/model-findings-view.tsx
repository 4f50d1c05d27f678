import { Callout } from '@blueprintjs/core';
import type { ModelFindings } from '@friable/contracts';
import { useMemo } from 'react';
import { treatmentStyles } from '../../../../lib/treatment-style';
import { AncovaView } from './ancova-view';
import { CensoredView } from './censored-view';
import { CountsView } from './counts-view';
import { OrdinalView } from './ordinal-view';
import { RepeatedView, type SiteRounds } from './repeated-view';

/** A model's answer in Findings: the notices the engine cannot know, then the view made for that model. */
export function ModelFindingsView({ findings, treatmentNames, siteRounds = [] }: { findings: ModelFindings; treatmentNames: Record<string, string>; siteRounds?: SiteRounds[] }) {
  const { context } = findings;
  const styles = useMemo(() => treatmentStyles(Object.keys(treatmentNames), context.controlCode), [treatmentNames, context.controlCode]);
  return (
    <>
      {context.notices.length > 0 && (
        <Callout intent="primary" icon="info-sign" className="fr-findings-notices">
          <ul>
            {context.notices.map((notice) => (
              <li key={notice}>{notice}</li>
            ))}
          </ul>
        </Callout>
      )}
      {findings.analysis === 'censored' ? (
        <CensoredView findings={findings} names={treatmentNames} styles={styles} />
      ) : findings.analysis === 'repeated' ? (
        <RepeatedView findings={findings} names={treatmentNames} styles={styles} sites={siteRounds} />
      ) : findings.analysis === 'ancova' ? (
        <AncovaView findings={findings} names={treatmentNames} />
      ) : findings.analysis === 'ordinal' ? (
        <OrdinalView findings={findings} names={treatmentNames} styles={styles} />
      ) : (
        <CountsView findings={findings} names={treatmentNames} styles={styles} />
      )}
    </>
  );
}
