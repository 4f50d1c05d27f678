import '@blueprintjs/table/lib/css/table.css';
import { Button } from '@blueprintjs/core';
import { Cell, Column, EditableCell, Table2, type FocusedCellCoordinates } from '@blueprintjs/table';
import type { Measure, Observation, Plot } from '@friable/contracts';
import type { CellRefusal } from '../hooks/use-cell-save';
import { cellLook, cellText } from '../../../lib/observation-text';
import { cellKey } from './ledger-cells';
import { measureHeading } from '../../../lib/measure-heading';

const fixedColumns = 3;

/**
 * The Ledger grid: a row per plot (label, block, treatment), a column per measure with its unit.
 * Editable cells save on Enter; censored and missing values are italic with a mark (c, m), refused
 * ones carry a "!" and the server's sentence as their tooltip.
 */
export function LedgerGrid({
  rows,
  columns,
  values,
  refusals,
  savingKey,
  editable,
  onEdit,
  onFocus,
  onPhoto,
}: {
  rows: Plot[];
  columns: Measure[];
  values: Map<string, Observation>;
  refusals: Map<string, CellRefusal>;
  savingKey: string | null;
  editable: boolean;
  onEdit: (plot: Plot, measure: Measure, text: string) => void;
  onFocus: (plot: Plot | null, measure: Measure | null) => void;
  onPhoto: (plot: Plot) => void;
}) {
  function measureCell(measure: Measure) {
    return (rowIndex: number) => {
      const plot = rows[rowIndex]!;
      const key = cellKey(plot.id, measure.id);
      const observation = values.get(key);
      const refusal = refusals.get(key);
      const look = refusal ? 'error' : cellLook(observation);
      const className = `fr-ledger-cell fr-ledger-cell--${look}${savingKey === key ? ' fr-ledger-cell--saving' : ''}`;
      const tooltip = refusal?.message ?? (observation?.missingReason ? `Missing: ${observation.missingReason}` : undefined);
      const text = refusal?.text ?? cellText(observation);
      if (!editable) {
        return (
          <Cell className={className} tooltip={tooltip}>
            {text}
          </Cell>
        );
      }
      return <EditableCell className={className} intent={refusal ? 'danger' : undefined} tooltip={tooltip} value={text} onConfirm={(next) => next !== text && onEdit(plot, measure, next.trim())} />;
    };
  }

  function focus(focused: FocusedCellCoordinates) {
    const plot = rows[focused.row] ?? null;
    onFocus(plot, focused.col >= fixedColumns ? (columns[focused.col - fixedColumns] ?? null) : null);
  }

  return (
    <div className="fr-ledger-grid" aria-label="Ledger grid">
      <Table2
        numRows={rows.length}
        numFrozenColumns={1}
        enableRowHeader={false}
        enableFocusedCell
        onFocusedCell={focus}
        cellRendererDependencies={[values, refusals, savingKey, editable, rows, columns]}
        defaultRowHeight={30}
        columnWidths={[130, 60, 90, ...columns.map(() => 170)]}
        getCellClipboardData={(row, col) => (col < fixedColumns ? '' : cellText(values.get(cellKey(rows[row]!.id, columns[col - fixedColumns]!.id))))}
      >
        {[
          <Column
            key="plot"
            name="Plot"
            cellRenderer={(rowIndex) => (
              <Cell interactive className="fr-ledger-plot">
                <span>{rows[rowIndex]!.label}</span>
                <Button size="small" variant="minimal" icon="camera" aria-label={`Photo of ${rows[rowIndex]!.label}`} onClick={() => onPhoto(rows[rowIndex]!)} />
              </Cell>
            )}
          />,
          <Column key="block" name="Block" cellRenderer={(rowIndex) => <Cell className="fr-num">{rows[rowIndex]!.block}</Cell>} />,
          <Column key="treatment" name="Treatment" cellRenderer={(rowIndex) => <Cell>{rows[rowIndex]!.treatmentCode}</Cell>} />,
          ...columns.map((measure) => <Column key={measure.id} name={measureHeading(measure)} cellRenderer={measureCell(measure)} />),
        ]}
      </Table2>
    </div>
  );
}
