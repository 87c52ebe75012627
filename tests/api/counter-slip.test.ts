import { beforeEach, describe, expect, it } from 'vitest';
import * as slip from '@/app/api/counter/lamps/[id]/slip/route';
import * as unsubscribe from '@/app/api/unsubscribe/route';
import UnsubscribePage from '@/app/(auth)/unsubscribe/page';
import { renderToStaticMarkup } from 'react-dom/server';
import { settleMail } from '@/lib/auth/mail-soon';
import { PDFDocument } from 'pdf-lib';
import { COUNTER_CAUTIONS } from '@/lib/counter/assess';
import { unsubscribeToken } from '@/lib/customers/unsubscribe-token';
import { Customer, MailMessage, SpeciesSheet, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call } from './http';
import { t5Of, testedLamp as testedLampOf } from './counter.helpers';
import { call as callRaw, pdfDrawnText } from './variants.helpers';

withTestDatabase();

let tubeId: number;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  tubeId = (await t5Of(world.shop.id)).id;
});

const testedLamp = (customer: Record<string, unknown>, home: Record<string, unknown> = {}) =>
  testedLampOf(world.staff, world.shop.id, tubeId, { customer, lamp: home });
const sendSlip = (as: User | null, id: number) =>
  call(slip.POST, { method: 'POST', path: `/api/counter/lamps/${id}/slip`, params: { id }, as });
/** The signed-out page the link lands on, rendered as the server sends it. */
const unsubscribePage = async (token: string | null) =>
  renderToStaticMarkup(
    await UnsubscribePage({ searchParams: Promise.resolve({ token: token ?? undefined }) }),
  );
const openLink = (url: string) => {
  const u = new URL(url);
  return call(unsubscribe.GET, { path: `${u.pathname}${u.search}`, as: null });
};

describe('the test slip and the unsubscribe link', () => {
  it('e-mails the slip once, with the verdict, the cautions and a link that stops e-mails signed out', async () => {
    const { lampId, customerId } = await testedLamp({ email: 'jules@example.com', reminderConsent: true });
    const sent = await sendSlip(world.staff, lampId);
    expect(sent.status).toBe(201);
    await settleMail();
    const message = (await MailMessage.findOne({ where: { kind: 'counter-slip' } }))!;
    expect(message.toEmail).toBe('jules@example.com');
    expect(message.body).toMatch(/Verdict: /);
    expect(message.body).toMatch(/vet/);
    expect(message.body).toContain(world.shop.name);
    // Once per reading.
    expect((await sendSlip(world.staff, lampId)).body).toEqual({ queued: false });
    expect(await MailMessage.count({ where: { kind: 'counter-slip' } })).toBe(1);

    const link = /(http\S+\/api\/unsubscribe\?token=\S+)/.exec(message.body)![1]!;
    const before = (await Customer.findByPk(customerId))!;
    const opened = await openLink(link);
    // The link does its work, then sends the person to the page that says so, with the same token.
    expect(opened.status).toBe(303);
    const landing = opened.res.headers.get('location')!;
    expect(landing).toBe(`/unsubscribe?token=${new URL(link).searchParams.get('token')}`);
    expect(opened.text).toBe('');
    const after = (await Customer.findByPk(customerId))!;
    expect(after.reminderConsentAt).toBeNull();
    expect(after.reminderConsentWithdrawnAt).not.toBeNull();
    // Single-purpose: nothing but the consent changed.
    expect([after.name, after.email, after.phone, after.notes]).toEqual([
      before.name,
      before.email,
      before.phone,
      before.notes,
    ]);
    // The page: the app's look, the shop's name and nothing of the customer.
    const page = await unsubscribePage(new URL(landing, 'http://x').searchParams.get('token'));
    expect(page).toContain('<h1 class="mb-3 text-title">E-mails stopped</h1>');
    expect(page).toContain(`from <strong>${world.shop.name}</strong>`);
    for (const secret of ['jules@example.com', 'Jules', '<script', '<form'])
      expect(page).not.toContain(secret);
    // Opening it again (the link or the page) is harmless; and without consent no slip goes out.
    expect((await openLink(link)).status).toBe(303);
    expect(await unsubscribePage(new URL(landing, 'http://x').searchParams.get('token'))).toContain(
      'E-mails stopped',
    );
    const refused = await sendSlip(world.staff, lampId);
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe('customer.reminderConsent');
    expect(await MailMessage.count({ where: { kind: 'counter-slip' } })).toBe(1);
  });

  it('never sends a slip without consent or an address', async () => {
    const { lampId } = await testedLamp({ email: 'no.consent@example.com', reminderConsent: false });
    const r = await sendSlip(world.staff, lampId);
    expect(r.status).toBe(400);
    expect(await MailMessage.count()).toBe(0);
  });

  it('a forged, altered or other customer’s token does nothing', async () => {
    const a = await testedLamp({ email: 'a@example.com', reminderConsent: true });
    const b = await testedLamp({ email: 'b@example.com', reminderConsent: true });
    const good = unsubscribeToken(a.customerId);
    const altered = `${b.customerId}.${good.split('.')[1]}`;
    for (const token of [altered, `${a.customerId}.${'A'.repeat(43)}`, 'x', '', good.slice(0, -1)]) {
      const r = await call(unsubscribe.GET, {
        path: `/api/unsubscribe?token=${encodeURIComponent(token)}`,
        as: null,
      });
      expect(r.status, token).toBe(404);
      // The page itself answers the app's "not found" to the same tokens, and changes nothing either.
      await expect(unsubscribePage(token), token).rejects.toMatchObject({
        digest: expect.stringContaining('404'),
      });
    }
    expect((await Customer.findByPk(a.customerId))!.reminderConsentAt).not.toBeNull();
    expect((await Customer.findByPk(b.customerId))!.reminderConsentAt).not.toBeNull();
  });

  it('keepers and another organisation cannot send a slip', async () => {
    const { lampId } = await testedLamp({ email: 'c@example.com', reminderConsent: true });
    for (const who of [world.keeper, world.outsider]) expect((await sendSlip(who, lampId)).status).toBe(404);
    expect((await sendSlip(null, lampId)).status).toBe(401);
    expect(await MailMessage.count()).toBe(0);
  });
});

describe('the test slip as a one-page PDF', { timeout: 150_000 }, () => {
  const slipPdf = async (as: User | null, id: number) =>
    callRaw(slip.GET, { path: `/api/counter/lamps/${id}/slip`, params: { id }, user: as });
  const drawn = async (res: Response) => {
    const bytes = new Uint8Array(await res.arrayBuffer());
    const doc = await PDFDocument.load(bytes);
    // The drawn words wrap across lines: one space between any two makes a sentence searchable.
    return { pages: doc.getPageCount(), text: pdfDrawnText(bytes).replace(/\s+/g, ' ') };
  };

  it('has one page with the shop, the verdict and the cautions, and no basking figure without a species', async () => {
    const { lampId } = await testedLamp({ email: null, reminderConsent: false });
    const r = await slipPdf(world.staff, lampId);
    expect(r.status).toBe(200);
    expect(r.res.headers.get('content-type')).toBe('application/pdf');
    expect(r.res.headers.get('content-disposition')).toMatch(
      /^attachment; filename="lamp-test-\d+-\d{4}-\d{2}-\d{2}\.pdf"$/,
    );
    const { pages, text } = await drawn(r.res);
    expect(pages).toBe(1);
    expect(text).toContain(world.shop.name);
    expect(text).toContain('Jules Invented');
    expect(text).toMatch(/(Keep it|Test it again by|Replace it)/);
    expect(text).toContain('Output left');
    // Every standing caution, word for word (the PDF font spells a few marks out, so compare the words).
    const words = (s: string) =>
      s
        .replace(/[^A-Za-z0-9 ]+/g, ' ')
        .replace(/\s+/g, ' ')
        .trim();
    for (const caution of COUNTER_CAUTIONS) expect(words(text)).toContain(words(caution));
    expect(text).not.toMatch(/Basking spot/);
  });

  it('gives the basking spot at home only when the customer named the species and the distance', async () => {
    const sheet = (await SpeciesSheet.findOne({ where: { organisationId: world.shop.id, uvZone: 3 } }))!;
    const { lampId } = await testedLamp(
      { email: null, reminderConsent: false },
      { speciesSheetId: sheet.id, baskingDistance: 30 },
    );
    const { pages, text } = await drawn((await slipPdf(world.staff, lampId)).res);
    expect(pages).toBe(1);
    expect(text).toMatch(/Basking spot at home about (UV Index|\d)/);
  });

  it('keepers, another organisation and nobody get no slip', async () => {
    const { lampId } = await testedLamp({ email: null, reminderConsent: false });
    for (const who of [world.keeper, world.outsider]) expect((await slipPdf(who, lampId)).status).toBe(404);
    expect((await slipPdf(null, lampId)).status).toBe(401);
  });
});
