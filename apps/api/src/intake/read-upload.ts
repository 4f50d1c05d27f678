import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { setImmediate as yieldToOthers } from 'node:timers/promises';
import { CsvReader, DecimalMarkCount, type SourceRow } from './parsing';
import { readWorkbookRows, type MergedRange, type WorkbookSheet } from './parsing/workbook-rows';

/** An upload on disk (from multer) or in memory (the demo loader, tests). */
export type UploadSource = { readonly path: string; readonly size: number } | { readonly bytes: Buffer };

export type UploadFormat = 'csv' | 'xlsx';

const CHUNK_BYTES = 64 * 1024;
const HEAD_BYTES = 1_048_576;

export const sourceSize = (source: UploadSource): number => ('bytes' in source ? source.bytes.length : source.size);

async function* chunksOf(source: UploadSource, limit = Number.POSITIVE_INFINITY): AsyncGenerator<Buffer> {
  if ('bytes' in source) {
    const end = Math.min(source.bytes.length, limit);
    for (let start = 0; start < end; start += CHUNK_BYTES) {
      yield source.bytes.subarray(start, Math.min(end, start + CHUNK_BYTES));
      await yieldToOthers();
    }
    return;
  }
  if (limit <= 0) return;
  const stream = createReadStream(source.path, { highWaterMark: CHUNK_BYTES, end: Number.isFinite(limit) ? limit - 1 : undefined });
  for await (const chunk of stream) yield chunk as Buffer;
}

async function firstBytes(source: UploadSource, count: number): Promise<Buffer> {
  if ('bytes' in source) return source.bytes.subarray(0, count);
  const handle = await open(source.path, 'r');
  try {
    const buffer = Buffer.alloc(count);
    const { bytesRead } = await handle.read(buffer, 0, count, 0);
    return buffer.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
}

/** A workbook (a zip: "PK\x03\x04") or text. */
export async function sniffFormat(source: UploadSource): Promise<UploadFormat> {
  const head = await firstBytes(source, 4);
  return head.length === 4 && head[0] === 0x50 && head[1] === 0x4b && head[2] === 0x03 && head[3] === 0x04 ? 'xlsx' : 'csv';
}

export interface UploadReading {
  readonly sha256: string;
  /** Merged ranges of the sheet read (workbooks only). */
  readonly merged: readonly MergedRange[];
  readonly sheet: string | null;
  readonly sheets: readonly WorkbookSheet[];
  /** "comma-separated", "the sheet Day 0": how the file was read, for messages. */
  readonly readAs: string;
}

export interface OpenedUpload {
  readonly format: UploadFormat;
  /** Numbers written with a decimal comma (`;` CSV files whose number cells mostly use it). */
  readonly decimalComma: boolean;
  /**
   * Reads every row in file order; `onProgress` gets the bytes read so far (CSV); `pause` is
   * awaited between chunks (every 1,000 rows of a sheet), so a slower consumer holds the reading back.
   */
  read(onRow: (row: SourceRow) => void, onProgress: (bytesRead: number) => void, pause: () => Promise<void>): Promise<UploadReading>;
}

async function sha256Of(source: UploadSource): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of chunksOf(source)) hash.update(chunk);
  return hash.digest('hex');
}

/** The delimiter of a CSV file, from its head. */
async function delimiterOf(source: UploadSource): Promise<string> {
  const reader = new CsvReader(() => undefined);
  try {
    reader.push(await firstBytes(source, HEAD_BYTES));
  } catch {
    // The full read reports what is wrong, with its row.
  }
  return reader.delimiter;
}

/** Counts the number cells of a `;` file written each way (the file's decimal mark is decided from all of them). */
async function decimalCommaOf(source: UploadSource): Promise<boolean> {
  const marks = new DecimalMarkCount();
  const reader = new CsvReader((row) => marks.add(row.cells));
  try {
    for await (const chunk of chunksOf(source)) reader.push(chunk);
    reader.end();
  } catch {
    // The full read reports what is wrong, with its row.
  }
  return marks.usesComma(reader.delimiter);
}

const delimiterWords: Record<string, string> = { ',': 'comma-separated', ';': 'semicolon-separated', '\t': 'tab-separated' };

/**
 * Open upload — prepares an uploaded file for reading row by row, whatever it is: a CSV text file
 * (comma, semicolon or tab) or an .xlsx workbook (the sheet named, or the first visible one).
 *
 * Purpose: Intake streams every file the same way and never holds it whole. A `;` file is read
 * once beforehand to decide its decimal mark (the majority of its number cells), since every
 * value depends on it. The SHA-256 of the bytes (for the identical re-upload rule) is taken as
 * the file goes by.
 * Throws: IntakeFileError from the readers, naming the row or byte at fault.
 * Example: `const upload = await openUpload({ path, size }, null); await upload.read(onRow, onProgress)` → `{ sha256, readAs: 'comma-separated', … }`
 */
export async function openUpload(source: UploadSource, sheetName: string | null): Promise<OpenedUpload> {
  const format = await sniffFormat(source);
  if (format === 'xlsx') {
    return {
      format,
      decimalComma: false,
      async read(onRow, _onProgress, pause) {
        const input = 'bytes' in source ? { bytes: source.bytes } : { path: source.path };
        let rows = 0;
        const reading = await readWorkbookRows(input, sheetName, async (row) => {
          onRow(row);
          rows += 1;
          if (rows % 1000 === 0) await pause();
        });
        return { sha256: await sha256Of(source), merged: reading.merged, sheet: reading.sheet, sheets: reading.sheets, readAs: `the sheet "${reading.sheet}"` };
      },
    };
  }
  const decimalComma = (await delimiterOf(source)) === ';' ? await decimalCommaOf(source) : false;
  return {
    format,
    decimalComma,
    async read(onRow, onProgress, pause) {
      const hash = createHash('sha256');
      const reader = new CsvReader((row) => onRow({ cells: row.cells, rowNumber: row.rowNumber }));
      let bytesRead = 0;
      for await (const chunk of chunksOf(source)) {
        hash.update(chunk);
        reader.push(chunk);
        bytesRead += chunk.length;
        onProgress(bytesRead);
        await pause();
      }
      reader.end();
      return { sha256: hash.digest('hex'), merged: [], sheet: null, sheets: [], readAs: delimiterWords[reader.delimiter] ?? 'comma-separated' };
    },
  };
}

