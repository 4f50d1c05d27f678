// Shared by the R fixture generators: command-line options and the round trip through an R script.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** The value after `--name` on the command line, or undefined. */
export function commandOption(name) {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
}

/**
 * Writes the cases to a scratch folder, runs `Rscript rScript cases.json results.json`, and writes the fixture
 * { description, r, cases: [{ ...case, expected }] } to `output`.
 */
export function writeFixtureFromR({ cases, rScript, output, description }) {
  const work = mkdtempSync(path.join(tmpdir(), 'friable-r-fixture-'));
  try {
    const input = path.join(work, 'cases.json');
    const results = path.join(work, 'results.json');
    writeFileSync(input, JSON.stringify(cases));
    execFileSync('Rscript', [rScript, input, results], { stdio: ['ignore', 'inherit', 'inherit'] });
    const analysed = JSON.parse(readFileSync(results, 'utf8'));
    writeFileSync(output, `${JSON.stringify({ description, r: analysed.r, cases: cases.map((entry, i) => ({ ...entry, expected: analysed.cases[i] })) })}\n`);
    console.log(`wrote ${cases.length} cases to ${output}`);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}
