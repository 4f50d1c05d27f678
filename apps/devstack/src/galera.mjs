// A MariaDB Galera cluster of `size` nodes on loopback, for the cluster test: each node its own data
// directory, socket and ports (SQL, group communication, IST, SST), the first node bootstrapping the cluster
// and the others joining it by rsync state transfer. Debian's galera-4 provides the replication library.
import { spawn, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, openSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { isRoot } from './run.mjs';

export const GALERA_LIBRARY = '/usr/lib/galera/libgalera_smm.so';
const NOBODY = 65534;
const serverBinary = ['/usr/sbin/mariadbd', '/usr/bin/mariadbd'].find((path) => existsSync(path)) ?? 'mariadbd';

export class GaleraCluster {
  /** Node i (0-based) listens for SQL on basePort+1+i, group communication +11+i, IST +21+i, SST +31+i. */
  constructor({ dir, basePort, size = 3, name = 'friable-cluster' }) {
    this.dir = dir;
    this.basePort = basePort;
    this.name = name;
    this.runDir = join(tmpdir(), `friable-galera-${basePort}`);
    this.nodes = Array.from({ length: size }, (_, i) => ({
      index: i,
      port: basePort + 1 + i,
      groupPort: basePort + 11 + i,
      istPort: basePort + 21 + i,
      sstPort: basePort + 31 + i,
      dataDir: join(dir, `node${i + 1}`),
      socket: join(this.runDir, `node${i + 1}.sock`),
      logFile: join(dir, `node${i + 1}.err`),
      process: null,
    }));
  }

  clientArgs(node) {
    return ['--no-defaults', `--socket=${node.socket}`, '-u', 'root'];
  }

  /** Runs SQL as root on one node; returns its tab-separated output. */
  sql(node, statements) {
    const result = spawnSync('mariadb', [...this.clientArgs(node), '--batch', '--skip-column-names', '-e', statements], { encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`node ${node.index + 1} refused: ${result.stderr.trim()}`);
    return result.stdout.trim();
  }

  status(node, variable) {
    try {
      return this.sql(node, `SHOW STATUS LIKE '${variable}'`).split('\t')[1] ?? null;
    } catch {
      return null;
    }
  }

  startNode(node, { bootstrap }) {
    const members = this.nodes.map((n) => `127.0.0.1:${n.groupPort}`).join(',');
    const logFd = openSync(node.logFile, 'a');
    node.process = spawn(
      serverBinary,
      [
        '--no-defaults',
        `--datadir=${node.dataDir}`,
        `--socket=${node.socket}`,
        `--pid-file=${join(this.runDir, `node${node.index + 1}.pid`)}`,
        `--port=${node.port}`,
        '--bind-address=127.0.0.1',
        '--skip-name-resolve',
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        '--innodb-buffer-pool-size=64M',
        '--innodb-log-file-size=16M',
        '--innodb-flush-log-at-trx-commit=1',
        '--max-allowed-packet=64M',
        '--local-infile=1',
        '--binlog-format=ROW',
        '--default-storage-engine=InnoDB',
        '--innodb-autoinc-lock-mode=2',
        // One writer at a time (every API instance lists the nodes in the same order), so auto-increment keys stay
        // consecutive: Sequelize's bulkCreate on MariaDB numbers the rows it inserted from the first id, one apart.
        '--wsrep-auto-increment-control=OFF',
        '--auto-increment-increment=1',
        '--auto-increment-offset=1',
        '--wsrep-on=ON',
        `--wsrep-provider=${GALERA_LIBRARY}`,
        `--wsrep-cluster-name=${this.name}`,
        `--wsrep-cluster-address=gcomm://${bootstrap ? '' : members}`,
        `--wsrep-node-address=127.0.0.1:${node.groupPort}`,
        `--wsrep-node-name=node${node.index + 1}`,
        `--wsrep-sst-receive-address=127.0.0.1:${node.sstPort}`,
        '--wsrep-sst-method=rsync',
        // Reads wait until the node has applied every write the cluster committed before them.
        '--wsrep-sync-wait=1',
        // A killed node is declared gone after about three seconds instead of the default fifteen.
        `--wsrep-provider-options=gmcast.listen_addr=tcp://127.0.0.1:${node.groupPort};ist.recv_addr=127.0.0.1:${node.istPort};` +
          'evs.keepalive_period=PT0.5S;evs.inactive_check_period=PT0.5S;evs.suspect_timeout=PT2S;evs.inactive_timeout=PT3S;evs.install_timeout=PT3S;gcache.size=32M',
        ...(isRoot ? ['--user=root'] : []),
      ],
      { stdio: ['ignore', logFd, logFd] },
    );
  }

  async waitSynced(node, seconds = 90) {
    const deadline = Date.now() + seconds * 1000;
    while (Date.now() < deadline) {
      if (this.status(node, 'wsrep_local_state_comment') === 'Synced' && this.status(node, 'wsrep_ready') === 'ON') return;
      if (node.process?.exitCode !== null) break;
      await sleep(250);
    }
    const tail = existsSync(node.logFile) ? readFileSync(node.logFile, 'utf8').split('\n').slice(-25).join('\n') : '';
    throw new Error(`Galera node ${node.index + 1} did not reach Synced. Last lines of ${node.logFile}:\n${tail}`);
  }

  /**
   * Fresh data directories; the first node is initialised and bootstraps the cluster, the others join it and
   * receive its state by rsync (wsrep_sst_rsync).
   */
  async start() {
    rmSync(this.dir, { recursive: true, force: true });
    rmSync(this.runDir, { recursive: true, force: true });
    mkdirSync(this.runDir, { recursive: true });
    const [first, ...others] = this.nodes;
    mkdirSync(first.dataDir, { recursive: true });
    const result = spawnSync('mariadb-install-db', ['--no-defaults', `--datadir=${first.dataDir}`, '--auth-root-authentication-method=socket', '--skip-test-db', ...(isRoot ? ['--user=root'] : [])], {
      encoding: 'utf8',
    });
    if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
    for (const node of others) {
      mkdirSync(node.dataDir, { recursive: true });
      // Started by root, rsync's daemon receives the state transfer as nobody: the joiner's folder must be its.
      if (isRoot) chownSync(node.dataDir, NOBODY, NOBODY);
    }
    this.startNode(first, { bootstrap: true });
    await this.waitSynced(first);
    for (const node of others) {
      this.startNode(node, { bootstrap: false });
      await this.waitSynced(node);
    }
  }

  async stopNode(node) {
    const child = node.process;
    if (!child || child.exitCode !== null || child.signalCode !== null) return;
    child.kill('SIGTERM');
    const ended = await Promise.race([new Promise((done) => child.once('exit', () => done(true))), sleep(20_000).then(() => false)]);
    if (!ended) child.kill('SIGKILL');
  }

  clusterSize(node) {
    return Number(this.status(node, 'wsrep_cluster_size') ?? 0);
  }

  /** SIGKILL: the node dies mid-write, as on a power cut. */
  kill(node) {
    node.process?.kill('SIGKILL');
  }

  async stop() {
    for (const node of this.nodes) await this.stopNode(node);
    rmSync(this.runDir, { recursive: true, force: true });
  }
}
