#!/usr/bin/env node
// Manages the project's private MariaDB by hand:
//   node scripts/mariadb.mjs start    start it (and create the databases); it keeps running until `stop`
//   node scripts/mariadb.mjs stop     stop it
//   node scripts/mariadb.mjs status   say whether it runs, where
//   node scripts/mariadb.mjs shell [db]   open the mariadb client on it as the application user
import { spawnSync } from 'node:child_process';
import { ensureApt, findProgram } from './lib/packages.mjs';
import { loadEnv, usesPrivateDb } from './lib/env.mjs';
import { ensureDatabases, ensureMariaDB, mariadbPaths, runningPid, stopMariaDB } from './lib/mariadb.mjs';
import { red } from './lib/proc.mjs';

const env = loadEnv();
const [command = 'status', arg] = process.argv.slice(2);
const paths = mariadbPaths();

async function main() {
  if (!usesPrivateDb(env)) {
    console.log(`DB_HOST=${env.DB_HOST} is an external server: there is no private MariaDB to manage.`);
    return;
  }
  switch (command) {
    case 'start': {
      await ensureApt({ mariadbd: 'mariadb-server' });
      await ensureMariaDB({ port: Number(env.DB_PORT), owner: 'manual' });
      await ensureDatabases({
        names: [env.DB_NAME, env.TEST_DB_NAME],
        user: env.DB_USER,
        password: env.DB_PASSWORD,
      });
      console.log(
        `MariaDB on 127.0.0.1:${env.DB_PORT}, socket ${paths.socket}. Stop it with: npm run db -- stop`,
      );
      return;
    }
    case 'stop':
      console.log((await stopMariaDB(paths)) ? 'Stopped.' : 'Not running.');
      return;
    case 'status': {
      const pid = runningPid(paths);
      console.log(
        pid ? `Running: pid ${pid}, 127.0.0.1:${env.DB_PORT}, socket ${paths.socket}` : 'Not running.',
      );
      return;
    }
    case 'shell': {
      const client = findProgram('mariadb');
      if (!client) throw new Error('mariadb client not found');
      const r = spawnSync(
        client,
        [
          '--no-defaults',
          '-h127.0.0.1',
          `-P${env.DB_PORT}`,
          `-u${env.DB_USER}`,
          `-p${env.DB_PASSWORD}`,
          arg ?? env.DB_NAME,
        ],
        { stdio: 'inherit' },
      );
      process.exitCode = r.status ?? 1;
      return;
    }
    default:
      throw new Error(`unknown command "${command}" (start | stop | status | shell [db])`);
  }
}

main().catch((e) => {
  console.error(red(e instanceof Error ? e.message : String(e)));
  process.exit(1);
});
