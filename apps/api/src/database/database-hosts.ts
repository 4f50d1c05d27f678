import { EnvironmentError } from '../config/validate-environment';

export interface DatabaseHost {
  host: string;
  port: number;
}

/**
 * The hosts of DB_HOST or DB_READ_HOSTS: one `host` or `host:port`, or several separated by commas (the nodes of a
 * Galera cluster, in order of preference). A host without a port gets `defaultPort`.
 * Throws: EnvironmentError naming the variable for an empty entry or a port outside 1–65535.
 * Example: parseHosts('DB_HOST', 'db1:3306, db2', 3307) → [{host:'db1',port:3306},{host:'db2',port:3307}].
 */
export function parseHosts(name: string, text: string, defaultPort: number): DatabaseHost[] {
  return text.split(',').map((entry) => {
    const match = /^\s*([^\s:,]+)(?::(\d{1,5}))?\s*$/.exec(entry);
    const port = match?.[2] === undefined ? defaultPort : Number(match[2]);
    if (!match || port < 1 || port > 65535) throw new EnvironmentError(`${name} must list host or host:port entries separated by commas; "${entry.trim()}" is neither.`);
    return { host: match[1]!, port };
  });
}

/**
 * The database host in use — the first of DB_HOST's list until it stops answering; the database watch then
 * moves every new connection to the next node that answers (health/database-watch.service.ts). One per list,
 * shared by the connection pool and the watch.
 */
export class HostRing {
  private index = 0;

  constructor(readonly hosts: readonly DatabaseHost[]) {}

  get current(): DatabaseHost {
    return this.hosts[this.index]!;
  }

  /** The hosts in the order to try them: the current one first, then the others in list order. */
  get inTurn(): DatabaseHost[] {
    return [...this.hosts.slice(this.index), ...this.hosts.slice(0, this.index)];
  }

  use(host: DatabaseHost): void {
    const found = this.hosts.findIndex((h) => h.host === host.host && h.port === host.port);
    if (found >= 0) this.index = found;
  }

  isWriteHost(host: string | undefined, port: number | undefined): boolean {
    return this.hosts.some((h) => h.host === host && h.port === port);
  }
}

const rings = new Map<string, HostRing>();

/** The ring of a host list (one per process and list). */
export function hostRing(hosts: readonly DatabaseHost[]): HostRing {
  const key = hosts.map((h) => `${h.host}:${h.port}`).join(',');
  let ring = rings.get(key);
  if (!ring) {
    ring = new HostRing(hosts);
    rings.set(key, ring);
  }
  return ring;
}
