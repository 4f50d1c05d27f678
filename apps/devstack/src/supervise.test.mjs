import { spawn } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import { describe, expect, it } from 'vitest';
import { supervise } from './supervise.mjs';

const node = (code) => spawn(process.execPath, ['-e', code], { stdio: 'ignore' });

describe('supervise: npm start keeps the API running', () => {
  it('starts a crashed process again, and keeps the one that stays up', async () => {
    const lines = [];
    let attempt = 0;
    const supervisor = supervise({
      // The first start crashes (as the API did, out of memory); the second stays up.
      start: () => (++attempt === 1 ? node('process.exit(134)') : node('setInterval(() => {}, 1000)')),
      log: (line) => lines.push(line),
      onGiveUp: () => lines.push('gave up'),
      delays: [20],
    });
    for (let i = 0; i < 100 && supervisor.starts < 2; i += 1) await sleep(20);
    expect(supervisor.starts).toBe(2);
    expect(lines).toEqual(['the API exited with 134; starting it again in 0.02 s…']);
    await sleep(100);
    expect(supervisor.child.exitCode).toBeNull();
    await supervisor.stop();
    expect(supervisor.child.signalCode).toBe('SIGTERM');
    expect(supervisor.starts).toBe(2);
  });

  it('gives up after several quick deaths in a row instead of spinning', async () => {
    const lines = [];
    const gaveUp = new Promise((resolve) => {
      supervise({ start: () => node('process.exit(1)'), log: (line) => lines.push(line), onGiveUp: resolve, delays: [10, 20], maxQuickDeaths: 3 });
    });
    await gaveUp;
    expect(lines).toEqual([
      'the API exited with 1; starting it again in 0.01 s…',
      'the API exited with 1; starting it again in 0.02 s…',
      'the API exited with 1, 3 times in a row soon after starting; not starting it again',
    ]);
  });
});
