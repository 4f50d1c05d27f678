import { HTMLSelect, HTMLTable } from '@blueprintjs/core';
import type { Measure } from '@friable/contracts';
import type { ColumnChoice } from '../api/submit-intake';
import { columnRoleLabels, measureHeading, measureNoteChoice } from './guess-columns';
import type { CsvPreview } from './read-preview';

const NOT_READ = '';
const shownRows = 100;

/**
 * The file as the browser read it: one select per column saying what the column holds (matched
 * from its heading, changeable), and the first rows, the rows with problems marked. Every column is
 * shown: a wide file scrolls inside the table, with the row number and the plot label column kept in
 * view at the left (the plot label column is shown first, wherever it is in the file) and the headings at the top.
 */
export function ColumnMapping({
  preview,
  measures,
  choices,
  onChoose,
  problemRows,
  disabled,
}: {
  preview: CsvPreview;
  measures: Measure[];
  choices: ColumnChoice[];
  onChoose: (index: number, choice: ColumnChoice) => void;
  problemRows: Set<number>;
  disabled?: boolean;
}) {
  const rows = preview.rows.filter((row, index) => index < shownRows || problemRows.has(row.row));
  const plotLabelAt = choices.indexOf('plotLabel');
  // The file's columns in the order shown: the plot label first (frozen), the others as they come.
  const order = plotLabelAt < 0 ? preview.headers.map((_, index) => index) : [plotLabelAt, ...preview.headers.map((_, index) => index).filter((index) => index !== plotLabelAt)];
  const frozen = (index: number) => (index === plotLabelAt ? 'fr-intake-preview__frozen' : undefined);
  return (
    <div className="fr-table-scroll fr-intake-preview">
      <HTMLTable compact bordered aria-label="Preview of the file">
        <thead>
          <tr>
            <th scope="col" className="fr-intake-preview__rownum">
              Row
            </th>
            {order.map((index) => ({ header: preview.headers[index]!, index })).map(({ header, index }) => (
              <th scope="col" key={index} className={frozen(index)}>
                <div className="fr-intake-preview__header">{header || <span className="fr-muted">(no heading)</span>}</div>
                <HTMLSelect
                  className="fr-intake-preview__select"
                  aria-label={`Column “${header}” holds`}
                  value={choices[index] ?? NOT_READ}
                  disabled={disabled}
                  onChange={(event) => onChoose(index, event.target.value === NOT_READ ? null : event.target.value)}
                >
                  <option value={NOT_READ}>Not read</option>
                  <optgroup label="Plot">
                    {Object.entries(columnRoleLabels).map(([role, label]) => (
                      <option key={role} value={role}>
                        {label}
                      </option>
                    ))}
                  </optgroup>
                  <optgroup label="Measures of this round">
                    {measures.map((measure) => (
                      <option key={measure.id} value={measure.code}>
                        {measureHeading(measure)} — {measure.code}
                      </option>
                    ))}
                  </optgroup>
                  <optgroup label="Notes of one measure">
                    {measures.map((measure) => (
                      <option key={measure.id} value={measureNoteChoice(measure.code)}>
                        Notes of {measure.name} — {measure.code}
                      </option>
                    ))}
                  </optgroup>
                </HTMLSelect>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => {
            const faulty = problemRows.has(row.row);
            return (
              <tr key={row.row} className={faulty ? 'fr-intake-preview__row--problem' : undefined} aria-invalid={faulty || undefined}>
                <th scope="row" className="fr-num fr-intake-preview__rownum">
                  {faulty && <span className="fr-intake-preview__flag" aria-hidden="true">!</span>}
                  {row.row}
                </th>
                {order.map((index) => (
                  <td key={index} className={frozen(index)}>
                    {row.cells[index] ?? ''}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      {preview.rows.length > rows.length && <p className="fr-muted fr-small">The first {shownRows} rows are shown; all {preview.rows.length} are sent.</p>}
    </div>
  );
}
