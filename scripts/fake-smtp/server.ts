// A local SMTP server that accepts every message (no auth, no TLS) and an HTTP JSON API to read them:
//   GET /messages[?to=addr]  newest first      GET /messages/:id      GET /messages/:id/raw
//   DELETE /messages (clear)                    DELETE /messages/:id   GET /health
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { parseMail } from './mime';
import { MailStore } from './store';

export type FakeSmtpOptions = {
  smtpPort: number; // 0 = any free port
  httpPort: number;
  host?: string;
  dir?: string | null; // where messages are kept; null keeps them in memory only
  clear?: boolean;
  quiet?: boolean;
};

export type FakeSmtp = {
  smtpPort: number;
  httpPort: number;
  store: MailStore;
  close(): Promise<void>;
};

const MAX_BYTES = 25 * 1024 * 1024;

function sendJson(res: http.ServerResponse, status: number, body: unknown) {
  res.writeHead(status, {
    'content-type': 'application/json; charset=utf-8',
    'cache-control': 'no-store',
    'access-control-allow-origin': '*',
  });
  res.end(JSON.stringify(body));
}

function api(store: MailStore): http.RequestListener {
  return (req, res) => {
    const url = new URL(req.url ?? '/', 'http://localhost');
    const parts = url.pathname.split('/').filter(Boolean);
    const method = req.method ?? 'GET';
    if (method === 'GET' && url.pathname === '/health') return sendJson(res, 200, { ok: true });
    if (parts[0] !== 'messages' || parts.length > 3) return sendJson(res, 404, { error: 'not found' });
    if (parts.length === 1) {
      if (method === 'GET')
        return sendJson(res, 200, store.list({ to: url.searchParams.get('to') ?? undefined }));
      if (method === 'DELETE') {
        store.clear();
        return sendJson(res, 200, { ok: true });
      }
      return sendJson(res, 405, { error: 'method not allowed' });
    }
    const id = decodeURIComponent(parts[1] ?? '');
    const message = store.get(id);
    if (!message) return sendJson(res, 404, { error: 'no such message' });
    if (parts[2] === 'raw' && method === 'GET') {
      const raw = store.raw(id);
      if (!raw) return sendJson(res, 404, { error: 'raw message not kept' });
      res.writeHead(200, { 'content-type': 'message/rfc822' });
      return res.end(raw);
    }
    if (parts.length === 2 && method === 'GET') return sendJson(res, 200, message);
    return sendJson(res, 405, { error: 'method not allowed' });
  };
}

function listen(
  server: { listen: (port: number, host: string, cb: () => void) => unknown },
  port: number,
  host: string,
  emitter: NodeJS.EventEmitter,
) {
  return new Promise<void>((resolve, reject) => {
    emitter.once('error', reject);
    server.listen(port, host, () => {
      emitter.off('error', reject);
      resolve();
    });
  });
}

export async function startFakeSmtp(opts: FakeSmtpOptions): Promise<FakeSmtp> {
  const host = opts.host ?? '127.0.0.1';
  const store = new MailStore(opts.dir ?? null);
  if (opts.clear) store.clear();
  const say = (msg: string) => {
    if (!opts.quiet) console.log(msg);
  };

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_BYTES,
    logger: false,
    banner: 'Baskwell fake SMTP: messages are kept, never delivered',
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          return callback(Object.assign(new Error('message too large'), { responseCode: 552 }));
        }
        const raw = Buffer.concat(chunks);
        const to = session.envelope.rcptTo.map((a) => a.address);
        try {
          const saved = store.add(parseMail(raw.toString('latin1'), to), raw);
          say(`mail to ${saved.to.join(', ')}: ${saved.subject}`);
          callback();
        } catch (e) {
          callback(e instanceof Error ? e : new Error(String(e)));
        }
      });
    },
  });
  smtp.on('error', (e) => console.error('fake SMTP error:', e.message));
  await listen(smtp, opts.smtpPort, host, smtp);

  const web = http.createServer(api(store));
  try {
    await listen(web, opts.httpPort, host, web);
  } catch (e) {
    await new Promise<void>((r) => smtp.close(() => r()));
    throw e;
  }

  const smtpPort = (smtp.server.address() as AddressInfo).port;
  const httpPort = (web.address() as AddressInfo).port;
  return {
    smtpPort,
    httpPort,
    store,
    close: async () => {
      web.closeAllConnections();
      await Promise.all([
        new Promise<void>((r) => web.close(() => r())),
        new Promise<void>((r) => smtp.close(() => r())),
      ]);
    },
  };
}
