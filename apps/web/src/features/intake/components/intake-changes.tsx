import { HTMLTable } from '@blueprintjs/core';
import type { IntakeResult } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';
import { ColumnHeads } from '../../../components/column-heads';

const kindWords = { new: 'New', changed: 'Changed', unchanged: 'Unchanged' } as const;

/** The counts of a dry run or a commit, and each new or changed value (before → after). */
export function IntakeChanges({ result }: { result: IntakeResult }) {
  const moving = result.changes.filter((change) => change.kind !== 'unchanged');
  const verb = result.dryRun ? 'would be' : 'were';
  return (
    <>
      <p className="fr-intake-counts">
        <strong>{formatNumber(result.created, 0)}</strong> new, <strong>{formatNumber(result.updated, 0)}</strong> changed and{' '}
        <strong>{formatNumber(result.unchanged, 0)}</strong> unchanged values {verb} saved.
      </p>
      {moving.length > 0 && (
        <div className="fr-table-scroll fr-intake-changes">
          <HTMLTable compact striped aria-label={result.dryRun ? 'Values this upload would write' : 'Values this upload wrote'}>
            <ColumnHeads names={['Plot', 'Measure', 'What', 'Before', 'After']} />
            <tbody>
              {moving.map((change) => (
                <tr key={`${change.plotLabel}:${change.measureCode}`}>
                  <td>{change.plotLabel}</td>
                  <td>{change.measureCode}</td>
                  <td>{kindWords[change.kind]}</td>
                  <td className="fr-num">{change.before ?? '—'}</td>
                  <td className="fr-num">{change.after ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      )}
    </>
  );
}
