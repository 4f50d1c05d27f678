// npm test: the same preparation as npm start with a separate test database (the demo data is never
// touched), then type-check, lint and every suite. Prints one closing line: "N passed, N failed".
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { resolve } from 'node:path';
import { repoRoot } from './env.mjs';
import { startMailSink } from './mail-sink.mjs';
import { startObjectStore, testObjectStoreEnv } from './object-store.mjs';
import { apiCommand, appEnvironment, buildWebApp, compileTypeScript, ensureDependencies, startDatabase } from './prepare.mjs';
import { commandExists, ensureDebianPackages, log, runAsync, runOrThrow } from './run.mjs';

const npm = 'npm';
const started = Date.now();
ensureDependencies();
ensureDebianPackages(['chromium'], { reason: "Chromium (Debian's chromium, for the browser tests)", probe: () => existsSync('/usr/bin/chromium') });
ensureDebianPackages(['r-base-core', 'r-cran-emmeans', 'r-cran-multcomp', 'r-cran-car', 'r-cran-jsonlite'], {
  reason: 'R with emmeans, multcomp and car (the statistics reference implementation)',
  probe: () => commandExists('Rscript') && spawnSync('Rscript', ['-e', 'suppressMessages({library(emmeans); library(multcomp); library(jsonlite)})'], { stdio: 'ignore' }).status === 0,
});
ensureDebianPackages(['r-cran-survival', 'r-cran-nlme', 'r-cran-mass'], {
  reason: 'R with survival, nlme and MASS (the reference for censored times, rounds over time, scores and counts)',
  probe: () => commandExists('Rscript') && spawnSync('Rscript', ['-e', 'suppressMessages({library(survival); library(nlme); library(MASS)})'], { stdio: 'ignore' }).status === 0,
});
ensureDebianPackages(['r-cran-lme4', 'r-cran-pbkrtest', 'r-cran-lmertest'], {
  reason: 'R with lme4, pbkrtest and lmerTest (the mixed-model reference for factorials and split plots: Kenward–Roger and Satterthwaite)',
  probe: () => commandExists('Rscript') && spawnSync('Rscript', ['-e', 'suppressMessages({library(lme4); library(pbkrtest); library(lmerTest)})'], { stdio: 'ignore' }).status === 0,
});

ensureDebianPackages(['redis-server', 'galera-4', 'rsync'], {
  reason: "Redis and MariaDB's Galera library (shared rate limits; the three-node cluster test)",
  probe: () => existsSync('/usr/bin/redis-server') && existsSync('/usr/lib/galera/libgalera_smm.so') && commandExists('rsync'),
});

const base = appEnvironment();
const env = appEnvironment({
  DB_NAME: base.DB_TEST_NAME,
  NODE_ENV: 'test',
  PORT: base.TEST_PORT || '3999',
  APP_URL: `http://127.0.0.1:${base.TEST_PORT || '3999'}`,
  SMTP_PORT: base.TEST_SMTP_PORT || '2526',
  MAIL_OUTBOX_DIR: '.data/test-outbox',
  DEMO_PASSWORD: 'friable-demo',
  ...testObjectStoreEnv(base),
});
const scratchDatabase = `${env.DB_NAME}_migrations`;
const db = await startDatabase(env, []);
db.dropDatabase(env.DB_NAME);
db.dropDatabase(scratchDatabase);
db.ensureDatabase(env.DB_NAME, env.DB_USER, env.DB_PASSWORD);
db.ensureDatabase(scratchDatabase, env.DB_USER, env.DB_PASSWORD);
rmSync(resolve(repoRoot, env.MAIL_OUTBOX_DIR), { recursive: true, force: true });
rmSync(resolve(repoRoot, env.S3_DATA_DIR), { recursive: true, force: true });
const mail = await startMailSink(env);
const objects = await startObjectStore(env);

const resultsDir = resolve(repoRoot, '.data/test-results');
rmSync(resultsDir, { recursive: true, force: true });
mkdirSync(resultsDir, { recursive: true });

const suites = [
  { name: 'stats library', cwd: 'libs/stats', args: [] },
  { name: 'field library', cwd: 'libs/field', args: [] },
  { name: 'devstack', cwd: 'apps/devstack', args: [] },
  { name: 'API unit', cwd: 'apps/api', args: [] },
  { name: 'API end-to-end', cwd: 'apps/api', args: ['--config', 'vitest.e2e.config.ts'] },
  { name: 'web components', cwd: 'apps/web', args: [] },
  { name: 'browser', cwd: 'apps/web', args: ['--config', 'vitest.browser.config.ts'] },
  { name: 'cluster', cwd: 'apps/devstack', args: ['--config', 'vitest.cluster.config.mjs'] },
];
const tally = { passed: 0, failed: 0, skipped: 0 };
const problems = [];

async function runSuite(suite) {
  const output = resolve(resultsDir, `${suite.name.replace(/\W+/g, '-')}.json`);
  log(`── ${suite.name} ──`);
  const code = await runAsync(
    npm,
    ['exec', '--', 'vitest', 'run', ...suite.args, '--reporter=default', '--reporter=json', `--outputFile=${output}`, '--passWithNoTests'],
    { cwd: resolve(repoRoot, suite.cwd), env: { ...env, FRIABLE_TEST_OUTBOX: resolve(repoRoot, env.MAIL_OUTBOX_DIR), FRIABLE_SCRATCH_DB: scratchDatabase } },
  );
  if (!existsSync(output)) {
    problems.push(`${suite.name}: the suite did not run (exit ${code})`);
    tally.failed += 1;
    return;
  }
  const report = JSON.parse(readFileSync(output, 'utf8'));
  tally.passed += report.numPassedTests;
  tally.failed += report.numFailedTests;
  tally.skipped += report.numPendingTests + (report.numTodoTests ?? 0);
  if (report.numFailedTests > 0 || code !== 0) problems.push(`${suite.name}: ${report.numFailedTests} failed (exit ${code})`);
  if (code !== 0 && report.numFailedTests === 0) tally.failed += 1;
}

let exitCode = 0;
try {
  compileTypeScript();
  log('linting (npm run lint: eslint, the generated API client)…');
  runOrThrow(npm, ['run', 'lint'], { cwd: repoRoot });
  apiCommand(env, ['migrate', 'up']);
  apiCommand(env, ['demo', 'load']);
  buildWebApp();
  for (const suite of suites) await runSuite(suite);
} catch (error) {
  problems.push(error.message);
  tally.failed += 1;
} finally {
  mail.close();
  await objects.close();
  db.stop();
}

const minutes = ((Date.now() - started) / 60000).toFixed(1);
if (problems.length) {
  exitCode = 1;
  log('problems:');
  for (const problem of problems) log(`  ${problem}`);
}
log(`finished in ${minutes} min`);
process.stdout.write(`${tally.passed} passed, ${tally.failed} failed, ${tally.skipped} skipped\n`);
process.exit(exitCode);
