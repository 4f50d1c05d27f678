// npm start and npm test run these scripts on a fresh clone, before node_modules exists: a static import of
// an npm package would fail before the scripts could install it (as s3rver once did). Packages are loaded
// with import() inside the function that needs them, after ensureDependencies has run.
import { readdirSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const folder = resolve(import.meta.dirname);
const scripts = readdirSync(folder).filter((name) => name.endsWith('.mjs') && !name.endsWith('.test.mjs'));

/** The specifiers of a module's static imports and re-exports (`import … from 'x'`, `import 'x'`, `export … from 'x'`). */
function staticImports(source) {
  const specifiers = [];
  const pattern = /^\s*(?:import|export)\s+(?:[^'";]*?\s+from\s+)?['"]([^'"]+)['"]/gm;
  for (const match of source.matchAll(pattern)) specifiers.push(match[1]);
  return specifiers;
}

describe('devstack scripts on a fresh clone', () => {
  it('finds the scripts and reads their imports', () => {
    expect(scripts).toContain('test.mjs');
    expect(staticImports("import { a } from 'b';\nimport 'c';\nexport { d } from './e.mjs';")).toEqual(['b', 'c', './e.mjs']);
  });

  it.each(scripts)('%s imports only Node built-ins and its neighbours statically', (name) => {
    const outside = staticImports(readFileSync(resolve(folder, name), 'utf8')).filter(
      (specifier) => !specifier.startsWith('node:') && !specifier.startsWith('./'),
    );
    expect(outside).toEqual([]);
  });
});
