// The preparation npm start and npm test share: dependencies, secrets, MariaDB, build, migrations.
import { createHash, randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { loadEnvironment, repoRoot } from './env.mjs';
import { LocalMariaDb, ensureMariaDbInstalled } from './mariadb.mjs';
import { log, runOrThrow } from './run.mjs';

const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';

/** `npm ci` when node_modules is missing or older than the lock file. */
export function ensureDependencies() {
  const marker = resolve(repoRoot, 'node_modules/.package-lock.json');
  const lock = resolve(repoRoot, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  log('installing dependencies with npm ci…');
  runOrThrow(npm, ['ci', '--no-audit', '--no-fund'], { cwd: repoRoot });
}

/** The environment for the apps, with a JWT secret generated once per checkout when none is configured. */
export function appEnvironment(overrides = {}) {
  const env = { ...loadEnvironment(), ...overrides };
  if (!env.JWT_SECRET) {
    const secretFile = resolve(repoRoot, '.data/jwt-secret');
    if (!existsSync(secretFile)) {
      mkdirSync(resolve(repoRoot, '.data'), { recursive: true });
      writeFileSync(secretFile, randomBytes(32).toString('hex'), { mode: 0o600 });
    }
    env.JWT_SECRET = readFileSync(secretFile, 'utf8').trim();
  }
  return env;
}

export async function startDatabase(env, databaseNames) {
  ensureMariaDbInstalled();
  const db = new LocalMariaDb(env);
  await db.start();
  for (const name of databaseNames) db.ensureDatabase(name, env.DB_USER, env.DB_PASSWORD);
  return db;
}

/** Type-checks and compiles the libraries and the API (incremental: seconds when nothing changed). */
export function compileTypeScript() {
  log('compiling TypeScript (tsc -b)…');
  runOrThrow(npm, ['exec', '--', 'tsc', '-b'], { cwd: repoRoot });
}

function hashTree(hash, path) {
  if (!existsSync(path)) return;
  const stat = statSync(path);
  if (stat.isDirectory()) {
    for (const entry of readdirSync(path).sort()) {
      if (entry === 'node_modules' || entry === 'dist') continue;
      hashTree(hash, join(path, entry));
    }
  } else {
    hash.update(path);
    hash.update(readFileSync(path));
  }
}

/** Builds the web app with Vite unless its sources are unchanged since the last build. */
export function buildWebApp() {
  const hash = createHash('sha256');
  for (const path of ['apps/web/src', 'apps/web/index.html', 'apps/web/vite.config.ts', 'apps/web/public', 'libs/contracts/src', 'libs/field/src', 'libs/stats/src', 'package-lock.json']) {
    hashTree(hash, resolve(repoRoot, path));
  }
  const digest = hash.digest('hex');
  const stamp = resolve(repoRoot, 'apps/web/dist/.source-hash');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === digest) {
    log('web app is up to date');
    return;
  }
  log('building the web app (vite build)…');
  runOrThrow(npm, ['run', 'build', '-w', 'apps/web'], { cwd: repoRoot });
  writeFileSync(stamp, digest);
}

/** Runs the API's own command line (migrations, demo scenario) against the given database. */
export function apiCommand(env, args) {
  runOrThrow(process.execPath, [resolve(repoRoot, 'apps/api/dist/cli.js'), ...args], { cwd: repoRoot, env });
}
