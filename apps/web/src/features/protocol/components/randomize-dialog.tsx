import { Callout, InputGroup } from '@blueprintjs/core';
import type { Site, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { useRandomizeSite } from '../api/randomize-site';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';

/** Lays out a site's plots from a seed: the same seed always gives the same plan. */
export function RandomizeDialog({ trial, site, onClose }: { trial: TrialDetail; site: Site; onClose: () => void }) {
  const randomize = useRandomizeSite(trial.id);
  const [seed, setSeed] = useState('');
  const again = site.randomizedAt !== null;

  const [pending, setPending] = useState<PendingLayoutChange | null>(null);

  function submit() {
    const run = () => randomize.mutate({ siteId: site.id, seed: seed.trim() || undefined }, { onSuccess: onClose });
    // Randomizing again replaces a laid-out plan: what it clears is shown and the trial code typed first.
    if (site.plotCount > 0) setPending({ what: `Replace the plot plan of ${site.name}`, siteId: site.id, confirmText: 'Randomize again', proceed: run });
    else run();
  }

  return (
    <>
    <FormDialog title={again ? `Randomize ${site.name} again` : `Randomize ${site.name}`} icon="random" onClose={onClose} onSubmit={submit} submitText={again ? 'Randomize again' : 'Randomize'} submitIcon="random" pending={randomize.isPending} error={randomize.error} shownFields={['seed']}>
          <p>
            Each block gets every treatment once, in an order drawn from the seed. Keep the seed: it rebuilds exactly this plan.
          </p>
          {again && (
            <Callout intent="warning" icon="warning-sign" compact className="fr-gap">
              The plot plan printed for this site so far will no longer be right. A site can be randomized again only while no data have been recorded there; once data exist it is refused.
            </Callout>
          )}
          <Field label="Seed (optional)" field="seed" error={randomize.error} help={`Leave empty to use the trial’s seed (${trial.seed}) with this site.`}>
            <InputGroup id="fr-field-seed" value={seed} onChange={(e) => setSeed(e.target.value)} autoFocus />
          </Field>
    </FormDialog>
    <LayoutChangeConfirm trial={trial} change={pending} onClose={() => setPending(null)} />
    </>
  );
}
