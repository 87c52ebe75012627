// Captured messages: kept in memory (newest first) and as one JSON file each, so they survive a restart.
import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { ParsedMail } from './mime';

export type StoredMail = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
  /** From the app's X-Baskwell-Kind and X-Baskwell-Organisation headers (lib/mail.ts); null without them. */
  kind: string | null;
  organisationId: number | null;
};

/** The organisation and kind a message was sent with, from its headers. */
function tagOf(headers: Record<string, string>): Pick<StoredMail, 'kind' | 'organisationId'> {
  const org = Number(headers['x-baskwell-organisation']);
  return {
    kind: headers['x-baskwell-kind'] || null,
    organisationId: Number.isSafeInteger(org) && org > 0 ? org : null,
  };
}

export class MailStore {
  private messages: StoredMail[] = [];

  constructor(private readonly dir: string | null) {
    if (!dir) return;
    mkdirSync(dir, { recursive: true });
    // File names start with the time received and a counter, so reverse name order is newest first.
    for (const name of readdirSync(dir).sort().reverse()) {
      if (!name.endsWith('.json')) continue;
      try {
        this.messages.push(JSON.parse(readFileSync(path.join(dir, name), 'utf8')) as StoredMail);
      } catch {
        // A half-written file from a crash: skip it rather than refuse to start.
      }
    }
  }

  add(mail: ParsedMail, raw: Buffer): StoredMail {
    const stored: StoredMail = {
      id: randomUUID(),
      from: mail.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      receivedAt: new Date().toISOString(),
      ...tagOf(mail.headers),
    };
    this.messages.unshift(stored);
    if (this.dir) {
      const order = String(process.hrtime.bigint()).padStart(20, '0');
      const base = `${stored.receivedAt.replace(/[:.]/g, '-')}-${order}-${stored.id}`;
      writeFileSync(path.join(this.dir, `${base}.eml`), raw);
      writeFileSync(path.join(this.dir, `${base}.json`), JSON.stringify(stored, null, 2));
    }
    return stored;
  }

  list(filter: { to?: string } = {}): StoredMail[] {
    const to = filter.to?.toLowerCase();
    return to
      ? this.messages.filter((m) => m.to.some((a) => a.toLowerCase().includes(to)))
      : [...this.messages];
  }

  get(id: string): StoredMail | undefined {
    return this.messages.find((m) => m.id === id);
  }

  raw(id: string): Buffer | undefined {
    if (!this.dir || !this.get(id)) return undefined;
    const name = readdirSync(this.dir).find((n) => n.endsWith(`-${id}.eml`));
    return name ? readFileSync(path.join(this.dir, name)) : undefined;
  }

  clear(): void {
    this.messages = [];
    if (!this.dir) return;
    for (const name of readdirSync(this.dir)) {
      if (name.endsWith('.json') || name.endsWith('.eml')) rmSync(path.join(this.dir, name), { force: true });
    }
  }
}
