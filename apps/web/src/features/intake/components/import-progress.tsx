import { Callout, ProgressBar } from '@blueprintjs/core';
import type { IntakeImport } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';

const STEPS = [
  { stage: 'checking', label: 'Checking rows' },
  { stage: 'comparing', label: 'Comparing with the values already stored' },
  { stage: 'writing', label: 'Writing' },
] as const;

const count = (value: number) => formatNumber(value, 0);

/** What the server is doing now, with its count, in words. */
export function stageWords(record: IntakeImport): string {
  if (record.stage === 'checking') return `Checking rows: ${count(record.rowsChecked)} ${record.rowsChecked === 1 ? 'row' : 'rows'} checked so far`;
  if (record.stage === 'comparing') return `Comparing ${record.valuesTotal === null ? 'the values' : `${count(record.valuesTotal)} values`} with the values already stored (${count(record.rowsChecked)} rows checked)`;
  if (record.stage === 'writing') return `Writing ${record.valuesTotal === null ? 'the values' : `${count(record.valuesTotal)} values`} and their history`;
  return record.message ?? '';
}

/** The share of the current stage done, when the server can tell (bytes of a CSV file read, values written). */
function stageShare(record: IntakeImport): number | null {
  if (record.stage === 'checking' && record.format === 'csv' && record.sizeBytes > 0) return Math.min(1, record.bytesRead / record.sizeBytes);
  if (record.stage === 'writing' && record.valuesTotal) return Math.min(1, record.valuesDone / record.valuesTotal);
  return null;
}

/**
 * One upload on the server, as it runs: its three stages (checking rows, comparing with the stored
 * values, writing), the current one marked with its count, then how it ended.
 */
export function ImportProgress({ record, title }: { record: IntakeImport; title?: string }) {
  const current = STEPS.findIndex((step) => step.stage === record.stage);
  if (current < 0) {
    const intent = record.stage === 'done' ? 'success' : record.stage === 'refused' ? 'warning' : 'danger';
    return (
      <Callout intent={intent} compact icon={record.stage === 'done' ? 'tick-circle' : 'error'} className="fr-intake__server" title={title}>
        {record.message}
      </Callout>
    );
  }
  const share = stageShare(record);
  return (
    <div className="fr-intake__server" role="status" aria-label={title ?? 'Progress on the server'} aria-live="polite">
      {title && <strong>{title}</strong>}
      <ol className="fr-intake__stages">
        {STEPS.map((step, index) => (
          <li key={step.stage} aria-current={index === current ? 'step' : undefined} className={index < current ? 'fr-intake__stage--done' : index === current ? 'fr-intake__stage--now' : 'fr-muted'}>
            {step.label}
          </li>
        ))}
      </ol>
      <ProgressBar value={share ?? undefined} intent="primary" stripes animate />
      <span className="fr-small">{stageWords(record)}</span>
    </div>
  );
}
