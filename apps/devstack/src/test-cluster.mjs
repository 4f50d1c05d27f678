// npm run test:cluster: installs what the cluster needs (galera-4, Redis, rsync from Debian, waiting for the
// package lock), compiles the API, then runs cluster/*.test.mjs (see there). Stops everything it started.
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { repoRoot } from './env.mjs';
import { compileTypeScript, ensureDependencies } from './prepare.mjs';
import { ensureMariaDbInstalled } from './mariadb.mjs';
import { commandExists, ensureDebianPackages, runAsync } from './run.mjs';

ensureDependencies();
ensureMariaDbInstalled();
ensureDebianPackages(['galera-4', 'redis-server', 'rsync'], {
  reason: "MariaDB's Galera library, Redis and rsync (the three-node cluster test)",
  probe: () => existsSync('/usr/lib/galera/libgalera_smm.so') && existsSync('/usr/bin/redis-server') && commandExists('rsync'),
});
compileTypeScript();
const code = await runAsync('npm', ['exec', '--', 'vitest', 'run', '--config', 'vitest.cluster.config.mjs', 'cluster/cluster.test.mjs', ...process.argv.slice(2)], { cwd: resolve(repoRoot, 'apps/devstack') });
process.exit(code);
