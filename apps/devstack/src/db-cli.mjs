// npm run db:up | db:down | migrate — the private MariaDB of this checkout, by hand.
//   db:up     starts it (if it is not running) and creates the development and test databases; it keeps
//             running after this command ends, until db:down.
//   db:down   stops it, whoever started it.
//   migrate   compiles the API and brings the development database's schema up to date (db:up first).
import { LocalMariaDb } from './mariadb.mjs';
import { apiCommand, appEnvironment, compileTypeScript, ensureDependencies, startDatabase } from './prepare.mjs';
import { fail, log } from './run.mjs';

const action = process.argv[2];
const env = appEnvironment();

if (action === 'up') {
  const db = await startDatabase(env, [env.DB_NAME, env.DB_TEST_NAME]);
  db.process?.unref();
  log(`MariaDB runs on 127.0.0.1:${db.port} (data in ${db.dataDir}); \`npm run db:down\` stops it`);
} else if (action === 'down') {
  const db = new LocalMariaDb(env);
  if (!db.isUp()) log('MariaDB is not running');
  else {
    db.shutdown();
    log('MariaDB stopped');
  }
} else if (action === 'migrate') {
  const db = new LocalMariaDb(env);
  if (!db.isUp()) fail('MariaDB is not running: start it with `npm run db:up`, then migrate again.');
  ensureDependencies();
  compileTypeScript();
  apiCommand(env, ['migrate', 'up']);
} else {
  fail('usage: node apps/devstack/src/db-cli.mjs up|down|migrate');
}
