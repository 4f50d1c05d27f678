import type { Measure, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { formatNumber, measureKindLabels } from '../../../lib/format';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { MeasureDialog } from './measure-dialog';
import { ProtocolTableSection } from './protocol-table-section';
import { RemovalConfirm, type PendingRemoval } from './removal-confirm';
import { RowActions } from './row-actions';
import { unitSymbol } from './measure-units';

function range(min: number | null, max: number | null, unit: string): string {
  if (min === null && max === null) return '—';
  const symbol = unitSymbol(unit);
  if (min === null) return `up to ${formatNumber(max!, 4)} ${symbol}`;
  if (max === null) return `from ${formatNumber(min, 4)} ${symbol}`;
  return `${formatNumber(min, 4)}–${formatNumber(max, 4)} ${symbol}`;
}

function kindLine(measure: Measure): string {
  const label = measureKindLabels[measure.kind] ?? measure.kind;
  if (measure.kind === 'score' && measure.scaleMin !== null && measure.scaleMax !== null) return `${label} ${formatNumber(measure.scaleMin)}–${formatNumber(measure.scaleMax)}`;
  if (measure.kind === 'time-with-cutoff' && measure.cutoff !== null) return `${label} at ${formatNumber(measure.cutoff, 4)} ${unitSymbol(measure.unit)}`;
  return label;
}

/** What is measured on every plot, with its unit, kind and the ranges readings are checked against. */
export function MeasuresSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState<Measure | 'new' | null>(null);
  const [pending, setPending] = useState<PendingRemoval | null>(null);
  const remove = useDeleteProtocolItem(trial.id, 'measures');
  return (
    <ProtocolTableSection
      title="Measures"
      icon="timeline-line-chart"
      addText="Add measure"
      onAdd={canEdit ? () => setEditing('new') : undefined}
      empty={trial.measures.length === 0 ? { title: 'No measures yet', description: 'Add what is read on each plot, e.g. drain time in seconds with a 600 s cut-off.' } : null}
      heads={['Code', 'Measure', 'Unit', 'Kind', 'Plausible', 'Hard limits', 'Better']}
      withActions={canEdit}
      removeError={remove.error}
      after={
        <>
          {editing && <MeasureDialog trial={trial} measure={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
          <RemovalConfirm trial={trial} collection="measures" removal={pending} onClose={() => setPending(null)} />
        </>
      }
    >
        {trial.measures.map((measure) => (
          <tr key={measure.id}>
            <td className="fr-code">{measure.code}</td>
            <td>
              {measure.name}
              <div className="fr-muted fr-small">
                {measure.decimals} decimal{measure.decimals === 1 ? '' : 's'}
              </div>
            </td>
            <td>{unitSymbol(measure.unit)}</td>
            <td>{kindLine(measure)}</td>
            <td>{range(measure.plausibleMin, measure.plausibleMax, measure.unit)}</td>
            <td>{range(measure.hardMin, measure.hardMax, measure.unit)}</td>
            <td>{measure.higherIsBetter ? 'higher' : 'lower'}</td>
            {canEdit && (
              <RowActions
                name={measure.code}
                onEdit={() => setEditing(measure)}
                remove={{
                  loading: remove.isPending && remove.variables?.id === measure.id,
                  ask: () =>
                    setPending({ id: measure.id, what: `Remove measure ${measure.code} (${measure.name})`, confirmText: 'Remove measure', proceed: (confirm) => remove.mutate({ id: measure.id, confirm }) }),
                }}
              />
            )}
          </tr>
        ))}
    </ProtocolTableSection>
  );
}
