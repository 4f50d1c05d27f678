// A private MariaDB server for this checkout: its own data directory, socket and loopback port,
// never the system-wide instance or port 3306.
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { tmpdir, userInfo } from 'node:os';
import { join, resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { repoRoot } from './env.mjs';
import { commandExists, ensureDebianPackages, isRoot, log } from './run.mjs';

const serverBinary = ['/usr/sbin/mariadbd', '/usr/bin/mariadbd'].find((path) => existsSync(path)) ?? 'mariadbd';

export function ensureMariaDbInstalled() {
  ensureDebianPackages(['mariadb-server', 'mariadb-client'], {
    reason: "MariaDB (Debian's mariadb-server)",
    probe: () => (existsSync('/usr/sbin/mariadbd') || commandExists('mariadbd')) && commandExists('mariadb'),
  });
}

export class LocalMariaDb {
  constructor(env) {
    this.port = Number(env.DB_PORT);
    this.dataDir = resolve(repoRoot, env.DB_DATA_DIR || '.data/mariadb');
    // Unix socket paths are limited to about 100 bytes, so the socket lives under the temp folder.
    const key = createHash('sha256').update(this.dataDir).digest('hex').slice(0, 10);
    this.runDir = join(tmpdir(), `friable-db-${key}`);
    this.socket = join(this.runDir, 'mariadb.sock');
    this.logFile = resolve(this.dataDir, '..', 'mariadb.err');
    this.startedHere = false;
  }

  clientArgs() {
    return ['--no-defaults', `--socket=${this.socket}`, '-u', 'root'];
  }

  isUp() {
    if (!existsSync(this.socket)) return false;
    return spawnSync('mariadb-admin', [...this.clientArgs(), '--connect-timeout=2', 'ping'], { stdio: 'ignore' }).status === 0;
  }

  initialise() {
    if (existsSync(join(this.dataDir, 'mysql'))) return;
    mkdirSync(this.dataDir, { recursive: true });
    log(`initialising a private MariaDB data directory in ${this.dataDir}…`);
    const user = userInfo().username;
    const result = spawnSync(
      'mariadb-install-db',
      [
        '--no-defaults',
        `--datadir=${this.dataDir}`,
        '--auth-root-authentication-method=socket',
        `--auth-root-socket-user=${user}`,
        '--skip-test-db',
        ...(isRoot ? ['--user=root'] : []),
      ],
      { encoding: 'utf8' },
    );
    if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
  }

  async start() {
    if (this.isUp()) {
      log(`MariaDB already running on 127.0.0.1:${this.port}; reusing it`);
      return;
    }
    this.initialise();
    mkdirSync(this.runDir, { recursive: true });
    const logFd = openSync(this.logFile, 'a');
    this.process = spawn(
      serverBinary,
      [
        '--no-defaults',
        `--datadir=${this.dataDir}`,
        `--socket=${this.socket}`,
        `--pid-file=${join(this.runDir, 'mariadb.pid')}`,
        `--port=${this.port}`,
        '--bind-address=127.0.0.1',
        '--skip-name-resolve',
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        '--innodb-buffer-pool-size=256M',
        '--innodb-flush-log-at-trx-commit=2',
        '--max-allowed-packet=64M',
        '--local-infile=1',
        ...(isRoot ? ['--user=root'] : []),
      ],
      { stdio: ['ignore', logFd, logFd], detached: true },
    );
    this.startedHere = true;
    for (let attempt = 0; attempt < 120; attempt += 1) {
      if (this.isUp()) {
        log(`MariaDB is up on 127.0.0.1:${this.port}`);
        return;
      }
      if (this.process.exitCode !== null) break;
      await sleep(250);
    }
    const tail = existsSync(this.logFile) ? readFileSync(this.logFile, 'utf8').split('\n').slice(-20).join('\n') : '';
    throw new Error(`MariaDB did not start on port ${this.port}. Last lines of ${this.logFile}:\n${tail}`);
  }

  sql(statements) {
    const result = spawnSync('mariadb', [...this.clientArgs(), '--batch', '-e', statements], { encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`MariaDB refused: ${result.stderr.trim()}`);
    return result.stdout;
  }

  /** Creates the database and the application user (idempotent); the password follows .env. */
  ensureDatabase(name, user, password) {
    const quoted = password.replace(/\\/g, '\\\\').replace(/'/g, "\\'");
    this.sql(
      [
        `CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
        ...['127.0.0.1', 'localhost'].flatMap((host) => [
          `CREATE USER IF NOT EXISTS '${user}'@'${host}' IDENTIFIED BY '${quoted}'`,
          `ALTER USER '${user}'@'${host}' IDENTIFIED BY '${quoted}'`,
          `GRANT ALL PRIVILEGES ON \`${name}\`.* TO '${user}'@'${host}'`,
        ]),
        'FLUSH PRIVILEGES',
      ].join(';\n'),
    );
  }

  dropDatabase(name) {
    this.sql(`DROP DATABASE IF EXISTS \`${name}\``);
  }

  /** Stops the server if this process started it. */
  stop() {
    if (!this.startedHere) return;
    this.shutdown();
    this.startedHere = false;
    log('MariaDB stopped');
  }

  /** Stops the server whoever started it (npm run db:down). */
  shutdown() {
    spawnSync('mariadb-admin', [...this.clientArgs(), 'shutdown'], { stdio: 'ignore' });
  }
}
