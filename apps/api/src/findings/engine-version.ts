import { readFileSync } from 'node:fs';

let cached: string | null = null;

/**
 * Engine version — the version of @friable/stats (its package.json), stored with every saved analysis.
 * Throws: Error when the package cannot be found (a broken install).
 * @example engineVersion(); // '0.1.0'
 */
export function engineVersion(): string {
  if (cached === null) {
    const text = readFileSync(require.resolve('@friable/stats/package.json'), 'utf8');
    cached = String((JSON.parse(text) as { version: string }).version);
  }
  return cached;
}
