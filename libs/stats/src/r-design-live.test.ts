import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { missingRPackages } from './test-support/r-packages';
import { referencePath } from './test-support/reference-files';

// The committed design fixtures (datasets/reference/r-design-fixtures.json) are only as good as their
// reproducibility: regenerate every layout with the R on this machine (npm test installs Debian's r-base-core,
// r-cran-lme4, -pbkrtest, -lmertest, -emmeans, -car and -jsonlite) and check R gives what the file says. Without R or a
// package the check fails, naming what is missing: a reference check never passes without its reference.
const PACKAGES = ['jsonlite', 'lme4', 'pbkrtest', 'lmerTest', 'emmeans', 'car'];

/** Every leaf of a JSON value by its path ("cases[3].expected.tests[0].f"). */
function leaves(value: unknown, at = '', into = new Map<string, unknown>()): Map<string, unknown> {
  if (Array.isArray(value)) value.forEach((item, i) => leaves(item, `${at}[${i}]`, into));
  else if (value !== null && typeof value === 'object') for (const [key, item] of Object.entries(value)) leaves(item, at ? `${at}.${key}` : key, into);
  else into.set(at, value);
  return into;
}

describe('the committed design fixtures are what R computes on this machine', () => {
  it('regenerates every layout with R and finds the committed answers', () => {
    const missing = missingRPackages(PACKAGES);
    if (missing) throw new Error(`The live R check cannot run: ${missing}. npm test installs them; install them to run this suite.`);
    const here = path.dirname(new URL(import.meta.url).pathname);
    const work = mkdtempSync(path.join(tmpdir(), 'friable-r-design-live-'));
    try {
      const output = path.join(work, 'live.json');
      execFileSync(process.execPath, [path.resolve(here, '../scripts/generate-r-design-fixtures.mjs'), '--output', output], { stdio: 'ignore' });
      const now = leaves(JSON.parse(readFileSync(output, 'utf8')).cases);
      const then = leaves(JSON.parse(readFileSync(referencePath('r-design-fixtures.json'), 'utf8')).cases);
      expect([...now.keys()].sort()).toEqual([...then.keys()].sort());
      for (const [where, was] of then) {
        const fresh = now.get(where);
        // Same seed, same layouts to the digit; R’s numbers to 1e-6 relative (lmer’s optimizer
        // stops within about 1e-7 of the optimum, not at the same digits each run), or 1e-10 absolute near 0.
        if (typeof was === 'number' && typeof fresh === 'number') expect(Math.abs(fresh - was), where).toBeLessThanOrEqual(Math.max(1e-10, 1e-6 * Math.abs(was)));
        else expect(fresh, where).toEqual(was);
      }
    } finally {
      rmSync(work, { recursive: true, force: true });
    }
  }, 300_000);
});
