import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '@/lib/config';

/**
 * What a message is and which organisation sent it. Sent as headers, so a captured copy can be shown to
 * that organisation (lib/mail-viewer.ts) and to no one else.
 */
export type MailTag = {
  kind: 'invitation' | 'lamp-reminder' | (string & {});
  /** Null for mail about a person's own account, which no organisation's viewer shows. */
  organisationId: number | null;
};

export type Mail = { to: string; subject: string; text: string; html?: string; tag?: MailTag };

export const TAG_HEADERS = { kind: 'X-Baskwell-Kind', organisation: 'X-Baskwell-Organisation' } as const;

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

export async function sendMail({ tag, ...mail }: Mail): Promise<void> {
  const headers: Record<string, string> = {};
  if (tag) headers[TAG_HEADERS.kind] = tag.kind;
  if (tag?.organisationId) headers[TAG_HEADERS.organisation] = String(tag.organisationId);
  await transport().sendMail({ from: config().MAIL_FROM, ...mail, headers });
}
