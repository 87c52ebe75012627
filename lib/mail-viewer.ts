/**
 * The development mail viewer (`/mail`): the e-mail one organisation sent, as the fake SMTP server of
 * `npm start` captured it. Invitation links are as good as passwords, so:
 *  - it is off unless MAIL_VIEWER=1 (npm start and npm test set it beside the fake SMTP server they run),
 *    never merely because a fake SMTP address is configured or the server runs in development mode;
 *  - a message is shown only to the organisation that sent it — by the tag it was sent with (lib/mail.ts),
 *    never by its addresses, since the same person can be invited by several organisations;
 *  - only to that organisation's owners (lib/permissions.ts), and only invitations, lamp reminders and
 *    the counter's test slips and re-test reminders to customers;
 *  - a link of an invitation that was used, withdrawn or has expired is replaced by a note.
 */
import 'server-only';
import { config } from '@/lib/config';
import { hashToken, invitationState } from '@/lib/auth/invitations';
import { Invitation } from '@/models';

/** A message the fake SMTP server captured, with the tag it was sent with. */
export type CapturedMessage = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
  kind: string | null;
  organisationId: number | null;
};

/** The kinds of message the viewer shows. */
export const VIEWER_KINDS: readonly string[] = [
  'invitation',
  'lamp-reminder',
  'counter-slip',
  'counter-reminder',
];

/** What the viewer calls each kind it shows. */
export const VIEWER_KIND_LABEL: Record<string, string> = {
  invitation: 'invitation',
  'lamp-reminder': 'lamp reminder',
  'counter-slip': 'test slip to a customer',
  'counter-reminder': 're-test reminder to a customer',
};

export function mailViewerEnabled(): boolean {
  return process.env.MAIL_VIEWER === '1';
}

const INVITE_LINK = /https?:\/\/\S*?\/invite\/([A-Za-z0-9_-]{43})/g;
const DEAD = { accepted: 'already used', revoked: 'withdrawn', expired: 'past its date' } as const;

/** Everything the fake SMTP server holds (newest first), or null when it cannot be reached. */
async function allCaptured(): Promise<Partial<CapturedMessage>[] | null> {
  try {
    const res = await fetch(new URL('/messages', config().FAKE_SMTP_HTTP), {
      cache: 'no-store',
      signal: AbortSignal.timeout(2_000),
    });
    if (!res.ok) return null;
    const data: unknown = await res.json();
    return Array.isArray(data) ? (data as Partial<CapturedMessage>[]) : null;
  } catch {
    return null;
  }
}

async function withDeadLinksRemoved(messages: CapturedMessage[], organisationId: number) {
  const tokens = new Set(messages.flatMap((m) => [...m.text.matchAll(INVITE_LINK)].map((x) => x[1]!)));
  if (tokens.size === 0) return messages;
  const rows = await Invitation.findAll({
    where: { tokenHash: [...tokens].map(hashToken), organisationId },
  });
  const byHash = new Map(rows.map((r) => [r.tokenHash, r]));
  return messages.map((m) => ({
    ...m,
    text: m.text.replace(INVITE_LINK, (link, token: string) => {
      const row = byHash.get(hashToken(token));
      const state = row ? invitationState(row) : null;
      if (state === 'pending') return link;
      return `[link removed: this invitation is ${state ? DEAD[state] : 'unknown'}]`;
    }),
  }));
}

/**
 * The captured messages of the viewer's kinds `organisationId` sent, newest first, with dead invitation
 * links removed; null when the fake SMTP server cannot be reached. The caller checks the flag and that
 * the person is an owner of the organisation.
 */
export async function organisationMail(organisationId: number): Promise<CapturedMessage[] | null> {
  const all = await allCaptured();
  if (!all) return null;
  const ours = all.filter(
    (m): m is CapturedMessage =>
      m.organisationId === organisationId &&
      typeof m.kind === 'string' &&
      VIEWER_KINDS.includes(m.kind) &&
      typeof m.text === 'string' &&
      Array.isArray(m.to),
  );
  return withDeadLinksRemoved(ours, organisationId);
}
