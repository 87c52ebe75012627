import { beforeAll, describe, expect, it } from 'vitest';
import * as accept from '@/app/api/invitations/accept/route';
import * as revoke from '@/app/api/invitations/[id]/route';
import * as invitations from '@/app/api/invitations/route';
import * as keepers from '@/app/api/keepers/route';
import { authorizeCredentials } from '@/lib/auth';
import { hashToken } from '@/lib/auth/invitations';
import { Invitation, Membership, type User } from '@/models';
import { createUser, withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, send } from './http';

withTestDatabase();

/** Polls the fake SMTP server's JSON API for the newest message to `to`. */
async function mailTo(to: string, timeoutMs = 10_000) {
  const api = process.env.FAKE_SMTP_HTTP ?? 'http://127.0.0.1:2580';
  const until = Date.now() + timeoutMs;
  for (;;) {
    const res = await fetch(new URL('/messages', api));
    const all = (await res.json()) as { to: string[]; subject: string; text: string }[];
    const found = all.find((m) => m.to.some((t) => t.toLowerCase().includes(to.toLowerCase())));
    if (found) return found;
    if (Date.now() > until) throw new Error(`no mail to ${to}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const tokenFrom = (text: string) => {
  const m = /\/invite\/([A-Za-z0-9_-]{43})/.exec(text);
  if (!m?.[1]) throw new Error(`no invitation link in: ${text}`);
  return m[1];
};

let run = 0;
beforeAll(() => {
  run = Date.now();
});

const world = freshWorld();

const invite = (as: User, email: string, role: string) =>
  send(invitations.POST, 'POST /api/invitations', {
    as,
    body: { organisationId: world.shop.id, email, role },
  });

describe('invitations', () => {
  it('e-mails a link through SMTP that a new person accepts by choosing a password', async () => {
    const email = `new.staff.${run}@example.com`;
    const r = await invite(world.owner, email, 'staff');
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ email, role: 'staff', state: 'pending' });
    expect(r.text).not.toMatch(/token/i);

    const mail = await mailTo(email);
    expect(mail.subject).toContain(world.shop.name);
    expect(mail.text).toContain(`${process.env.APP_URL ?? 'http://localhost:3000'}/invite/`);
    const token = tokenFrom(mail.text);
    // Only the hash is stored.
    const stored = await Invitation.findByPk(r.body.id);
    expect(stored?.tokenHash).toBe(hashToken(token));
    expect(stored?.tokenHash).not.toContain(token);

    const weak = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token, name: 'New Staff', password: 'short' },
    });
    expect(weak.status).toBe(400);
    expect(weak.body.error.field).toBe('password');

    const ok = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token, name: 'New Staff', password: 'a-good-long-password' },
    });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ organisationId: world.shop.id, role: 'staff', alreadyMember: false });
    const user = await authorizeCredentials({ email, password: 'a-good-long-password' }, {});
    const membership = await Membership.findOne({
      where: { organisationId: world.shop.id, userId: Number(user.id) },
    });
    expect(membership?.role).toBe('staff');

    const again = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token, name: 'Someone Else', password: 'another-long-password' },
    });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation_accepted');
  });

  it('lets a signed-in person with the invited address join with their account', async () => {
    const { user: existing } = await createUser({ email: `existing.${run}@example.com` });
    expect((await invite(world.staff, existing.email, 'keeper')).status).toBe(201);
    const token = tokenFrom((await mailTo(existing.email)).text);
    // Signed out, the existing account is asked to sign in first.
    const signedOut = await send(accept.POST, 'POST /api/invitations/accept', { body: { token } });
    expect(signedOut.status).toBe(409);
    expect(signedOut.body.error.code).toBe('account_exists');
    // Someone else's account cannot take it.
    const wrong = await send(accept.POST, 'POST /api/invitations/accept', {
      as: world.keeper,
      body: { token },
    });
    expect(wrong.status).toBe(403);
    const ok = await send(accept.POST, 'POST /api/invitations/accept', { as: existing, body: { token } });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ role: 'keeper', alreadyMember: false });
  });

  it('staff may invite keepers but not staff or owners; keepers invite nobody', async () => {
    expect((await invite(world.staff, `k.${run}@example.com`, 'keeper')).status).toBe(201);
    expect((await invite(world.staff, `s.${run}@example.com`, 'staff')).status).toBe(403);
    expect((await invite(world.staff, `o.${run}@example.com`, 'owner')).status).toBe(403);
    expect((await invite(world.keeper, `k2.${run}@example.com`, 'keeper')).status).toBe(404);
    const viaKeepers = await send(keepers.POST, 'POST /api/keepers', {
      as: world.staff,
      body: { organisationId: world.shop.id, email: `k3.${run}@example.com` },
    });
    expect(viaKeepers.status).toBe(201);
    expect(viaKeepers.body.role).toBe('keeper');
  });

  it('refuses to invite someone who is already a member, and bad input names the field', async () => {
    const dup = await invite(world.owner, world.keeper.email, 'staff');
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('already_member');
    const bad = await invite(world.owner, 'not-an-email', 'staff');
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('email');
    const badRole = await invite(world.owner, `x.${run}@example.com`, 'boss');
    expect(badRole.body.error.field).toBe('role');
  });

  it('lists pending invitations and revokes one', async () => {
    const r = await invite(world.owner, `pending.${run}@example.com`, 'staff');
    const token = tokenFrom((await mailTo(`pending.${run}@example.com`)).text);
    const listed = await call(invitations.GET, {
      path: `/api/invitations?organisationId=${world.shop.id}`,
      as: world.staff,
    });
    expect(listed.body.items.map((i: { id: number }) => i.id)).toEqual([r.body.id]);
    expect(
      (
        await call(invitations.GET, {
          path: `/api/invitations?organisationId=${world.shop.id}`,
          as: world.keeper,
        })
      ).status,
    ).toBe(404);
    // Staff may not withdraw an invitation for staff; the owner may.
    const withdraw = (as: User) => send(revoke.DELETE, 'DELETE /api/invitations/[id]', { id: r.body.id, as });
    expect((await withdraw(world.staff)).status).toBe(403);
    expect((await withdraw(world.owner)).status).toBe(200);
    const late = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token, name: 'Late', password: 'a-good-long-password' },
    });
    expect(late.status).toBe(410);
    expect(late.body.error.code).toBe('invitation_revoked');
  });

  it('an expired link is refused', async () => {
    const email = `expired.${run}@example.com`;
    const r = await invite(world.owner, email, 'keeper');
    const token = tokenFrom((await mailTo(email)).text);
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: r.body.id } });
    const late = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token, name: 'Late', password: 'a-good-long-password' },
    });
    expect(late.status).toBe(410);
    expect(late.body.error.code).toBe('invitation_expired');
    const bogus = await send(accept.POST, 'POST /api/invitations/accept', {
      body: { token: 'A'.repeat(43), name: 'X', password: 'a-good-long-password' },
    });
    expect(bogus.status).toBe(404);
  });
});
