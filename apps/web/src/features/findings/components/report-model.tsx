import { HTMLTable } from '@blueprintjs/core';
import type { ReportModel } from '@friable/contracts';
import { formatP, formatStatistic } from './stat-format';

/** A cell as printed: p-values as p-values, other numbers as statistics, a missing value as a dash. */
function cellText(column: string, value: string | number | null): string {
  if (value === null) return '—';
  if (typeof value === 'string') return value;
  return column === 'p' ? formatP(value) : formatStatistic(value);
}

/** The model made for a measure in the printed report: which and why, then its tables as Findings computed them. */
export function ReportModelTables({ model, measureName }: { model: ReportModel; measureName: string }) {
  return (
    <div className="fr-report__model">
      <h4>{model.label}</h4>
      <p className="fr-small">{model.why}</p>
      {model.tables.map((table) => (
        <div key={table.title} className="fr-table-scroll">
          <HTMLTable compact striped className="fr-findings-table" aria-label={`${table.title} — ${measureName}`}>
            <caption>{table.title}</caption>
            <thead>
              <tr>
                {table.columns.map((column) => (
                  <th key={column} scope="col">
                    {column}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {table.rows.map((row, i) => (
                <tr key={i}>
                  {row.map((value, j) => (
                    <td key={j} className={typeof value === 'number' ? 'fr-num' : undefined}>
                      {cellText(table.columns[j] ?? '', value)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      ))}
      <h4>Classical ANOVA (beside the model)</h4>
    </div>
  );
}
