import { Button, HTMLTable, Section, SectionCard, type IconName } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { EmptyState } from '../../../components/states';

/**
 * A protocol section that lists its items in a table (treatments, measures, rounds): the Add button
 * for who may edit (`onAdd`), the empty state until there is an item, the removal's failure, and the
 * section's dialogs (`after`).
 */
export function ProtocolTableSection({
  title,
  subtitle,
  icon,
  addText,
  onAdd,
  empty,
  heads,
  withActions,
  tableClassName = 'fr-table',
  removeError,
  notice,
  after,
  children,
}: {
  title: string;
  subtitle?: string;
  icon: IconName;
  addText: string;
  onAdd?: () => void;
  /** Shown in place of the table while there is nothing to list. */
  empty: { title: string; description: string } | null;
  heads: string[];
  /** A last column for each row's Edit and Remove. */
  withActions: boolean;
  tableClassName?: string;
  removeError: Error | null;
  /** A line under the table (what the list lacks, say). */
  notice?: ReactNode;
  after?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Section title={title} subtitle={subtitle} icon={icon} className="fr-section" rightElement={onAdd ? <Button icon="add" text={addText} size="small" onClick={onAdd} /> : undefined}>
      <SectionCard padded={empty !== null}>
        {empty ? (
          <EmptyState title={empty.title} description={empty.description} />
        ) : (
          <div className="fr-table-scroll">
            <HTMLTable compact striped className={tableClassName}>
              <thead>
                <tr>
                  {heads.map((head) => (
                    <th key={head}>{head}</th>
                  ))}
                  {withActions && <th aria-label="Actions" />}
                </tr>
              </thead>
              <tbody>{children}</tbody>
            </HTMLTable>
          </div>
        )}
        {notice}
        {removeError && <p className="fr-error-line">{removeError.message}</p>}
      </SectionCard>
      {after}
    </Section>
  );
}
