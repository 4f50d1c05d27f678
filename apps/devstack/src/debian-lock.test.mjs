import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { heldLocks, waitForDebianLock } from './debian-lock.mjs';

// /proc/locks as the kernel writes it: a POSIX lock on device fe:00 at the lock file's inode.
const lockLine = (inode) => `1: POSIX  ADVISORY  WRITE 4242 fe:00:${inode} 0 EOF\n`;

describe('waiting for the Debian package lock', () => {
  const folder = mkdtempSync(join(tmpdir(), 'friable-lock-'));
  const lock = join(folder, 'lock-frontend');
  const procLocks = join(folder, 'locks');
  writeFileSync(lock, '');
  afterEach(() => writeFileSync(procLocks, ''));
  afterAll(() => rmSync(folder, { recursive: true, force: true }));

  it('sees a lock held on the lock file, and none when /proc/locks does not name it', () => {
    writeFileSync(procLocks, lockLine(statSync(lock).ino));
    expect(heldLocks([lock], procLocks)).toEqual([lock]);
    writeFileSync(procLocks, lockLine(statSync(lock).ino + 1));
    expect(heldLocks([lock], procLocks)).toEqual([]);
    expect(heldLocks([join(folder, 'absent')], procLocks)).toEqual([]);
  });

  it('goes on at once when the lock is free, and gives up with a sentence when it stays held', () => {
    writeFileSync(procLocks, '');
    expect(() => waitForDebianLock({ paths: [lock], procLocks, minutes: 0 })).not.toThrow();
    writeFileSync(procLocks, lockLine(statSync(lock).ino));
    expect(() => waitForDebianLock({ paths: [lock], procLocks, minutes: 0.0001, everyMs: 5 })).toThrow(/still held after .* minutes\. Let the other package manager finish/);
  });

});
