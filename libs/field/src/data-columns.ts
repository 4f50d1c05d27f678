/**
 * The columns of a data sheet other than the measures: the ones that say which plot a row is
 * about (identity columns) and the ones that go with the values (notes, the reason a value is
 * missing). The template writes them, Intake reads them (by these spellings, in any case), and the
 * browser guesses a file's columns from the same list.
 *
 * Identity columns beyond the plot label are informational: a file may leave them out, and when it
 * has them Intake checks them against the plot plan. A design that identifies plots by more than a
 * block (whole plots and sub-plots of a split plot, say) adds its columns here, with the plot's
 * value for each given to Intake in `SitePlot.identity`.
 */
export interface DataColumn {
  /** What the column holds, as the mapping names it: `plotLabel`, `block`, `notes`… */
  readonly role: string;
  /** The template's header. */
  readonly header: string;
  /** Headers read as this column (compared after `normaliseHeader`). */
  readonly spellings: readonly string[];
  /** The column in a sentence: "Columns A and B both give the block". */
  readonly words: string;
  /** The column's name on screen. */
  readonly label: string;
}

export const IDENTITY_COLUMNS: readonly DataColumn[] = Object.freeze([
  { role: 'plotLabel', header: 'plot label', spellings: ['plot label', 'plot', 'label', 'plot id'], words: 'the plot label', label: 'Plot label' },
  { role: 'block', header: 'block', spellings: ['block', 'rep', 'replicate'], words: 'the block', label: 'Block' },
  { role: 'treatment', header: 'treatment code', spellings: ['treatment code', 'treatment', 'trt'], words: 'the treatment code', label: 'Treatment code' },
]);

export const RECORD_COLUMNS: readonly DataColumn[] = Object.freeze([
  { role: 'notes', header: 'notes', spellings: ['notes', 'note', 'comments', 'comment', 'remarks'], words: 'the notes', label: 'Notes' },
  {
    role: 'missingReason',
    header: 'missing reason',
    spellings: ['missing reason', 'reason', 'reason missing', 'why missing'],
    words: 'the reason a value is missing',
    label: 'Missing reason',
  },
]);

/** Every column that is not a measure, identity columns first. */
export const DATA_COLUMNS: readonly DataColumn[] = Object.freeze([...IDENTITY_COLUMNS, ...RECORD_COLUMNS]);

/** Case, surrounding spaces, underscores and hyphens do not matter when headers are matched: "Plot_Label " → "plot label". */
export function normaliseHeader(text: string): string {
  return text.trim().toLowerCase().replace(/[\s_-]+/g, ' ');
}

/** The column a header names, by its spellings; undefined for a measure or an unknown header. */
export function dataColumnOfHeader(header: string): DataColumn | undefined {
  const key = normaliseHeader(header);
  return DATA_COLUMNS.find((column) => column.spellings.includes(key));
}
