// Runs the fake SMTP server (see scripts/fake-smtp/server.ts) with the project's configuration:
// SMTP on 127.0.0.1:$SMTP_PORT, the JSON API on $FAKE_SMTP_HTTP, messages kept in .data/<DB_NAME>/mail
// (or $MAIL_DIR). `--clear` forgets earlier messages first.
import path from 'node:path';
import { startFakeSmtp } from './fake-smtp/server';

const env = process.env;
const httpUrl = new URL(env.FAKE_SMTP_HTTP ?? 'http://127.0.0.1:2580');
const root = path.resolve(import.meta.dirname, '..');
const dir = env.MAIL_DIR ?? path.join(root, '.data', env.DB_NAME ?? 'baskwell', 'mail');

const server = await startFakeSmtp({
  smtpPort: Number(env.SMTP_PORT ?? 2526),
  httpPort: Number(httpUrl.port || 80),
  host: env.SMTP_HOST ?? '127.0.0.1',
  dir,
  clear: process.argv.includes('--clear'),
});
console.log(
  `fake SMTP on ${env.SMTP_HOST ?? '127.0.0.1'}:${server.smtpPort}, messages at ${httpUrl.origin}/messages ` +
    `(kept in ${path.relative(root, dir)})`,
);

let closing = false;
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (closing) return;
    closing = true;
    void server.close().then(() => process.exit(0));
  });
}
