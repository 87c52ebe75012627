import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from './server';
import type { StoredMail } from './store';

let server: FakeSmtp;
let dir: string;
let api: string;

async function send(opts: { to: string | string[]; subject: string; text?: string; html?: string }) {
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: server.smtpPort, secure: false });
  await transport.sendMail({ from: 'Baskwell <no-reply@baskwell.example>', ...opts });
  transport.close();
}

async function getJson<T>(url: string, init?: RequestInit): Promise<{ status: number; body: T }> {
  const res = await fetch(url, init);
  return { status: res.status, body: (await res.json()) as T };
}

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'fake-smtp-'));
  server = await startFakeSmtp({ smtpPort: 0, httpPort: 0, dir, quiet: true });
  api = `http://127.0.0.1:${server.httpPort}`;
});

afterAll(async () => {
  await server.close();
  rmSync(dir, { recursive: true, force: true });
});

beforeEach(async () => {
  await fetch(`${api}/messages`, { method: 'DELETE' });
});

describe('fake SMTP', () => {
  it('keeps what nodemailer sends and lists it newest first', async () => {
    await send({ to: 'keeper@example.com', subject: 'First', text: 'one' });
    await send({
      to: ['a@example.com', 'b@example.com'],
      subject: 'Zweite Nachricht – grüße',
      text: 'zwei ü',
    });
    const { status, body } = await getJson<StoredMail[]>(`${api}/messages`);
    expect(status).toBe(200);
    expect(body.map((m) => m.subject)).toEqual(['Zweite Nachricht – grüße', 'First']);
    expect(body[0]?.to).toEqual(['a@example.com', 'b@example.com']);
    expect(body[0]?.from).toBe('Baskwell <no-reply@baskwell.example>');
    expect(body[0]?.text.trim()).toBe('zwei ü');
    expect(Date.parse(body[0]?.receivedAt ?? '')).not.toBeNaN();
  });

  it('decodes a long quoted-printable link intact from a text+html message', async () => {
    const link = `http://localhost:3000/invitations/accept?token=${'abc123=XYZ'.repeat(12)}`;
    await send({
      to: 'new@example.com',
      subject: 'Invitation',
      text: `Join us: ${link}\n`,
      html: `<p>Join <a href="${link}">here</a></p>`,
    });
    const [mail] = (await getJson<StoredMail[]>(`${api}/messages`)).body;
    expect(mail?.text).toContain(link);
    expect(mail?.html).toContain(`href="${link}"`);
  });

  it('serves one message by id, 404 for an unknown one, and filters by recipient', async () => {
    await send({ to: 'x@example.com', subject: 'For x', text: 'x' });
    await send({ to: 'y@example.com', subject: 'For y', text: 'y' });
    const list = (await getJson<StoredMail[]>(`${api}/messages?to=y@example.com`)).body;
    expect(list.map((m) => m.subject)).toEqual(['For y']);
    const one = await getJson<StoredMail>(`${api}/messages/${list[0]?.id}`);
    expect(one.body.subject).toBe('For y');
    expect((await fetch(`${api}/messages/nope`)).status).toBe(404);
    const raw = await fetch(`${api}/messages/${list[0]?.id}/raw`);
    expect(await raw.text()).toMatch(/^Subject: For y$/m);
  });

  it('clears with DELETE /messages, also on disk', async () => {
    await send({ to: 'z@example.com', subject: 'Gone soon', text: 'z' });
    expect(readdirSync(dir).length).toBeGreaterThan(0);
    expect((await fetch(`${api}/messages`, { method: 'DELETE' })).status).toBe(200);
    expect((await getJson<StoredMail[]>(`${api}/messages`)).body).toEqual([]);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('reloads kept messages after a restart', async () => {
    await send({ to: 'kept@example.com', subject: 'Still here', text: 'k' });
    const again = await startFakeSmtp({ smtpPort: 0, httpPort: 0, dir, quiet: true });
    try {
      const res = await fetch(`http://127.0.0.1:${again.httpPort}/messages`);
      const list = (await res.json()) as StoredMail[];
      expect(list.map((m) => m.subject)).toEqual(['Still here']);
    } finally {
      await again.close();
    }
  });
});
