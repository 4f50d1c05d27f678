// Waiting for the Debian package lock: when another apt-get, dpkg or unattended-upgrades run holds it,
// installing would fail at once ("Could not get lock /var/lib/dpkg/lock-frontend"). npm start and npm
// test wait for it instead, saying so, for a few minutes.
import { existsSync, readFileSync, statSync } from 'node:fs';
import { log } from './run.mjs';

export const DEBIAN_LOCKS = ['/var/lib/dpkg/lock-frontend', '/var/lib/dpkg/lock', '/var/lib/apt/lists/lock', '/var/cache/apt/archives/lock'];

/**
 * The lock files among `paths` that some process holds, read from /proc/locks (dpkg and apt take
 * POSIX fcntl locks, which /proc/locks lists by device and inode). Empty where /proc/locks is absent.
 */
export function heldLocks(paths = DEBIAN_LOCKS, procLocks = '/proc/locks') {
  if (!existsSync(procLocks)) return [];
  const held = new Set(
    readFileSync(procLocks, 'utf8')
      .split('\n')
      .map((line) => /\s(\d+:\d+|[0-9a-f]+:[0-9a-f]+):(\d+)\s/.exec(line)?.[2])
      .filter(Boolean),
  );
  return paths.filter((path) => existsSync(path) && held.has(String(statSync(path).ino)));
}

const pause = (ms) => Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, ms);

/** Waits (up to `minutes`) until no Debian package lock is held; says what it waits for, and throws when time runs out. */
export function waitForDebianLock({ minutes = 5, paths = DEBIAN_LOCKS, everyMs = 2000, procLocks = '/proc/locks' } = {}) {
  let held = heldLocks(paths, procLocks);
  if (held.length === 0) return;
  log(`another package manager (apt-get, dpkg or an automatic update) holds ${held.join(', ')}; waiting up to ${minutes} minutes for it to finish…`);
  const deadline = Date.now() + minutes * 60_000;
  while (held.length > 0) {
    if (Date.now() > deadline) {
      throw new Error(`The Debian package lock (${held.join(', ')}) was still held after ${minutes} minutes. Let the other package manager finish (see \`ps -e | grep -E 'apt|dpkg'\`), then run the command again.`);
    }
    pause(everyMs);
    held = heldLocks(paths, procLocks);
  }
  log('the package lock is free; going on');
}
