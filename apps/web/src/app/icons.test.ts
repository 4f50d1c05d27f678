import { IconNames, Icons } from '@blueprintjs/icons';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { builtInIcons, configureIcons } from './icons';

const sourceDir = join(__dirname, '..');
const blueprintNames: ReadonlySet<string> = new Set(Object.values(IconNames));

function* sourceFiles(dir: string): Generator<string> {
  for (const entry of readdirSync(dir)) {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) yield* sourceFiles(path);
    else if (/\.tsx?$/.test(entry) && !/\.test\.tsx?$/.test(entry)) yield path;
  }
}

/** Blueprint icon names written in the app's source where an icon is given: `icon="add"`, `icon: 'add'`, `icon={a ? 'tick' : 'error'}`. */
function iconsUsed(): Map<string, string> {
  const used = new Map<string, string>();
  for (const file of sourceFiles(sourceDir)) {
    for (const [, expression] of readFileSync(file, 'utf8').matchAll(/icon[A-Za-z]*\s*[=:]\s*([^,;>\n]*)/g)) {
      for (const [, name] of expression.matchAll(/['"]([a-z0-9-]+)['"]/g)) {
        if (blueprintNames.has(name) && !used.has(name)) used.set(name, relative(sourceDir, file));
      }
    }
  }
  return used;
}

describe('the icons built into the app', () => {
  it('include every icon the source names', () => {
    const missing = [...iconsUsed()].filter(([name]) => !builtInIcons.has(name)).map(([name, file]) => `${name} (${file})`);
    expect(missing, 'add these names to the list in app/icons.ts').toEqual([]);
  });

  it('are real Blueprint icons, in both sizes', async () => {
    expect(builtInIcons.size).toBeGreaterThan(20);
    configureIcons();
    for (const name of builtInIcons) {
      expect(blueprintNames.has(name), name).toBe(true);
      await Icons.load(name as never, 16);
      await Icons.load(name as never, 20);
      expect(Icons.getPaths(name as never, 16)?.length, `${name} 16 px`).toBeGreaterThan(0);
      expect(Icons.getPaths(name as never, 20)?.length, `${name} 20 px`).toBeGreaterThan(0);
    }
  });

  it('an icon not built in still loads, through Blueprint’s own loader', async () => {
    configureIcons();
    expect(builtInIcons.has('airplane')).toBe(false);
    await Icons.load('airplane', 16);
    expect(Icons.getPaths('airplane', 16)?.length).toBeGreaterThan(0);
  });
});
