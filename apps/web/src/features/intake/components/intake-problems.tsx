import { HTMLTable } from '@blueprintjs/core';
import type { IntakeProblem } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';
import { ColumnHeads } from '../../../components/column-heads';

/** Every problem the server found, by row and column, in its own words. */
export function IntakeProblems({ problems, caption }: { problems: IntakeProblem[]; caption: string }) {
  return (
    <div className="fr-table-scroll">
      <HTMLTable compact striped className="fr-intake-problems" aria-label={caption}>
        <ColumnHeads names={['Row', 'Column', 'Problem']} />
        <tbody>
          {problems.map((problem, index) => (
            <tr key={index}>
              <td className="fr-num">{problem.row === null ? 'whole file' : formatNumber(problem.row, 0)}</td>
              <td>{problem.column ?? '—'}</td>
              <td>{problem.message}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
