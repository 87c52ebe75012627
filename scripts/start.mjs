#!/usr/bin/env node
// `npm start`: everything Baskwell needs, from a fresh clone, then the app on http://localhost:$PORT.
//   installs npm packages (missing or stale) and Debian's mariadb-server (when missing),
//   starts or reuses the private MariaDB (.data/mariadb, 127.0.0.1:$DB_PORT), creates the database,
//   migrates, seeds the demo scenario, starts the fake SMTP server, builds and serves the app, and
//   starts the background job process (scripts/jobs.ts).
// `npm run dev` (--dev) serves with `next dev` instead. Ctrl-C stops everything this started.
// Plain Node with no third-party imports: it runs before node_modules exists.
import { ensureSecret, loadEnv } from './lib/env.mjs';
import { ensureNodeModules } from './lib/packages.mjs';
import { bold, duration, green, log, red } from './lib/proc.mjs';
import {
  Lifecycle,
  migrate,
  prepareDatabase,
  seed,
  startJobs,
  startMail,
  startNext,
  startS3,
} from './lib/stack.mjs';

const dev = process.argv.includes('--dev');
const env = loadEnv();
ensureSecret();
const life = new Lifecycle();
life.handleSignals(0);

function banner(signIns) {
  const url = env.APP_URL;
  const rows = signIns.map((s) => [s.organisation, s.role, s.email, s.password]);
  const widths = [0, 1, 2].map((i) => Math.max(...rows.map((r) => r[i].length)));
  const lines = [
    '',
    bold(green(`Baskwell is running at ${url}`)) + (dev ? ' (development server)' : ''),
    '',
    bold('Demo sign-ins') + ' (invented people; change these passwords before real use):',
    ...rows.map(
      (r) => `  ${r[0].padEnd(widths[0])}  ${r[1].padEnd(widths[1])}  ${r[2].padEnd(widths[2])}  ${r[3]}`,
    ),
    '',
    `Captured e-mail: ${env.FAKE_SMTP_HTTP}/messages (nothing is delivered; SMTP on ${env.SMTP_HOST}:${env.SMTP_PORT})` +
      (env.MAIL_VIEWER === '1' ? '; each organisation’s owner sees its own at /mail' : ''),
    `Uploads: fake S3 at ${env.S3_ENDPOINT}, bucket ${env.S3_BUCKET}`,
    `Database: MariaDB ${env.DB_HOST}:${env.DB_PORT}/${env.DB_NAME}`,
    'Press Ctrl-C to stop.',
    '',
  ];
  console.log(lines.join('\n'));
}

async function main() {
  const t0 = Date.now();
  await ensureNodeModules();
  await prepareDatabase(life, env);
  await migrate(env);
  // Mail and file store first: the demo seed stores its example photo and sends its lamp reminder.
  await startMail(life, env);
  // The demo shows each organisation's owner the mail it sent at /mail, beside the fake SMTP server
  // started just above; MAIL_VIEWER=0 in .env (or the environment) keeps the page off.
  env.MAIL_VIEWER ??= '1';
  await startS3(life, env);
  const { signIns } = await seed(env);
  const next = await startNext(life, env, { port: Number(env.PORT), dev });
  startJobs(life, env);
  log(`Ready in ${duration(Date.now() - t0)}.`);
  banner(signIns);
  // Whatever stops on its own takes the rest down with it.
  const first = await Promise.race(
    life.services.filter((s) => !s.restarts).map((s) => s.exited.then((r) => ({ s, r }))),
  );
  if (life.stopping) return;
  log(red(`${first.s.serviceName} stopped (${first.r.signal ?? first.r.code}); stopping the rest.`));
  await life.stop();
  process.exit(first.s === next && first.r.code === 0 ? 0 : 1);
}

main().catch(async (e) => {
  if (life.stopping) return; // a signal is already shutting down
  console.error(red(`\nnpm start failed: ${e instanceof Error ? e.message : String(e)}`));
  await life.stop();
  process.exit(1);
});
