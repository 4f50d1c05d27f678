import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';

/**
 * Local infile streams — what MariaDB's `LOAD DATA LOCAL INFILE` may read from this process.
 *
 * Purpose: Intake bulk-loads files it wrote itself. A statement names a registered stream
 * ("friable-infile:…") instead of a path; when the server asks for it, the driver calls
 * `openLocalInfile` (its `infileStreamFactory`), which hands over that stream and nothing else:
 * no path on this machine is ever read on a server's request, so the `permitLocalInfile` option
 * cannot be turned against the API's own files.
 * Reference: MariaDB Connector/Node.js options `permitLocalInfile` and `infileStreamFactory`,
 * https://github.com/mariadb-corporation/mariadb-connector-nodejs/blob/master/documentation/connection-options.md
 * Throws: `openLocalInfile` throws for a name that is not registered (the driver then fails the statement).
 * Example: `const name = registerLocalInfile(() => createReadStream(spool)); await connection.query(`LOAD DATA LOCAL INFILE '${name}' …`); unregisterLocalInfile(name);`
 */
const streams = new Map<string, () => Readable>();

export function registerLocalInfile(open: () => Readable): string {
  const name = `friable-infile:${randomUUID()}`;
  streams.set(name, open);
  return name;
}

export function unregisterLocalInfile(name: string): void {
  streams.delete(name);
}

export function openLocalInfile(name: string | undefined): Readable {
  const open = name === undefined ? undefined : streams.get(name);
  if (!open) throw new Error('LOAD DATA LOCAL INFILE asked for a file this process did not register');
  streams.delete(name!);
  return open();
}
