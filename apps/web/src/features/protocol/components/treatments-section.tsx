import { Tag } from '@blueprintjs/core';
import type { PlotAmount, Treatment, TrialDetail } from '@friable/contracts';
import { isFactorDesign } from '@friable/field';
import { useState } from 'react';
import { formatDoseShort, formatNumber, formatRate } from '../../../lib/format';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { useAmounts } from '../api/get-amounts';
import { appliedToWords } from './factor-roles';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { ProtocolTableSection } from './protocol-table-section';
import { RowActions } from './row-actions';
import { TreatmentDialog } from './treatment-dialog';

/** The treatments, each with its rate and how much goes on one plot at every site. */
export function TreatmentsSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState<Treatment | 'new' | null>(null);
  const [pending, setPending] = useState<PendingLayoutChange | null>(null);
  const remove = useDeleteProtocolItem(trial.id, 'treatments');
  const amounts = useAmounts(trial.id);
  const factorial = isFactorDesign(trial.design);
  const hasControl = trial.treatments.some((t) => t.isControl);

  return (
    <ProtocolTableSection
      title="Treatments"
      subtitle={factorial ? 'Every combination of the factors’ levels' : undefined}
      icon="lab-test"
      addText="Add treatment"
      onAdd={canEdit && !factorial ? () => setEditing('new') : undefined}
      empty={
        trial.treatments.length === 0
          ? { title: 'No treatments yet', description: factorial ? 'Name the factors and their levels above; the treatments follow.' : 'Add an untreated control and the amendments to compare, each with its rate.' }
          : null
      }
      heads={['Code', 'Treatment', 'Rate', 'Amount per plot']}
      withActions={canEdit}
      tableClassName="fr-table fr-treatments"
      removeError={remove.error}
      notice={trial.treatments.length > 0 && !hasControl && <p className="fr-warning-line">There is no untreated control: an effect can only be claimed against one.</p>}
      after={
        <>
          {editing && <TreatmentDialog trial={trial} treatment={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
          <LayoutChangeConfirm trial={trial} change={pending} onClose={() => setPending(null)} />
        </>
      }
    >
        {trial.treatments.map((treatment) => (
          <tr key={treatment.id}>
            <td className="fr-code">{treatment.code}</td>
            <td>
              <div>
                {treatment.name}{' '}
                {treatment.isControl && (
                  <Tag minimal intent="success" className="fr-control-tag">
                    control
                  </Tag>
                )}
              </div>
              {treatment.product && <div className="fr-muted fr-small">{productLine(treatment)}</div>}
              {treatment.description && <div className="fr-muted fr-small">{treatment.description}</div>}
            </td>
            <td>
              {factorial ? (
                <LevelRates trial={trial} treatment={treatment} />
              ) : treatment.rateValue === null ? (
                <span className="fr-muted">none</span>
              ) : (
                formatRate(treatment.rateValue, treatment.rateUnit)
              )}
              {treatment.rateValue !== null && treatment.rateBasis === 'concentration' && (
                <div className="fr-muted fr-small">mixed through {formatNumber(treatment.incorporationDepthCm ?? 0, 1)} cm of soil</div>
              )}
            </td>
            <td>
              {factorial ? (
                <span className="fr-muted">per unit each level goes on: see the Plot plan</span>
              ) : (
                <PerSiteAmounts trial={trial} treatment={treatment} amounts={amounts.data} pending={amounts.isPending} failed={amounts.isError} />
              )}
            </td>
            {canEdit && (
              <RowActions
                name={treatment.code}
                onEdit={() => setEditing(treatment)}
                remove={
                  factorial
                    ? undefined
                    : {
                        loading: remove.isPending && remove.variables?.id === treatment.id,
                        ask: () => setPending({ what: `Remove treatment ${treatment.code} (${treatment.name})`, confirmText: 'Remove treatment', proceed: () => remove.mutate({ id: treatment.id }) }),
                      }
                }
              />
            )}
          </tr>
        ))}
    </ProtocolTableSection>
  );
}

/** A combination's rates are its levels': "C 2.5 cm deep (layer) on whole plots · S 5 cm deep (layer) on sub plots". */
function LevelRates({ trial, treatment }: { trial: TrialDetail; treatment: Treatment }) {
  const levels = trial.factors.flatMap((factor) => factor.levels.map((level) => ({ factor, level }))).filter(({ level }) => treatment.factorLevelIds.includes(level.id));
  const applied = levels.filter(({ level }) => level.rateValue !== null && level.rateUnit !== null);
  if (applied.length === 0) return <span className="fr-muted">none</span>;
  return (
    <ul className="fr-site-amounts">
      {applied.map(({ factor, level }) => (
        <li key={level.id}>
          <span className="fr-code">{level.code}</span> {formatRate(level.rateValue, level.rateUnit)} <span className="fr-muted">{appliedToWords(factor.appliedTo)}</span>
        </li>
      ))}
    </ul>
  );
}

function productLine(treatment: Treatment): string {
  const parts = [treatment.product ?? ''];
  if (treatment.purity !== null) parts.push(`${formatNumber(treatment.purity * 100, 1)}% active`);
  if (treatment.moistureBasis === 'dry') parts.push(`rate on a dry basis${treatment.moistureFraction !== null ? `, ${formatNumber(treatment.moistureFraction * 100, 1)}% water as sold` : ''}`);
  return parts.join(' · ');
}

function PerSiteAmounts({
  trial,
  treatment,
  amounts,
  pending,
  failed,
}: {
  trial: TrialDetail;
  treatment: Treatment;
  amounts: PlotAmount[] | undefined;
  pending: boolean;
  failed: boolean;
}) {
  if (treatment.rateValue === null || treatment.rateValue === 0) return <span className="fr-muted">nothing to apply</span>;
  if (trial.sites.length === 0) return <span className="fr-muted">add a site to see it</span>;
  if (pending) return <span className="fr-muted">working it out…</span>;
  if (failed || !amounts) return <span className="fr-muted">could not be worked out</span>;
  return (
    <ul className="fr-site-amounts">
      {trial.sites.map((site) => {
        const amount = amounts.find((a) => a.siteId === site.id && a.treatmentId === treatment.id);
        return (
          <li key={site.id}>
            <span className="fr-muted">{site.name}:</span> {amount ? formatDoseShort(amount.perPlot) : '—'}
          </li>
        );
      })}
    </ul>
  );
}
