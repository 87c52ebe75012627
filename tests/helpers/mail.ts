// Reads what the fake SMTP server (scripts/fake-smtp.ts) captured; FAKE_SMTP_HTTP is set by scripts/test.mjs.
import type { StoredMail } from '@/scripts/fake-smtp/store';

/** A message as the fake server's JSON API lists it. */
export type CapturedMail = StoredMail;

function api(path: string): string {
  return new URL(path, process.env.FAKE_SMTP_HTTP ?? 'http://127.0.0.1:2581').toString();
}

/** Captured messages, newest first; `to` keeps those with a recipient containing it. */
export async function listMail(to?: string): Promise<CapturedMail[]> {
  const res = await fetch(api(to ? `/messages?to=${encodeURIComponent(to)}` : '/messages'));
  if (!res.ok) throw new Error(`fake SMTP answered ${res.status}`);
  return (await res.json()) as CapturedMail[];
}

export async function clearMail(): Promise<void> {
  const res = await fetch(api('/messages'), { method: 'DELETE' });
  if (!res.ok) throw new Error(`fake SMTP answered ${res.status}`);
}

/** Waits for a message to `to` (and with a subject matching `subject`, when given); newest wins. */
export async function waitForMail(
  to: string,
  { subject, timeoutMs = 10_000 }: { subject?: RegExp | string; timeoutMs?: number } = {},
): Promise<CapturedMail> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await listMail(to)).find((m) =>
      subject === undefined
        ? true
        : typeof subject === 'string'
          ? m.subject.includes(subject)
          : subject.test(m.subject),
    );
    if (found) return found;
    if (Date.now() > until)
      throw new Error(`no mail to ${to}${subject ? ` matching ${subject}` : ''} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The first http(s) link in a message's text (e.g. an invitation link). */
export function firstLink(mail: CapturedMail): string {
  const m = /https?:\/\/[^\s<>")]+/.exec(mail.text);
  if (!m) throw new Error(`no link in mail "${mail.subject}"`);
  return m[0];
}
