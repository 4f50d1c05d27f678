import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import { expect } from 'vitest';
import { bearer, type TestApp } from '../support/test-app';

export type RResults = Record<string, unknown> & {
  anova?: Array<{ term: string; df: number; f: number | null }>;
  means?: Array<{ treatment: string; round?: string; emmean: number; SE: number }>;
  timeRatios?: Array<{ treatment: string; ratio: number; lower: number; upper: number }>;
  oddsRatios?: Array<{ treatment: string; ratio: number }>;
};

/** Relative closeness: |a − b| ≤ tolerance × max(1, |b|). */
export const close = (actual: number, expected: number, tolerance: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance * Math.max(1, Math.abs(expected)));

const directories: string[] = [];

/** Removes the scratch folders of the bundles run (kept with FRIABLE_KEEP_BUNDLES=1, to look at). */
export function removeBundleFolders(): void {
  if (!process.env.FRIABLE_KEEP_BUNDLES) for (const directory of directories.splice(0)) rmSync(directory, { recursive: true, force: true });
}

/** Downloads a Findings bundle, runs its script with Rscript in a scratch folder, and returns Friable's answer and R's numbers. */
export async function runBundle<T>(t: TestApp, token: string, path: string): Promise<{ friable: T; r: RResults; files: string[]; csv: string; filename: string }> {
  const response = await t.http
    .get(path)
    .set(bearer(token))
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
  expect(response.status).toBe(200);
  expect(response.headers['content-type']).toBe('application/zip');
  const filename = /filename="([^"]+)"/.exec(String(response.headers['content-disposition']))?.[1] ?? '';
  const zip = await JSZip.loadAsync(response.body as Buffer);
  const files = Object.keys(zip.files).sort();
  const directory = mkdtempSync(join(tmpdir(), 'friable-bundle-'));
  directories.push(directory);
  for (const name of files) writeFileSync(join(directory, name), await zip.file(name)!.async('nodebuffer'));
  const run = spawnSync('Rscript', ['analysis.R'], { cwd: directory, encoding: 'utf8', timeout: 120_000 });
  if (run.status !== 0) expect.fail(`Rscript analysis.R failed (status ${run.status}; install r-base-core and the packages the README names):\n${run.stderr}`);
  return {
    friable: JSON.parse(readFileSync(join(directory, 'friable.json'), 'utf8')) as T,
    r: JSON.parse(readFileSync(join(directory, 'r-results.json'), 'utf8')) as RResults,
    files,
    csv: readFileSync(join(directory, 'data.csv'), 'utf8'),
    filename,
  };
}
