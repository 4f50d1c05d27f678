// npm start: installs what is missing, starts MariaDB on loopback, migrates, loads the demo scenario,
// builds the web app and serves everything at http://127.0.0.1:3000 until Ctrl-C.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { repoRoot } from './env.mjs';
import { apiCommand, appEnvironment, buildWebApp, compileTypeScript, ensureDependencies, startDatabase } from './prepare.mjs';
import { startMailSink } from './mail-sink.mjs';
import { startObjectStore } from './object-store.mjs';
import { log } from './run.mjs';
import { supervise } from './supervise.mjs';

ensureDependencies();
const env = appEnvironment();
const db = await startDatabase(env, [env.DB_NAME]);
let api;
let mail;
let objects;
let stopping = false;

function stopAll(code) {
  if (stopping) return;
  stopping = true;
  log('stopping…');
  mail?.close();
  (api ? api.stop() : Promise.resolve()).then(async () => {
    await objects?.close();
    db.stop();
    process.exit(code);
  });
}
process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));

try {
  compileTypeScript();
  apiCommand(env, ['migrate', 'up']);
  apiCommand(env, ['demo', 'load']);
  buildWebApp();
  mail = await startMailSink(env);
  objects = await startObjectStore(env);
} catch (error) {
  process.stderr.write(`[friable] ${error.message}\n`);
  stopAll(1);
}

if (!stopping) {
  // A crashed API is started again (growing pauses; given up after 5 quick deaths in a row).
  api = supervise({
    start: () => spawn(process.execPath, [resolve(repoRoot, 'apps/api/dist/main.js')], { stdio: 'inherit', env, cwd: repoRoot }),
    log,
    onGiveUp: (code) => stopAll(code ?? 1),
  });
  await announceWhenReady();
}

/** Waits for the API to answer, then says where it is and who can sign in. */
async function announceWhenReady() {
  const url = `http://${env.HOST}:${env.PORT}`;
  for (let attempt = 0; attempt < 240 && !stopping; attempt += 1) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    await sleep(250);
  }
  if (stopping) return;
  const { people } = JSON.parse(readFileSync(resolve(repoRoot, 'datasets/demo/people.json'), 'utf8'));
  log(`Friable is running at ${url}`);
  log(`demo accounts (password "${env.DEMO_PASSWORD || 'friable-demo'}"):`);
  for (const person of people) log(`  ${person.email.padEnd(28)} ${person.name}, ${person.describe}`);
  log('press Ctrl-C to stop the app and the database');
}
