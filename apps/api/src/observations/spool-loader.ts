import { Logger } from '@nestjs/common';
import type { Connection, UpsertResult } from 'mariadb';
import { createReadStream } from 'node:fs';
import { createInterface } from 'node:readline';
import type { Transaction } from 'sequelize';
import { registerLocalInfile, unregisterLocalInfile } from '../database/local-infile';

/** How spool files reach the database: MariaDB's own bulk loader, or multi-row INSERTs where the server refuses it. */
export type BulkLoadMethod = 'infile' | 'insert';

export interface SpoolLoad {
  readonly file: string;
  /** Lines in the file: the rows that must arrive, no more, no fewer. */
  readonly lines: number;
  readonly table: string;
  /** The column each tab-separated field goes to, in order; null skips the field. */
  readonly fields: readonly (string | null)[];
  /** Columns with the same value on every row. */
  readonly constants: Readonly<Record<string, string | number | boolean | null>>;
}

const INSERT_BATCH_ROWS = 1000;
/** Server answers meaning LOAD DATA LOCAL is switched off there (local_infile=OFF): 1148 ER_NOT_ALLOWED_COMMAND, 4166 ER_LOAD_INFILE_CAPABILITY_DISABLED. */
const INFILE_REFUSED = new Set([1148, 4166]);
const unescapes: Record<string, string> = { '\\': '\\', t: '\t', n: '\n', r: '\r', '0': '\0' };

/** The raw driver connection a Sequelize transaction runs on (temporary tables and bulk loads live on it). */
export function connectionOf(transaction: Transaction): Connection {
  return (transaction as unknown as { connection: Connection }).connection;
}

/** A spool field back to its value: \N is NULL, backslash escapes are undone. */
export function readSpoolField(field: string): string | null {
  if (field === '\\N') return null;
  return field.includes('\\') ? field.replace(/\\(.)/g, (_, character: string) => unescapes[character] ?? character) : field;
}

let refusedByServer = false;
const logger = new Logger('Intake');

/**
 * Load spool — puts a spool file's rows into a table inside the caller's transaction, with
 * `LOAD DATA LOCAL INFILE` (the database's own bulk path) or, where the server has it switched
 * off, with multi-row INSERTs of 1,000 rows.
 *
 * Purpose: Intake writes a whole upload at the database's speed and all or nothing. The row count
 * is checked: with LOCAL, MariaDB turns a duplicate key or a value it had to cut into a warning
 * and carries on, so any warning or a count off by one fails the statement here (the caller's
 * transaction then rolls everything back).
 * Reference: MariaDB, LOAD DATA INFILE, https://mariadb.com/kb/en/load-data-infile/ ("LOCAL … errors become warnings").
 * Throws: Error naming the table and the first warnings when rows were skipped or altered.
 * Example: `await loadSpool(transaction, { file, lines: 3, table: 'observations', fields: [null, 'plot_id', …], constants: { trial_id: 4 } }, 'infile')`
 */
export async function loadSpool(transaction: Transaction, load: SpoolLoad, method: BulkLoadMethod): Promise<void> {
  if (load.lines === 0) return;
  const connection = connectionOf(transaction);
  if (method === 'infile' && !refusedByServer) {
    try {
      await loadByInfile(connection, load);
      return;
    } catch (error) {
      if (!INFILE_REFUSED.has((error as { errno?: number }).errno ?? 0)) throw error;
      refusedByServer = true;
      logger.warn('the database refuses LOAD DATA LOCAL INFILE (local_infile=OFF); uploads are written with multi-row INSERTs, which is slower');
    }
  }
  await loadByInsert(connection, load);
}

async function checkArrival(connection: Connection, load: SpoolLoad, result: UpsertResult): Promise<void> {
  if (Number(result.affectedRows) === load.lines && Number(result.warningStatus ?? 0) === 0) return;
  const warnings = (await connection.query('SHOW WARNINGS LIMIT 3')) as Array<{ Message: string }>;
  throw new Error(`bulk load into ${load.table}: ${Number(result.affectedRows)} of ${load.lines} rows arrived (${warnings.map((warning) => warning.Message).join('; ')})`);
}

async function loadByInfile(connection: Connection, load: SpoolLoad): Promise<void> {
  const name = registerLocalInfile(() => createReadStream(load.file));
  const fieldList = load.fields.map((field, index) => field ?? `@skip${index}`).join(', ');
  const constants = Object.keys(load.constants);
  const set = constants.length ? ` SET ${constants.map((column) => `${column} = ?`).join(', ')}` : '';
  try {
    const result = (await connection.query(
      `LOAD DATA LOCAL INFILE '${name}' INTO TABLE ${load.table} CHARACTER SET utf8mb4
         FIELDS TERMINATED BY '\\t' ESCAPED BY '\\\\' LINES TERMINATED BY '\\n' (${fieldList})${set}`,
      Object.values(load.constants),
    )) as UpsertResult;
    await checkArrival(connection, load, result);
  } finally {
    unregisterLocalInfile(name);
  }
}

async function loadByInsert(connection: Connection, load: SpoolLoad): Promise<void> {
  const kept = load.fields.flatMap((field, index) => (field === null ? [] : [index]));
  const columns = [...kept.map((index) => load.fields[index]!), ...Object.keys(load.constants)];
  const constants = Object.values(load.constants);
  const placeholders = `(${columns.map(() => '?').join(',')})`;
  let batch: unknown[][] = [];
  let arrived = 0;
  const flush = async () => {
    if (batch.length === 0) return;
    const result = (await connection.query(`INSERT INTO ${load.table} (${columns.join(', ')}) VALUES ${batch.map(() => placeholders).join(',')}`, batch.flat())) as UpsertResult;
    arrived += Number(result.affectedRows);
    batch = [];
  };
  const lines = createInterface({ input: createReadStream(load.file, 'utf8'), crlfDelay: Infinity });
  for await (const line of lines) {
    const fields = line.split('\t');
    batch.push([...kept.map((index) => readSpoolField(fields[index]!)), ...constants]);
    if (batch.length >= INSERT_BATCH_ROWS) await flush();
  }
  await flush();
  if (arrived !== load.lines) throw new Error(`bulk insert into ${load.table}: ${arrived} of ${load.lines} rows arrived`);
}
