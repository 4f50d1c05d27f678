import Papa from 'papaparse';

export interface PreviewRow {
  /** The row a spreadsheet shows for it: the header is row 1, the first data row is row 2. */
  row: number;
  cells: string[];
}

export interface CsvPreview {
  headers: string[];
  rows: PreviewRow[];
  /** The browser could not read it as a table (the server will say more when it is sent). */
  problem: string | null;
}

/**
 * Read preview — splits a CSV file's text into its header and data rows in the browser, so the
 * person sees the file and its columns before anything is sent. Delimiter (comma, semicolon, tab)
 * is detected; blank rows are left out but keep their numbers, as in the server's messages.
 * Reference: papaparse (https://www.papaparse.com/docs). Throws nothing: a problem is in `problem`.
 * Example: `readPreview('plot label,drain time (s)\nHL-B1-P01,412\n')` →
 * `{ headers: ['plot label', 'drain time (s)'], rows: [{ row: 2, cells: ['HL-B1-P01', '412'] }], problem: null }`.
 */
export function readPreview(text: string): CsvPreview {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
  const [headerCells, ...records] = parsed.data;
  if (!headerCells || headerCells.every((cell) => cell.trim() === '')) {
    return { headers: [], rows: [], problem: 'The file is empty: the first line should hold the column headings.' };
  }
  const rows = records
    .map((cells, index) => ({ row: index + 2, cells }))
    .filter(({ cells }) => cells.some((cell) => cell.trim() !== ''));
  const unclosed = parsed.errors.find((error) => error.code === 'MissingQuotes');
  return {
    headers: headerCells.map((cell) => cell.trim()),
    rows,
    problem: unclosed ? `A quotation mark is never closed (near row ${(unclosed.row ?? 0) + 1}); the preview may be cut short.` : null,
  };
}

function readFile<T>(read: (reader: FileReader) => void, result: (reader: FileReader) => T): Promise<T> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(result(reader));
    reader.onerror = () => reject(reader.error ?? new Error('The file could not be read.'));
    read(reader);
  });
}

/** The text of a chosen file, as UTF-8 (FileReader, which every browser and jsdom have). */
export function readFileText(file: Blob): Promise<string> {
  return readFile((reader) => reader.readAsText(file, 'utf-8'), (reader) => String(reader.result ?? ''));
}

/** The bytes of a chosen file (a workbook), by FileReader as well. */
export function readFileBytes(file: Blob): Promise<ArrayBuffer> {
  return readFile((reader) => reader.readAsArrayBuffer(file), (reader) => reader.result as ArrayBuffer);
}
