import { HTMLTable } from '@blueprintjs/core';
import type { ReactNode } from 'react';

/** A column's heading: plain text, or a number column (right-aligned) with `num`. */
export type FindingsColumn = string | { head: ReactNode; num?: boolean; key?: string };

/** A number column's heading. */
export const numeric = (head: string): FindingsColumn => ({ head, num: true, key: head });

/**
 * A compact table in Findings' look, named for screen readers by `label`, that scrolls inside its own
 * box on a phone; `extraHeads` are heading cells drawn by the caller (the F test's three).
 */
export function FindingsTable({ label, columns, extraHeads, striped = true, children }: { label: string; columns: FindingsColumn[]; extraHeads?: ReactNode; striped?: boolean; children: ReactNode }) {
  return (
    <div className="fr-table-scroll">
      <HTMLTable compact striped={striped} className="fr-findings-table" aria-label={label}>
        <thead>
          <tr>
            {columns.map((column, index) =>
              typeof column === 'string' ? (
                <th key={column} scope="col">
                  {column}
                </th>
              ) : (
                <th key={column.key ?? index} scope="col" className={column.num ? 'fr-num' : undefined}>
                  {column.head}
                </th>
              ),
            )}
            {extraHeads}
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </HTMLTable>
    </div>
  );
}
