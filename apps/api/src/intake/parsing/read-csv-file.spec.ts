import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { IntakeFileError } from './intake-file.error';
import { INTAKE_MAX_BYTES, readCsvFile } from './read-csv-file';

const fixture = (name: string): Buffer => readFileSync(join(__dirname, 'fixtures', name));

function refusal(bytes: Buffer, maxBytes = INTAKE_MAX_BYTES): IntakeFileError {
  try {
    readCsvFile(bytes, { maxBytes });
  } catch (error) {
    if (error instanceof IntakeFileError) return error;
    throw error;
  }
  throw new Error('the file was accepted');
}

describe('readCsvFile: files it accepts', () => {
  it('reads the template as downloaded: header row 1, data from row 2', () => {
    const file = readCsvFile(fixture('template.csv'), { maxBytes: INTAKE_MAX_BYTES });
    expect(file.delimiter).toBe(',');
    expect(file.decimalComma).toBe(false);
    expect(file.headers).toEqual(['plot label', 'block', 'treatment code', 'drain time (s)', 'crumb score (score)', 'earthworms (count)', 'notes', 'missing reason']);
    expect(file.rows).toHaveLength(6);
    expect(file.rows[1]).toEqual(['HL-B1-P02', '1', 'GYP', '>600', '2', '4', 'standing water at the cut-off', '']);
    expect(file.rowNumbers).toEqual([2, 3, 4, 5, 6, 7]);
    expect(file.lineNumbers).toEqual([2, 3, 4, 5, 6, 7]);
    expect(file.headerRowNumber).toBe(1);
  });

  it('strips a byte-order mark and CRLF line ends, keeping the typed text', () => {
    const file = readCsvFile(fixture('bom-crlf.csv'));
    expect(file.headers[0]).toBe('plot label');
    expect(file.rows).toEqual([
      ['HL-B1-P01', '412', ''],
      ['HL-B1-P02', '12.50', 'dry crust'],
    ]);
  });

  it('reads ; files with a decimal comma, and quoted ; inside a note', () => {
    const file = readCsvFile(fixture('semicolon-decimal-comma.csv'));
    expect(file.delimiter).toBe(';');
    expect(file.decimalComma).toBe(true);
    expect(file.rows[0]).toEqual(['HL-B1-P01', '1,32', '2,25', '', '']);
    expect(file.rows[1]![3]).toBe('compacted; path nearby');
  });

  it('uses the decimal point in a ; file whose numbers use points', () => {
    const file = readCsvFile(Buffer.from('plot label;bulk density (g/cm3)\nHL-B1-P01;1.32\nHL-B1-P02;1.18\n'));
    expect(file.delimiter).toBe(';');
    expect(file.decimalComma).toBe(false);
  });

  it('decides the decimal mark once per file, by the majority of the number cells (ties: comma)', () => {
    const mostlyComma = readCsvFile(Buffer.from('plot label;bulk density (g/cm3)\nA;1,32\nB;1,18\nC;1.25\n'));
    expect(mostlyComma.decimalComma).toBe(true);
    const tie = readCsvFile(Buffer.from('plot label;bulk density (g/cm3)\nA;1,32\nB;1.18\n'));
    expect(tie.decimalComma).toBe(true);
    const mostlyPoint = readCsvFile(Buffer.from('plot label;bulk density (g/cm3)\nA;1,32\nB;1.18\nC;1.25\n'));
    expect(mostlyPoint.decimalComma).toBe(false);
  });

  it('never uses the decimal comma in a comma- or tab-separated file', () => {
    const file = readCsvFile(Buffer.from('plot label,bulk density (g/cm3)\nA,"1,32"\n'));
    expect(file.decimalComma).toBe(false);
    expect(file.rows[0]).toEqual(['A', '1,32']);
  });

  it('keeps quoted commas, doubled quotes and line breaks in one cell; row numbers follow the records, line numbers the file', () => {
    const file = readCsvFile(fixture('quoted-commas-newlines.csv'));
    expect(file.rows.map((row) => row[2])).toEqual(['wet, then dry', 'two lines:\nfirst pour slow, second "fast"', '']);
    expect(file.rowNumbers).toEqual([2, 3, 4]);
    expect(file.lineNumbers).toEqual([2, 3, 5]);
  });

  it('reads tab-separated files', () => {
    const file = readCsvFile(fixture('tab-delimited.tsv'));
    expect(file.delimiter).toBe('\t');
    expect(file.rows[1]).toEqual(['HL-B1-P02', '380', 'some, commas; and semicolons']);
  });

  it('skips blank rows but counts them, as a spreadsheet does', () => {
    const file = readCsvFile(Buffer.from('\nplot label,drain time (s)\nA,1\n\n,\nB,2\n'));
    expect(file.headerRowNumber).toBe(2);
    expect(file.rowNumbers).toEqual([3, 6]);
  });

  it('pads short rows and ignores empty cells beyond the header', () => {
    const file = readCsvFile(Buffer.from('plot label,drain time (s),notes,\nA,1\nB,2,,,\n'));
    expect(file.headers).toEqual(['plot label', 'drain time (s)', 'notes']);
    expect(file.rows).toEqual([
      ['A', '1', ''],
      ['B', '2', ''],
    ]);
  });
});

describe('readCsvFile: files it refuses', () => {
  it('refuses an empty file and a file of blank lines', () => {
    expect(refusal(fixture('empty.csv'))).toMatchObject({ status: 422, message: 'The file is empty.' });
    expect(refusal(Buffer.from('\r\n \n\t\n')).message).toBe('The file holds only blank lines.');
    expect(refusal(Buffer.from('\uFEFF')).message).toBe('The file holds only blank lines.');
  });

  it('refuses a file over the size limit with 413, naming both sizes', () => {
    const error = refusal(Buffer.alloc(3 * 1_048_576, 'a'));
    expect(error.status).toBe(413);
    expect(error.message).toBe('The file is 3 MB; files up to 2 MB are accepted. Split it by site or round.');
    expect(refusal(Buffer.from('plot label\nA\n'), 5).status).toBe(413);
  });

  it('refuses binary junk (a zero byte), naming where it is', () => {
    const error = refusal(fixture('binary-junk.bin'));
    expect(error.status).toBe(422);
    expect(error.message).toBe('The file holds binary data (a zero byte at byte 9), so it is not a CSV text file.');
  });

  it('refuses invalid UTF-8 such as a Windows-1252 é, and control characters', () => {
    const latin1 = Buffer.concat([Buffer.from('plot label,notes\nA,caf'), Buffer.from([0xe9]), Buffer.from('\n')]);
    expect(refusal(latin1).message).toMatch(/^The file is not UTF-8 text/);
    expect(refusal(Buffer.from('plot label\nA\u0007\n')).message).toMatch(/control character at character 13/);
  });

  it('recognises spreadsheet workbooks and UTF-16 text', () => {
    expect(refusal(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00])).message).toMatch(/spreadsheet workbook, not a CSV file/);
    expect(refusal(Buffer.from('\uFEFFplot label\n', 'utf16le')).message).toMatch(/UTF-16/);
  });

  it('refuses an unclosed quote, naming the row where it opens', () => {
    const error = refusal(fixture('unbalanced-quotes.csv'));
    expect(error.message).toBe('Row 3: a quoted field is not closed. A " opens it and no " ends it, so the rest of the file would run into one cell.');
    expect(error.problems).toEqual([{ row: 3, column: null, message: error.message }]);
  });

  it('refuses text after a closing quote', () => {
    expect(refusal(Buffer.from('plot label,notes\nA,"wet" and dry\n')).message).toMatch(/^Row 2: a quoted field is followed by more text/);
  });

  it('refuses a single 1 MB line quickly, as a cell far too long', () => {
    const line = Buffer.alloc(1_048_576, 'x');
    const started = performance.now();
    const error = refusal(line);
    expect(performance.now() - started).toBeLessThan(2_000);
    expect(error.message).toBe('Row 1, column 1: a cell of 1,048,576 characters; cells of up to 10000 are accepted. Is this the right file?');
    const inData = Buffer.concat([Buffer.from('plot label,notes\nA,"'), Buffer.alloc(1_048_576, 'y'), Buffer.from('"\n')]);
    expect(refusal(inData).message).toMatch(/^Row 2, column 2: a cell of 1,048,576 characters/);
  });

  it('refuses a file without a header row', () => {
    expect(refusal(fixture('no-header.csv')).message).toBe(
      'Row 1 holds the number 412 where column names belong: the file needs a header row (plot label, then one column per measure), as in the template.',
    );
  });

  it('refuses a header with only one row and no data', () => {
    expect(refusal(Buffer.from('plot label,drain time (s)\r\n')).message).toBe(
      'The file has a header row but no data rows (read as comma-separated).',
    );
  });

  it('refuses two columns with the same name (case and spaces do not count)', () => {
    expect(refusal(fixture('duplicate-headers.csv')).message).toBe(
      'Columns 2 and 3 are both called "Drain  Time (s)": rename or remove one of them.',
    );
  });

  it('refuses rows with values beyond the header, listing every such row', () => {
    const error = refusal(fixture('too-many-cells.csv'));
    expect(error.message).toBe(
      'Row 3 has more cells than the header row (a value in column 4, which has no header). A comma or semicolon inside a value needs quotes around the value.',
    );
    expect(error.problems.map((problem) => problem.row)).toEqual([3]);
  });

  it('refuses a value in a column without a header', () => {
    expect(refusal(Buffer.from('plot label,,notes\nA,5,\n')).message).toBe('Row 2 has a value in column 2, which has no header.');
  });

  it('refuses more than 200 columns', () => {
    const header = Array.from({ length: 201 }, (_, index) => `c${index}`).join(',');
    expect(refusal(Buffer.from(`${header}\n1\n`)).message).toBe('The header row has 201 columns; files of up to 200 columns are accepted.');
  });
});
