import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The committed model fixtures (datasets/reference/r-model-fixtures.json) are only as good as their
// reproducibility: regenerate the first two cases of every family with the R on this machine (npm test installs
// Debian's r-base-core and r-cran-* packages) and check R gives what the file says. This check fails, naming what
// is missing, when R or one of the packages is absent: a reference check never passes without its reference.
const PACKAGES = ['jsonlite', 'survival', 'nlme', 'emmeans', 'MASS', 'car', 'pbkrtest', 'multcomp'];
const CASES_PER_FAMILY = 2;

function missingR(): string | null {
  const probe = spawnSync('Rscript', ['-e', `for (p in c(${PACKAGES.map((p) => `"${p}"`).join(', ')})) if (!requireNamespace(p, quietly = TRUE)) cat(p, "")`], { encoding: 'utf8' });
  if (probe.error || probe.status !== 0) return 'Rscript is not installed (Debian package r-base-core)';
  const absent = probe.stdout.trim();
  return absent === '' ? null : `R lacks the package(s) ${absent} (Debian: ${absent.split(/\s+/).map((p) => `r-cran-${p.toLowerCase()}`).join(' ')})`;
}

/** Every number in two JSON trees agrees to `relative` (or 1e-12 absolute near 0); everything else is equal. */
function compareTrees(now: unknown, then: unknown, relative: number, where: string): void {
  if (typeof then === 'number' && typeof now === 'number') {
    expect(Math.abs(now - then) <= Math.max(1e-12, relative * Math.abs(then)), `${where}: ${now} vs committed ${then}`).toBe(true);
    return;
  }
  if (Array.isArray(then)) {
    expect(Array.isArray(now) && now.length === then.length, `${where}: length`).toBe(true);
    then.forEach((item, i) => compareTrees((now as unknown[])[i], item, relative, `${where}[${i}]`));
    return;
  }
  if (then !== null && typeof then === 'object') {
    expect(now !== null && typeof now === 'object', `${where}: object`).toBe(true);
    expect(Object.keys(now as object).sort(), `${where}: keys`).toEqual(Object.keys(then).sort());
    for (const key of Object.keys(then)) compareTrees((now as Record<string, unknown>)[key], (then as Record<string, unknown>)[key], relative, `${where}.${key}`);
    return;
  }
  expect(now, where).toEqual(then);
}

describe('the committed model fixtures are what R computes on this machine', () => {
  it(`regenerates the first ${CASES_PER_FAMILY} cases of every family with R and finds the committed answers`, () => {
    const missing = missingR();
    if (missing) throw new Error(`The live R check cannot run: ${missing}. npm test installs them; install them to run this suite.`);
    const here = path.dirname(new URL(import.meta.url).pathname);
    const work = mkdtempSync(path.join(tmpdir(), 'friable-r-model-live-'));
    try {
      const output = path.join(work, 'live.json');
      execFileSync(process.execPath, [path.resolve(here, '../scripts/generate-r-model-fixtures.mjs'), '--cases', String(CASES_PER_FAMILY), '--output', output], { stdio: 'ignore' });
      const live = JSON.parse(readFileSync(output, 'utf8')).cases as Array<{ id: string; observations: unknown; expected: unknown }>;
      const committed = JSON.parse(readFileSync(path.resolve(here, '../../../datasets/reference/r-model-fixtures.json'), 'utf8')).cases as typeof live;
      expect(live.length).toBeGreaterThanOrEqual(2 * CASES_PER_FAMILY);
      for (const fresh of live) {
        const old = committed.find((c) => c.id === fresh.id);
        expect(old, `${fresh.id} is in the committed file`).toBeDefined();
        // Same seed, same layout, to the digit; R's numbers to 1e-6 relative (its optimizers and mvtnorm's
        // randomized integration, seeded, repeat on one machine but may move in the last digits elsewhere).
        expect(fresh.observations, `${fresh.id} layout`).toEqual(old!.observations);
        compareTrees(fresh.expected, old!.expected, 1e-6, fresh.id);
      }
    } finally {
      rmSync(work, { recursive: true, force: true });
    }
  }, 180_000);
});
