import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The committed fixtures (datasets/reference/r-anova-fixtures.json) are only as good as their
// reproducibility: where R is installed (npm test installs r-base-core, r-cran-emmeans,
// r-cran-multcomp and r-cran-jsonlite), regenerate the first layouts with the same seed and check that
// R here gives what the file says. Tolerances as in r-reference.test.ts: SS, F, means, SEs and
// Dunnett t 1e-9 relative; p-values 1e-6 absolute; Dunnett p 2e-3 (mvtnorm's randomized integration).
const rReady =
  spawnSync('Rscript', ['-e', 'suppressMessages({library(emmeans); library(multcomp); library(jsonlite)})'], { stdio: 'ignore' }).status === 0;
const LAYOUTS = 8;

interface Numbers {
  [key: string]: unknown;
}

function close(actual: number, expected: number, relative: number, what: string): void {
  const scale = Math.max(Math.abs(expected), 1e-300);
  expect(Math.abs(actual - expected) / scale, `${what}: ${actual} vs ${expected}`).toBeLessThanOrEqual(relative);
}

describe('the committed R fixtures are what R computes on this machine', () => {
  it(`regenerates the first ${LAYOUTS} layouts with R and finds the committed answers`, () => {
    // npm test installs R and these packages; without them the comparison cannot run, and says so.
    expect(rReady, 'Rscript with the R packages emmeans, multcomp and jsonlite is needed (Debian: r-base-core r-cran-emmeans r-cran-multcomp r-cran-jsonlite)').toBe(true);
    const here = path.dirname(new URL(import.meta.url).pathname);
    const work = mkdtempSync(path.join(tmpdir(), 'friable-r-live-'));
    try {
      const output = path.join(work, 'live.json');
      execFileSync(process.execPath, [path.resolve(here, '../scripts/generate-r-fixtures.mjs'), '--cases', String(LAYOUTS), '--output', output], { stdio: 'ignore' });
      const live = JSON.parse(readFileSync(output, 'utf8')).cases as Numbers[];
      const committed = JSON.parse(readFileSync(path.resolve(here, '../../../datasets/reference/r-anova-fixtures.json'), 'utf8')).cases.slice(0, LAYOUTS) as Numbers[];
      expect(live).toHaveLength(LAYOUTS);
      live.forEach((fresh, i) => {
        const old = committed[i]!;
        // Same seed, same layouts, to the digit.
        expect(fresh.observations, `${old.id} layout`).toEqual(old.observations);
        const now = fresh.expected as Record<string, Array<Record<string, number | string | null>>>;
        const then = old.expected as Record<string, Array<Record<string, number | string | null>>>;
        now.anova!.forEach((row, r) => {
          const was = then.anova![r]!;
          expect(row.term).toBe(was.term);
          close(row.ss as number, was.ss as number, 1e-9, `${old.id} ${row.term} SS`);
          if (was.f !== null) close(row.f as number, was.f as number, 1e-9, `${old.id} ${row.term} F`);
          if (was.p !== null) expect(Math.abs((row.p as number) - (was.p as number))).toBeLessThanOrEqual(1e-6);
        });
        now.means!.forEach((mean, m) => {
          close(mean.mean as number, then.means![m]!.mean as number, 1e-9, `${old.id} mean ${mean.treatment}`);
          close(mean.se as number, then.means![m]!.se as number, 1e-9, `${old.id} SE ${mean.treatment}`);
        });
        now.tukey!.forEach((pair, k) => expect(Math.abs((pair.p as number) - (then.tukey![k]!.p as number)), `${old.id} Tukey p`).toBeLessThanOrEqual(1e-6));
        now.dunnett!.forEach((pair, k) => {
          close(pair.t as number, then.dunnett![k]!.t as number, 1e-9, `${old.id} Dunnett t`);
          expect(Math.abs((pair.p as number) - (then.dunnett![k]!.p as number)), `${old.id} Dunnett p`).toBeLessThanOrEqual(2e-3);
        });
      });
    } finally {
      rmSync(work, { recursive: true, force: true });
    }
  }, 120_000);
});
