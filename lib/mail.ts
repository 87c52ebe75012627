import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '@/lib/config';

export type Mail = { to: string; subject: string; text: string; html?: string };

const holder = globalThis as unknown as { __baskwellMail?: Transporter };

/**
 * One SMTP transport per process. In development and tests SMTP_HOST/SMTP_PORT point at the project's
 * fake SMTP server; in production at a hosted service (SMTP_USER/SMTP_PASSWORD, SMTP_SECURE=true for 465).
 */
function transport(): Transporter {
  if (!holder.__baskwellMail) {
    const c = config();
    const user = process.env.SMTP_USER;
    holder.__baskwellMail = nodemailer.createTransport({
      host: c.SMTP_HOST,
      port: c.SMTP_PORT,
      secure: process.env.SMTP_SECURE === 'true',
      auth: user ? { user, pass: process.env.SMTP_PASSWORD ?? '' } : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 10_000,
    });
  }
  return holder.__baskwellMail;
}

export async function sendMail(mail: Mail): Promise<void> {
  await transport().sendMail({ from: config().MAIL_FROM, ...mail });
}

/** Captured messages from the development fake SMTP server (newest first), or null when it cannot be reached. */
export type CapturedMessage = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
};

export async function capturedMessages(): Promise<CapturedMessage[] | null> {
  try {
    const res = await fetch(new URL('/messages', config().FAKE_SMTP_HTTP), {
      cache: 'no-store',
      signal: AbortSignal.timeout(2_000),
    });
    if (!res.ok) return null;
    const data: unknown = await res.json();
    return Array.isArray(data) ? (data as CapturedMessage[]) : null;
  } catch {
    return null;
  }
}

/**
 * The captured-mail page exists for development and tests only: on when not in production, or when a
 * fake SMTP server is explicitly configured (the browser tests run a production build against one).
 */
export function mailViewerEnabled(): boolean {
  return process.env.NODE_ENV !== 'production' || Boolean(process.env.FAKE_SMTP_HTTP);
}
