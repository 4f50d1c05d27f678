import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './env.mjs';

/** The unit file as section → key → values (a key may repeat). */
function readUnit(path) {
  const sections = {};
  let section = null;
  for (const line of readFileSync(path, 'utf8').split('\n')) {
    const trimmed = line.trim();
    if (!trimmed || trimmed.startsWith('#')) continue;
    const header = /^\[(\w+)\]$/.exec(trimmed);
    if (header) {
      section = sections[header[1]] = {};
      continue;
    }
    const [key, ...rest] = trimmed.split('=');
    (section[key] ??= []).push(rest.join('='));
  }
  return sections;
}

describe('deploy/systemd/friable-api.service', () => {
  const unit = readUnit(resolve(repoRoot, 'deploy/systemd/friable-api.service'));

  it('restarts the API whenever it stops, without a start limit, and stops it with SIGTERM', () => {
    expect(unit.Service.Restart).toEqual(['always']);
    expect(Number(unit.Service.RestartSec[0])).toBeLessThanOrEqual(5);
    expect(unit.Unit.StartLimitIntervalSec).toEqual(['0']);
    expect(unit.Service.KillSignal).toEqual(['SIGTERM']);
  });

  it('runs the built API from the checkout, as its own user, with the environment file', () => {
    expect(unit.Service.ExecStart).toEqual(['/usr/bin/node apps/api/dist/main.js']);
    expect(unit.Service.User).toEqual(['friable']);
    expect(unit.Service.EnvironmentFile).toEqual(['/etc/friable/friable.env']);
    expect(unit.Unit.After[0]).toContain('mariadb.service');
    expect(unit.Install.WantedBy).toEqual(['multi-user.target']);
  });
});
