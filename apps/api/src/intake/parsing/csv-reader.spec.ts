import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CsvReader, type RawRow } from './csv-reader';
import { IntakeFileError } from './intake-file.error';

const fixture = (name: string): Buffer => readFileSync(join(__dirname, 'fixtures', name));

/** Reads the bytes pushed in the given pieces. */
function read(pieces: readonly Buffer[]): { rows: RawRow[]; delimiter: string } {
  const rows: RawRow[] = [];
  const reader = new CsvReader((row) => rows.push(row));
  for (const piece of pieces) reader.push(piece);
  reader.end();
  return { rows, delimiter: reader.delimiter };
}

/** The bytes cut at the given offsets. */
function cut(bytes: Buffer, at: readonly number[]): Buffer[] {
  const edges = [0, ...[...new Set(at)].sort((a, b) => a - b), bytes.length];
  return edges.slice(1).map((end, index) => bytes.subarray(edges[index], end));
}

describe('CsvReader: the same rows however the file arrives in chunks', () => {
  const files = ['template.csv', 'quoted-commas-newlines.csv', 'bom-crlf.csv', 'semicolon-decimal-comma.csv', 'tab-delimited.tsv'];

  it.each(files)('%s, cut at every single byte', (name) => {
    const bytes = fixture(name);
    const whole = read([bytes]);
    for (let offset = 1; offset < bytes.length; offset += 1) expect(read(cut(bytes, [offset]))).toEqual(whole);
  });

  it('a file with quotes, line breaks in cells, CRLF and multi-byte characters, cut anywhere', () => {
    const bytes = Buffer.from('plot label;notes;"drain ""time"" (s)"\r\nHL-B1-P01;"crust, then\r\nsoft; é";12,5\r\n\r\nHL-B1-P02;"";>600\r\nHL-B1-P03;ünd;7\r\n');
    const whole = read([bytes]);
    expect(whole.delimiter).toBe(';');
    expect(whole.rows.map((row) => [row.rowNumber, row.lineNumber, row.cells])).toEqual([
      [1, 1, ['plot label', 'notes', 'drain "time" (s)']],
      [2, 2, ['HL-B1-P01', 'crust, then\r\nsoft; é', '12,5']],
      [3, 4, ['']],
      [4, 5, ['HL-B1-P02', '', '>600']],
      [5, 6, ['HL-B1-P03', 'ünd', '7']],
    ]);
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: bytes.length - 1 }), { maxLength: 8 }), (offsets) => {
        expect(read(cut(bytes, offsets))).toEqual(whole);
      }),
      { numRuns: 300 },
    );
  });

  it('a quote that never closes is refused by the row where it opens, even across chunks', () => {
    const bytes = Buffer.from('plot label,notes\nA,"open\nB,2\n');
    for (const pieces of [[bytes], cut(bytes, [20])]) {
      const error = (() => {
        try {
          read(pieces);
        } catch (caught) {
          return caught;
        }
        return null;
      })();
      expect(error).toBeInstanceOf(IntakeFileError);
      expect((error as IntakeFileError).message).toMatch(/^Row 2: a quoted field is not closed/);
    }
  });

  it('a stray quote inside an unquoted cell does not swallow the rest of the file', () => {
    const bytes = Buffer.from(`plot label,notes\n${Array.from({ length: 2000 }, (_, index) => `P${index},5" pot`).join('\n')}\n`);
    const rows = read(cut(bytes, [1000, 9000, 20000])).rows;
    expect(rows).toHaveLength(2001);
    expect(rows[2000]!.cells).toEqual(['P1999', '5" pot']);
  });
});
