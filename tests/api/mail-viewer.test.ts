import { afterEach, describe, expect, it } from 'vitest';
import * as accept from '@/app/api/invitations/accept/route';
import * as revoke from '@/app/api/invitations/[id]/route';
import * as invitations from '@/app/api/invitations/route';
import { mailViewerEnabled, organisationMail } from '@/lib/mail-viewer';
import { can } from '@/lib/permissions';
import { deliverQueued } from '@/lib/reminders/outbox';
import { Invitation, MailMessage, type Organisation, type User } from '@/models';
import { createMember, withTestDatabase } from '../helpers/db';
import { createWorld } from '../helpers/world';
import { clearMail, listMail } from '../helpers/mail';
import { call, send } from './http';

withTestDatabase();

const tokenIn = (text: string) => /\/invite\/([A-Za-z0-9_-]{43})/.exec(text)?.[1] ?? null;

async function invite(as: User, organisation: Organisation, email: string, role = 'staff') {
  const r = await call(invitations.POST, {
    method: 'POST',
    path: '/api/invitations',
    as,
    body: { organisationId: organisation.id, email, role },
  });
  expect(r.status).toBe(201);
  // The message as captured: the newest one to that address.
  const mail = (await listMail(email))[0]!;
  return { id: r.body.invitation?.id ?? r.body.id, token: tokenIn(mail.text)! };
}

describe('development mail viewer', () => {
  const flag = process.env.MAIL_VIEWER;
  afterEach(() => {
    if (flag === undefined) delete process.env.MAIL_VIEWER;
    else process.env.MAIL_VIEWER = flag;
  });

  it('shows an organisation only the mail it sent, even to a person another organisation invited too', async () => {
    await clearMail();
    const { organisation: a, user: ownerA } = await createMember('owner');
    const { organisation: b, user: ownerB } = await createMember('owner');
    const email = `both-${Date.now()}@example.test`;
    const fromA = await invite(ownerA, a, email, 'staff');
    const fromB = await invite(ownerB, b, email, 'keeper');
    expect(fromA.token).not.toBe(fromB.token);

    const seenByB = (await organisationMail(b.id))!;
    expect(seenByB.map((m) => tokenIn(m.text))).toEqual([fromB.token]);
    expect(JSON.stringify(seenByB)).not.toContain(fromA.token);
    const seenByA = (await organisationMail(a.id))!;
    expect(seenByA.map((m) => tokenIn(m.text))).toEqual([fromA.token]);
    expect(seenByA[0]).toMatchObject({ kind: 'invitation', organisationId: a.id });
  });

  it('shows a lamp reminder only to the organisation whose lamps it is about', async () => {
    await clearMail();
    const { organisation: a, user: keeperOfA } = await createMember('owner');
    const { organisation: b, user: ownerB } = await createMember('owner');
    // B invites A's keeper: before, that was enough for B to read A's reminders to them.
    await invite(ownerB, b, keeperOfA.email, 'keeper');
    await MailMessage.create({
      kind: 'lamp-reminder',
      toEmail: keeperOfA.email,
      toUserId: keeperOfA.id,
      organisationId: a.id,
      subject: 'Lamp due: Basking tube in Desert vivarium',
      body: 'The basking tube of organisation A is due for a meter reading.',
      dedupeKey: `viewer-test:${a.id}`,
    });
    expect(await deliverQueued()).toMatchObject({ sent: 1, failed: 0 });
    expect((await organisationMail(b.id))!.map((m) => m.kind)).toEqual(['invitation']);
    const seenByA = (await organisationMail(a.id))!;
    expect(seenByA.map((m) => m.subject)).toEqual(['Lamp due: Basking tube in Desert vivarium']);
  });

  it('a withdrawn invitation is no way in: its token is refused and its link is not shown', async () => {
    await clearMail();
    const { organisation: b, user: ownerB } = await createMember('owner');
    const email = `withdrawn-${Date.now()}@example.test`;
    const inv = await invite(ownerB, b, email);
    const row = (await Invitation.findOne({ where: { organisationId: b.id, email } }))!;
    const gone = await send(revoke.DELETE, 'DELETE /api/invitations/[id]', { id: row.id, as: ownerB });
    expect(gone.status).toBeLessThan(300);
    const accepted = await call(accept.POST, {
      method: 'POST',
      path: '/api/invitations/accept',
      body: { token: inv.token, name: 'Mallory', password: 'a long enough password 1' },
    });
    expect(accepted.status).toBe(410);
    expect(accepted.body.error.code).toBe('invitation_revoked');
    const shown = (await organisationMail(b.id))!;
    expect(shown).toHaveLength(1);
    expect(shown[0]!.text).not.toContain(inv.token);
    expect(shown[0]!.text).toContain('[link removed: this invitation is withdrawn]');
  });

  it('an accepted invitation’s link is not shown again, and a second use is refused', async () => {
    await clearMail();
    const { organisation: b, user: ownerB } = await createMember('owner');
    const email = `accepted-${Date.now()}@example.test`;
    const inv = await invite(ownerB, b, email);
    const body = { token: inv.token, name: 'New Person', password: 'a long enough password 1' };
    expect((await call(accept.POST, { method: 'POST', path: '/api/invitations/accept', body })).status).toBe(
      201,
    );
    const again = await call(accept.POST, { method: 'POST', path: '/api/invitations/accept', body });
    expect(again.status).toBe(410);
    const shown = (await organisationMail(b.id))!;
    expect(shown[0]!.text).toContain('[link removed: this invitation is already used]');
  });

  it('is for owners only, and off unless MAIL_VIEWER=1 asks for it', async () => {
    const { shop: org, owner, staff } = await createWorld();
    const { memberships } = await import('@/lib/auth/session-user');
    const asSession = async (u: User) => ({ id: u.id, memberships: await memberships(u.id) });
    expect(can(await asSession(owner), 'read', { kind: 'mail', organisationId: org.id })).toBe(true);
    expect(can(await asSession(staff), 'read', { kind: 'mail', organisationId: org.id })).toBe(false);

    const saved = { NODE_ENV: process.env.NODE_ENV, FAKE_SMTP_HTTP: process.env.FAKE_SMTP_HTTP };
    try {
      // A fake SMTP server configured and a development server are not enough.
      Object.assign(process.env, { NODE_ENV: 'development', FAKE_SMTP_HTTP: 'http://127.0.0.1:2581' });
      delete process.env.MAIL_VIEWER;
      expect(mailViewerEnabled()).toBe(false);
      process.env.MAIL_VIEWER = 'yes';
      expect(mailViewerEnabled()).toBe(false);
      process.env.MAIL_VIEWER = '1';
      expect(mailViewerEnabled()).toBe(true);
    } finally {
      Object.assign(process.env, saved);
    }
  });
});
