import { Button, HTMLTable, Section, SectionCard } from '@blueprintjs/core';
import type { Measure, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { EmptyState } from '../../../components/states';
import { formatNumber, measureKindLabels } from '../../../lib/format';
import { useDeleteProtocolItem } from '../api/delete-protocol-item';
import { MeasureDialog } from './measure-dialog';
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
    <Section
      title="Measures"
      icon="timeline-line-chart"
      className="fr-section"
      rightElement={canEdit ? <Button icon="add" text="Add measure" size="small" onClick={() => setEditing('new')} /> : undefined}
    >
      <SectionCard padded={trial.measures.length === 0}>
        {trial.measures.length === 0 ? (
          <EmptyState title="No measures yet" description="Add what is read on each plot, e.g. drain time in seconds with a 600 s cut-off." />
        ) : (
          <div className="fr-table-scroll">
            <HTMLTable compact striped className="fr-table">
              <thead>
                <tr>
                  <th>Code</th>
                  <th>Measure</th>
                  <th>Unit</th>
                  <th>Kind</th>
                  <th>Plausible</th>
                  <th>Hard limits</th>
                  <th>Better</th>
                  {canEdit && <th aria-label="Actions" />}
                </tr>
              </thead>
              <tbody>
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
              </tbody>
            </HTMLTable>
          </div>
        )}
        {remove.error && <p className="fr-error-line">{remove.error.message}</p>}
      </SectionCard>
      {editing && <MeasureDialog trial={trial} measure={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
      <RemovalConfirm trial={trial} collection="measures" removal={pending} onClose={() => setPending(null)} />
    </Section>
  );
}
