// Reads .env (if present) over the defaults of .env.example, for the scripts behind npm start and npm test.
// Node built-ins only: this runs before `npm ci` on a fresh clone.
import { existsSync, readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');

function parseEnvFile(path) {
  const values = {};
  if (!existsSync(path)) return values;
  for (const line of readFileSync(path, 'utf8').split(/\r?\n/)) {
    const match = /^\s*([A-Z0-9_]+)\s*=\s*(.*?)\s*$/.exec(line);
    if (!match) continue;
    values[match[1]] = match[2].replace(/^(['"])(.*)\1$/, '$2');
  }
  return values;
}

/** The environment the apps get: .env.example defaults, then .env, then the real environment. */
export function loadEnvironment() {
  return {
    ...parseEnvFile(resolve(repoRoot, '.env.example')),
    ...parseEnvFile(resolve(repoRoot, '.env')),
    ...Object.fromEntries(Object.entries(process.env).filter(([, v]) => v !== undefined)),
  };
}
