import { Logger } from '@nestjs/common';
import type { Connection, UpsertResult } from 'mariadb';
import { once } from 'node:events';
import { PassThrough } from 'node:stream';
import type { Transaction } from 'sequelize';
import { registerLocalInfile, unregisterLocalInfile } from '../database/local-infile';

/** How rows reach the database: MariaDB's own bulk loader, or multi-row INSERTs where the server has it switched off. */
export type BulkLoadMethod = 'infile' | 'insert';

export interface BulkTarget {
  readonly table: string;
  /** The column each tab-separated field of a line goes to, in order; null skips the field. */
  readonly fields: readonly (string | null)[];
  /** Columns with the same value on every row. */
  readonly constants: Readonly<Record<string, string | number | boolean | null>>;
}

/**
 * Lines on their way into a table. `write` takes one line (tab-separated fields in LOAD DATA's
 * escapes, ending in \n); `settle` waits while the database catches up; `end` resolves with the
 * number of rows once every one of them has arrived (and fails if any was skipped or altered);
 * `abort` stops it half-way (the caller then rolls its transaction back).
 */
export interface BulkStream {
  readonly lines: number;
  write(line: string): void;
  settle(): Promise<void>;
  end(): Promise<number>;
  abort(): Promise<void>;
}

const INSERT_BATCH_ROWS = 1000;
const FLUSH_CHARACTERS = 65_536;
/**
 * Most data one LOAD DATA statement is fed (half the server's max_allowed_packet when that is
 * smaller). The driver sends a statement's data when it ends (or in 16 MB packets), so segments of
 * under 1 MB keep the database loading while the file is still being checked, and keep the
 * driver's packet buffer at 1 MB.
 */
const MAX_SEGMENT_BYTES = 900 * 1024;
const unescapes: Record<string, string> = { '\\': '\\', t: '\t', n: '\n', r: '\r', '0': '\0' };
const logger = new Logger('Intake');

/** The raw driver connection a Sequelize transaction runs on (temporary tables and bulk loads live on it). */
export function connectionOf(transaction: Transaction): Connection {
  return (transaction as unknown as { connection: Connection }).connection;
}

/** A field of a line back to its value: \N is NULL, backslash escapes are undone. */
export function readLineField(field: string): string | null {
  if (field === '\\N') return null;
  return field.includes('\\') ? field.replace(/\\(.)/g, (_, character: string) => unescapes[character] ?? character) : field;
}

let serverAllowsInfile: boolean | null = null;

/** Whether the server takes LOAD DATA LOCAL INFILE (its local_infile variable), asked once per process. */
async function infileAllowed(connection: Connection): Promise<boolean> {
  if (serverAllowsInfile === null) {
    const [row] = (await connection.query('SELECT @@GLOBAL.local_infile AS allowed')) as Array<{ allowed: number | bigint }>;
    serverAllowsInfile = Number(row!.allowed) === 1;
    if (!serverAllowsInfile) logger.warn('the database has local_infile=OFF; uploads are written with multi-row INSERTs, which is slower');
  }
  return serverAllowsInfile;
}

/**
 * Open bulk stream — starts loading lines into a table inside the caller's transaction while they
 * are still being produced: `LOAD DATA LOCAL INFILE` reading a registered stream (the database's
 * own bulk path), or, where the server has it switched off or INTAKE_BULK_LOAD=insert, multi-row
 * INSERTs of 1,000 rows.
 *
 * Purpose: Intake checks a file and the database stores it at the same time; a refused file is
 * rolled back with the transaction. The row count is checked at the end: with LOCAL, MariaDB turns
 * a duplicate key or a value it had to cut into a warning and carries on, so any warning or a
 * count off by one fails `end` (and the caller's transaction then rolls everything back).
 * Reference: MariaDB, LOAD DATA INFILE, https://mariadb.com/kb/en/load-data-infile/ ("with LOCAL … errors become warnings").
 * Throws: from `settle` or `end`, the database's error, or an Error naming the table and the first warnings.
 * Example: `const stream = await openBulkStream(transaction, { table: 'observations', fields, constants }, 'infile'); stream.write(line); await stream.end()` → 1
 */
export async function openBulkStream(transaction: Transaction, target: BulkTarget, method: BulkLoadMethod): Promise<BulkStream> {
  const connection = connectionOf(transaction);
  if (method !== 'infile' || !(await infileAllowed(connection))) return insertStream(connection, target);
  const [row] = (await connection.query('SELECT @@max_allowed_packet AS packet')) as Array<{ packet: number | bigint }>;
  return infileStream(connection, target, Math.max(64 * 1024, Math.min(MAX_SEGMENT_BYTES, Number(row!.packet) / 2)));
}

/**
 * LOAD DATA statements in turn, each fed at most `segmentBytes`: the driver sends a local file in
 * full 16 MB packets, which the server joins into one logical packet, so a single statement fed
 * more than the server's max_allowed_packet would be cut off.
 */
function infileStream(connection: Connection, target: BulkTarget, segmentBytes: number): BulkStream {
  const fieldList = target.fields.map((field, index) => field ?? `@skip${index}`).join(', ');
  const constants = Object.keys(target.constants);
  const set = constants.length ? ` SET ${constants.map((column) => `${column} = ?`).join(', ')}` : '';
  const sql = (name: string) =>
    `LOAD DATA LOCAL INFILE '${name}' INTO TABLE ${target.table} CHARACTER SET utf8mb4
       FIELDS TERMINATED BY '\\t' ESCAPED BY '\\\\' LINES TERMINATED BY '\\n' (${fieldList})${set}`;
  let failure: unknown = null;
  const finished: Array<Promise<void>> = [];
  let segment: { input: PassThrough; name: string; loading: Promise<UpsertResult>; lines: number; bytes: number } | null = null;
  let pending: string[] = [];
  let pendingCharacters = 0;
  let lines = 0;

  const open = () => {
    const input = new PassThrough({ highWaterMark: 1_048_576 });
    // `abort` destroys the input with an error to end the statement; the statement's own rejection reports
    // it, so the stream's 'error' event needs a listener, else Node takes it as uncaught and stops the API.
    input.on('error', () => undefined);
    const name = registerLocalInfile(() => input);
    const loading = (connection.query(sql(name), Object.values(target.constants)) as Promise<UpsertResult>).catch((error: unknown) => {
      failure ??= error;
      input.destroy();
      throw error;
    });
    loading.catch(() => undefined);
    return { input, name, loading, lines: 0, bytes: 0 };
  };
  const close = () => {
    if (!segment) return;
    const { input, name, loading, lines: sent } = segment;
    input.end();
    const done = loading.then((result) => checkArrival(connection, target.table, sent, result)).finally(() => unregisterLocalInfile(name));
    done.catch((error: unknown) => (failure ??= error));
    finished.push(done);
    segment = null;
  };
  const flush = () => {
    if (pending.length === 0 || failure) return;
    segment ??= open();
    const text = pending.join('');
    segment.input.write(text);
    segment.bytes += Buffer.byteLength(text);
    segment.lines += pending.length;
    pending = [];
    pendingCharacters = 0;
    if (segment.bytes >= segmentBytes) close();
  };
  return {
    get lines() {
      return lines;
    },
    write(line) {
      if (failure) return;
      lines += 1;
      pending.push(line);
      pendingCharacters += line.length;
      if (pendingCharacters >= FLUSH_CHARACTERS) flush();
    },
    async settle() {
      if (failure) throw failure;
      const current = segment;
      if (current?.input.writableNeedDrain) await Promise.race([once(current.input, 'drain'), current.loading]);
      // Never more than one finished segment waiting: the next one's data queues behind it.
      while (finished.length > 1) await finished.shift();
      if (failure) throw failure;
    },
    async end() {
      flush();
      close();
      for (const done of finished) await done;
      if (failure) throw failure;
      return lines;
    },
    async abort() {
      failure ??= new Error('the upload was refused');
      // The driver answers a broken stream by ending its statement, so the connection is free for the rollback.
      segment?.input.destroy(new Error('the upload was refused'));
      if (segment) unregisterLocalInfile(segment.name);
      await Promise.allSettled([segment?.loading, ...finished]);
      segment = null;
    },
  };
}

async function checkArrival(connection: Connection, table: string, lines: number, result: UpsertResult): Promise<void> {
  if (Number(result.affectedRows) === lines && Number(result.warningStatus ?? 0) === 0) return;
  const warnings = (await connection.query('SHOW WARNINGS LIMIT 3')) as Array<{ Message: string }>;
  throw new BulkLoadIncomplete(table, Number(result.affectedRows), lines, warnings.map((warning) => warning.Message).join('; '));
}

/** Rows went missing or were altered on the way in (a duplicate key, a value cut short): the transaction must roll back. */
export class BulkLoadIncomplete extends Error {
  override readonly name = 'BulkLoadIncomplete';

  constructor(
    readonly table: string,
    readonly arrived: number,
    readonly sent: number,
    readonly warnings: string,
  ) {
    super(`bulk load into ${table}: ${arrived} of ${sent} rows arrived${warnings ? ` (${warnings})` : ''}`);
  }
}

function insertStream(connection: Connection, target: BulkTarget): BulkStream {
  const kept = target.fields.flatMap((field, index) => (field === null ? [] : [index]));
  const columns = [...kept.map((index) => target.fields[index]!), ...Object.keys(target.constants)];
  const constants = Object.values(target.constants);
  const placeholders = `(${columns.map(() => '?').join(',')})`;
  let batch: unknown[][] = [];
  let lines = 0;
  let arrived = 0;
  let queued = 0;
  let failure: unknown = null;
  let chain: Promise<void> = Promise.resolve();
  const flush = () => {
    if (batch.length === 0) return;
    const rows = batch;
    batch = [];
    queued += 1;
    chain = chain.then(async () => {
      const result = (await connection.query(`INSERT INTO ${target.table} (${columns.join(', ')}) VALUES ${rows.map(() => placeholders).join(',')}`, rows.flat())) as UpsertResult;
      arrived += Number(result.affectedRows);
      queued -= 1;
    });
    chain.catch((error: unknown) => (failure = error));
  };
  return {
    get lines() {
      return lines;
    },
    write(line) {
      if (failure) return;
      lines += 1;
      const fields = line.slice(0, -1).split('\t');
      batch.push([...kept.map((index) => readLineField(fields[index]!)), ...constants]);
      if (batch.length >= INSERT_BATCH_ROWS) flush();
    },
    async settle() {
      if (failure) throw failure;
      if (queued > 2) await chain;
    },
    async end() {
      flush();
      await chain;
      if (arrived !== lines) throw new BulkLoadIncomplete(target.table, arrived, lines, '');
      return lines;
    },
    async abort() {
      batch = [];
      await chain.catch(() => undefined);
    },
  };
}
