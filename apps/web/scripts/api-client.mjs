// Writes src/lib/api-schema.ts, the types of every API route, from the API's own OpenAPI document
// (openapi-typescript); the web app's client (openapi-fetch) is typed by it.
//   node apps/web/scripts/api-client.mjs          regenerate (npm run api:client)
//   node apps/web/scripts/api-client.mjs --check  fail when the checked-in file is not current (npm run lint)
// Needs the compiled API (`npx tsc -b`): the document is read from its route metadata, no database.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import openapiTS, { astToString } from 'openapi-typescript';

const webRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const repoRoot = resolve(webRoot, '../..');
const target = resolve(webRoot, 'src/lib/api-schema.ts');
const printer = resolve(repoRoot, 'apps/api/dist/openapi/print-openapi.js');
const shown = relative(repoRoot, target);

if (!existsSync(printer)) {
  console.error(`The API is not compiled (${relative(repoRoot, printer)} is missing): run \`npx tsc -b\` first.`);
  process.exit(1);
}
const printed = spawnSync(process.execPath, [printer], { cwd: repoRoot, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
if (printed.status !== 0) {
  console.error(printed.stderr || `Reading the OpenAPI document failed (exit ${printed.status}).`);
  process.exit(1);
}

const header = [
  '// Generated from the API\'s OpenAPI document by `npm run api:client` (openapi-typescript). Do not edit:',
  '// change the API\'s DTO classes, then run `npx tsc -b && npm run api:client`.',
  '',
].join('\n');
const generated = header + astToString(await openapiTS(JSON.parse(printed.stdout), { alphabetize: true, defaultNonNullable: false }));

if (process.argv.includes('--check')) {
  const current = existsSync(target) ? readFileSync(target, 'utf8') : '';
  if (current !== generated) {
    console.error(`${shown} does not match the API's OpenAPI document. Run \`npx tsc -b && npm run api:client\` and commit the result.`);
    process.exit(1);
  }
  console.log(`${shown} matches the API's OpenAPI document.`);
} else {
  writeFileSync(target, generated);
  console.log(`wrote ${shown}`);
}
