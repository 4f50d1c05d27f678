// npm start: installs what is missing, starts MariaDB on loopback, migrates, loads the demo scenario,
// builds the web app and serves everything at http://127.0.0.1:3000 until Ctrl-C.
import { spawn } from 'node:child_process';
import { resolve } from 'node:path';
import { repoRoot } from './env.mjs';
import { apiCommand, appEnvironment, buildWebApp, compileTypeScript, ensureDependencies, startDatabase } from './prepare.mjs';
import { startMailSink } from './mail-sink.mjs';
import { log } from './run.mjs';

ensureDependencies();
const env = appEnvironment();
const db = await startDatabase(env, [env.DB_NAME]);
let api;
let mail;
let stopping = false;

function stopAll(code) {
  if (stopping) return;
  stopping = true;
  log('stopping…');
  if (api && api.exitCode === null) api.kill('SIGTERM');
  mail?.close();
  const finish = () => {
    db.stop();
    process.exit(code);
  };
  if (api && api.exitCode === null) api.once('exit', finish);
  else finish();
}
process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));

try {
  compileTypeScript();
  apiCommand(env, ['migrate', 'up']);
  apiCommand(env, ['demo', 'load']);
  buildWebApp();
  mail = await startMailSink(env);
} catch (error) {
  process.stderr.write(`[friable] ${error.message}\n`);
  stopAll(1);
}

if (!stopping) {
  api = spawn(process.execPath, [resolve(repoRoot, 'apps/api/dist/main.js')], { stdio: 'inherit', env, cwd: repoRoot });
  api.on('exit', (code) => {
    if (!stopping) stopAll(code ?? 1);
  });
  const password = env.DEMO_PASSWORD || 'friable-demo';
  log(`Friable is starting at http://${env.HOST}:${env.PORT}`);
  log(`demo accounts (password "${password}"):`);
  for (const [email, role] of [
    ['admin@example.org', 'instance administrator'],
    ['ines.investigator@example.org', 'investigator'],
    ['colin.collaborator@example.org', 'collaborator, Hollow Lane garden'],
    ['carla.collaborator@example.org', 'collaborator, Millbrook garden'],
    ['cody.collaborator@example.org', 'collaborator, Quarry Hill garden'],
    ['rhea.reviewer@example.org', 'reviewer'],
  ]) {
    log(`  ${email.padEnd(34)} ${role}`);
  }
  log('press Ctrl-C to stop the app and the database');
}
