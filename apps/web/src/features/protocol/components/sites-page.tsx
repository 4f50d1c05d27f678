import { Button, Card, H3 } from '@blueprintjs/core';
import { WarningList } from '../../../components/warning-list';
import type { Site, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { formatArea, formatDate, formatNumber } from '../../../lib/format';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { protocolAccess } from './protocol-access';
import { RandomizeDialog } from './randomize-dialog';
import { ReadOnlyNotice } from './read-only-notice';
import { SiteDialog } from './site-dialog';
import { plotsPerWholePlot } from './factor-roles';
import { describeGeometry } from './site-geometry';

/** Sites: the gardens taking part, each plot's size, the blocks, the lead, and each site's randomization. */
export function SitesPage({ trial }: { trial: TrialDetail }) {
  const access = protocolAccess(trial);
  const [editing, setEditing] = useState<Site | 'new' | null>(null);
  const [randomizing, setRandomizing] = useState<Site | null>(null);
  const remove = useDeleteProtocolItem(trial.id, 'sites');
  const [pending, setPending] = useState<PendingLayoutChange | null>(null);
  return (
    <div className="fr-sites">
      <ReadOnlyNotice access={access} locked={trial.status === 'locked'} />
      <div className="fr-page-head">
        <H3>Sites</H3>
        {access.canEdit && <Button icon="add" intent="primary" text="Add site" onClick={() => setEditing('new')} />}
      </div>
      {trial.sites.length === 0 ? (
        <EmptyState title="No sites yet" description="Add each garden or farm that runs the trial, with its plot size and number of blocks." />
      ) : (
        <ul className="fr-card-list">
          {trial.sites.map((site) => (
            <li key={site.id}>
              <SiteCard
                trial={trial}
                site={site}
                canEdit={access.canEdit}
                onEdit={() => setEditing(site)}
                onRandomize={() => setRandomizing(site)}
                onRemove={() => setPending({ what: `Remove the site ${site.name}`, siteId: site.id, confirmText: 'Remove site', proceed: () => remove.mutate({ id: site.id }) })}
              />
            </li>
          ))}
        </ul>
      )}
      {remove.error && <p className="fr-error-line">{remove.error.message}</p>}
      {editing && <SiteDialog trial={trial} site={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
      {randomizing && <RandomizeDialog trial={trial} site={randomizing} onClose={() => setRandomizing(null)} />}
      <LayoutChangeConfirm trial={trial} change={pending} onClose={() => setPending(null)} />
    </div>
  );
}

function SiteCard({
  trial,
  site,
  canEdit,
  onEdit,
  onRandomize,
  onRemove,
}: {
  trial: TrialDetail;
  site: Site;
  canEdit: boolean;
  onEdit: () => void;
  onRandomize: () => void;
  onRemove: () => void;
}) {
  const mine = trial.mySiteIds.includes(site.id);
  const perWholePlot = plotsPerWholePlot(trial);
  return (
    <Card elevation={0} className="fr-site-card" aria-label={`Site ${site.name}`}>
      <div className="fr-site-card__head">
        <H3 className="fr-site-card__title">
          {site.name} <span className="fr-code fr-small">{site.labelPrefix}</span>
          {mine && <span className="fr-mine"> · your site</span>}
        </H3>
        <div className="fr-site-card__actions">
          <Link to={paths.trialPlotPlan.href(trial.id, site.id)}>Plot plan</Link>
          {canEdit && <Button size="small" icon="edit" text="Edit" aria-label={`Edit ${site.name}`} onClick={onEdit} />}
          {canEdit && (
            <Button
              size="small"
              icon="random"
              text={site.randomizedAt ? 'Randomize again' : 'Randomize'}
              aria-label={`${site.randomizedAt ? 'Randomize again' : 'Randomize'} ${site.name}`}
              disabled={site.hasObservations}
              onClick={onRandomize}
            />
          )}
          {canEdit && !site.hasObservations && (
            <Button size="small" variant="minimal" intent="danger" text="Remove" aria-label={`Remove ${site.name}`} onClick={onRemove} />
          )}
        </div>
      </div>
      <dl className="fr-facts-list">
        <dt>Location</dt>
        <dd>{site.location || <span className="fr-muted">not given</span>}</dd>
        <dt>Soil</dt>
        <dd>{site.soilDescription || <span className="fr-muted">not described</span>}</dd>
        <dt>Each plot</dt>
        <dd>{describeGeometry(site)}</dd>
        <dt>Surface area</dt>
        <dd>{formatArea(site.areaM2)} per plot</dd>
        {perWholePlot !== null && (
          <>
            <dt>Each whole plot</dt>
            <dd>
              {formatNumber(perWholePlot, 0)} plots side by side, {formatArea(site.areaM2 * perWholePlot)}
            </dd>
          </>
        )}
        <dt>Blocks</dt>
        <dd>{formatNumber(site.blocks, 0)}</dd>
        <dt>Site lead</dt>
        <dd>{site.leadName ?? <span className="fr-muted">nobody yet</span>}</dd>
        <dt>Plot plan</dt>
        <dd>
          {site.randomizedAt ? (
            <>
              {formatNumber(site.plotCount, 0)} plots, randomized {formatDate(site.randomizedAt)} with seed <span className="fr-code">{site.randomizationSeed}</span>
            </>
          ) : (
            <span className="fr-muted">not randomized yet</span>
          )}
        </dd>
      </dl>
      {site.strata.length > 0 && <StrataList site={site} />}
      {site.hasObservations && canEdit && <p className="fr-muted fr-small">Data have been recorded here, so the plot plan can no longer be randomized again.</p>}
      <WarningList title="Worth a second look" warnings={site.warnings} className="fr-site-warnings" />
    </Card>
  );
}

/** Each error line of the design's ANOVA at the site, its df counted out, and what is tested against it. */
function StrataList({ site }: { site: Site }) {
  return (
    <div className="fr-strata">
      <div className="fr-strata__title">Error degrees of freedom at this site</div>
      <ul aria-label={`Error strata at ${site.name}`}>
        {site.strata.map((stratum) => (
          <li key={stratum.name}>
            <strong>
              {stratum.name}: {formatNumber(stratum.errorDf, 0)} df
            </strong>{' '}
            <span className="fr-muted">({stratum.arithmetic})</span> — tests {stratum.terms.map((term) => term.split(':').join(' × ')).join(', ')}
            {stratum.criticalF !== null && <span className="fr-muted">; at p = 0.05 an F above {formatNumber(stratum.criticalF, stratum.criticalF >= 100 ? 1 : 2)} is needed</span>}
          </li>
        ))}
      </ul>
    </div>
  );
}
