// Small process helpers shared by the devstack scripts.
import { spawn, spawnSync } from 'node:child_process';
import { waitForDebianLock } from './debian-lock.mjs';

export function log(message) {
  process.stdout.write(`[friable] ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`[friable] ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion with inherited output; throws with the command line when it fails. */
export function runOrThrow(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', ...options });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} exited with ${result.status ?? result.signal}`);
  }
}

/** Runs a command and resolves with its exit code (never rejects on a non-zero exit). */
export function runAsync(command, args, options = {}) {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(command, args, { stdio: 'inherit', ...options });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolvePromise(code ?? (signal ? 1 : 0)));
  });
}

export function commandExists(command) {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Installs Debian packages with apt-get when they are missing (root only); otherwise says what to install. */
export function ensureDebianPackages(packages, { reason, probe }) {
  if (probe()) return;
  if (!isRoot) {
    fail(`${reason} is missing. Install it with:\n  sudo apt-get install -y ${packages.join(' ')}\nthen run the command again.`);
  }
  log(`installing ${packages.join(' ')} (${reason}) with apt-get…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  // Another package manager may hold the lock: wait for it, and let apt-get itself wait for what races in.
  const waitForLock = () => {
    try {
      waitForDebianLock();
    } catch (error) {
      fail(error.message);
    }
  };
  const lockTimeout = ['-o', 'DPkg::Lock::Timeout=300'];
  waitForLock();
  let install = spawnSync('apt-get', [...lockTimeout, 'install', '-y', '-q', '--no-install-recommends', ...packages], { stdio: 'inherit', env });
  if (install.status !== 0) {
    waitForLock();
    runOrThrow('apt-get', [...lockTimeout, 'update', '-q'], { env });
    install = spawnSync('apt-get', [...lockTimeout, 'install', '-y', '-q', '--no-install-recommends', ...packages], { stdio: 'inherit', env });
  }
  if (install.status !== 0 || !probe()) fail(`could not install ${packages.join(' ')}; install it by hand and try again.`);
}
