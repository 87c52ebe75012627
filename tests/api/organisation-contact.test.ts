import { beforeEach, describe, expect, it } from 'vitest';
import * as orgRoute from '@/app/api/organisations/[id]/route';
import * as slip from '@/app/api/counter/lamps/[id]/slip/route';
import * as tests from '@/app/api/counter/tests/route';
import { settleMail } from '@/lib/auth/mail-soon';
import { runCounterReminders } from '@/lib/counter/reminders';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import type { Mail } from '@/lib/mail';
import { CounterReading, MailMessage, Organisation, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, send } from './http';
import { t5Of, testedLamp as testedLampOf } from './counter.helpers';
import { call as callRaw, pdfDrawnText } from './variants.helpers';

// How customers reach the shop: the owner sets it in the organisation settings; the test slip (e-mail and
// PDF) and the re-test reminder show it when set, and say nothing of it when not.
withTestDatabase();

let tubeId: number;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  tubeId = (await t5Of(world.shop.id)).id;
});

const patch = (as: User | null, body: unknown, id = world.shop.id) =>
  call(orgRoute.PATCH, { method: 'PATCH', path: `/api/organisations/${id}`, params: { id }, as, body });

const CONTACT = {
  contactAddress: '12 Fern Row, Hollowby',
  contactPhone: '01234 567890',
  contactEmail: 'Counter@Example.com',
};
const LINE = '12 Fern Row, Hollowby · 01234 567890 · counter@example.com';

const testedLamp = () =>
  testedLampOf(world.staff, world.shop.id, tubeId, {
    customer: { email: 'jules@example.com', reminderConsent: true },
  });

async function slipMail(lampId: number) {
  const sent = await send(slip.POST, 'POST /api/counter/lamps/[id]/slip', { id: lampId, as: world.staff });
  expect(sent.status).toBe(201);
  await settleMail();
  return (await MailMessage.findOne({ where: { kind: 'counter-slip' }, order: [['id', 'DESC']] }))!.body;
}

async function slipPdfText(lampId: number) {
  const r = await callRaw(slip.GET, {
    path: `/api/counter/lamps/${lampId}/slip`,
    params: { id: lampId },
    user: world.staff,
  });
  expect(r.status).toBe(200);
  return pdfDrawnText(new Uint8Array(await r.res.arrayBuffer())).replace(/\s+/g, ' ');
}

describe('the shop’s contact', () => {
  it('is set by the owner, each field optional, and an empty field clears it', async () => {
    const r = await patch(world.owner, CONTACT);
    expect(r.status).toBe(200);
    expect(r.body.contact).toEqual({ ...CONTACT, contactEmail: 'counter@example.com', line: LINE });
    const stored = (await Organisation.findByPk(world.shop.id))!;
    expect([stored.contactAddress, stored.contactPhone, stored.contactEmail]).toEqual([
      '12 Fern Row, Hollowby',
      '01234 567890',
      'counter@example.com',
    ]);
    // Only what the patch names changes; empty text means none.
    const cleared = await patch(world.owner, { contactPhone: '' });
    expect(cleared.status).toBe(200);
    expect(cleared.body.contact.contactPhone).toBeNull();
    expect(cleared.body.contact.contactAddress).toBe('12 Fern Row, Hollowby');
    expect(cleared.body.contact.line).toBe('12 Fern Row, Hollowby · counter@example.com');
  });

  it('refuses a malformed field, naming it, and changes nothing', async () => {
    await patch(world.owner, CONTACT);
    for (const [field, value] of [
      ['contactEmail', 'not an address'],
      ['contactPhone', 'call us'],
      ['contactAddress', 'two\nlines'],
      ['contactAddress', 'x'.repeat(201)],
    ] as const) {
      const r = await patch(world.owner, { [field]: value });
      expect(r.status, `${field}: ${value}`).toBe(400);
      expect(r.body.error.field).toBe(field);
    }
    expect((await patch(world.owner, { website: 'x' })).status).toBe(400);
    expect((await patch(world.owner, {})).status).toBe(400);
    expect((await Organisation.findByPk(world.shop.id))!.contactPhone).toBe('01234 567890');
  });

  it('is the owner’s alone: staff, a keeper, another organisation and nobody are refused', async () => {
    for (const who of [world.staff, world.keeper, world.outsider, null]) {
      const r = await patch(who, { contactPhone: '09876 543210' });
      expect([401, 403, 404], String(who?.id)).toContain(r.status);
    }
    expect((await Organisation.findByPk(world.shop.id))!.contactPhone).toBeNull();
  });

  it('shows on the slip’s e-mail and PDF when set, and not at all when not', async () => {
    const { lampId } = await testedLamp();
    const without = await slipMail(lampId);
    expect(without).toContain(world.shop.name);
    // The signature is the shop's name alone, then the link that stops e-mails.
    expect(without).toContain(`${world.shop.name}\n\nTo stop e-mails`);
    expect(await slipPdfText(lampId)).not.toContain('Fern Row');

    await patch(world.owner, CONTACT);
    // A second reading: the slip goes once per reading.
    await CounterReading.update({ takenAt: new Date(Date.now() - 86_400_000) }, { where: {} });
    await call(tests.POST, {
      method: 'POST',
      path: '/api/counter/tests',
      as: world.staff,
      body: {
        organisationId: world.shop.id,
        counterLampId: lampId,
        reading: { distance: 30, value: 29, unit: 'uvb', through: 'nothing', warmedUp: 'yes' },
      },
    });
    const withContact = await slipMail(lampId);
    expect(withContact).toContain(`${world.shop.name}\n${LINE}`);
    const pdf = await slipPdfText(lampId);
    expect(pdf).toContain('12 Fern Row, Hollowby');
    expect(pdf).toContain('01234 567890');
    expect(pdf).toContain('counter@example.com');
  });

  it('shows in the re-test reminder when set', async () => {
    const { lampId } = await testedLamp();
    const today = todayIso();
    await CounterReading.update({ testAgainOn: addDays(today, 2) }, { where: { counterLampId: lampId } });
    await patch(world.owner, CONTACT);
    const sent: Mail[] = [];
    const r = await runCounterReminders({ today, send: async (m) => void sent.push(m) });
    expect(r?.outcome).toBe('succeeded');
    const reminder = sent.find((m) => m.tag?.kind === 'counter-reminder');
    expect(reminder?.text).toContain(`${world.shop.name}\n${LINE}`);
  });
});
