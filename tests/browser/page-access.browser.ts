// The signed-in pages check access themselves, as the route handlers do: another organisation's owner
// and a keeper of the same shop who does not own the enclosure open each page of the shop's enclosure
// (its lamps, lamp log, designs, studio) and the catalogue editors, and the page and its payload say
// nothing of the thing (its name, the animal's name, the lamp's label; for the other organisation also
// the catalogue entries). The enclosure's own keeper, the control, sees it.
// Every dynamic signed-in page (found from the app folder) answers HTTP 404 — not a 200 page that says
// "Not found" — for a missing id and for another organisation's id, with the same content for both; a
// page that may answer 404 must not sit below a loading boundary, which would start the response first.
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_HOUSEHOLD, DEMO_PASSWORDS, DEMO_SHOP, demoSignIn } from '@/lib/demo/scenario';
import {
  CounterLamp,
  Customer,
  Design,
  Enclosure,
  Lamp,
  LampType,
  Organisation,
  SpeciesSheet,
  User,
  Variant,
} from '@/models';
import { BASE_URL, signInCookie } from './harness';
import { pageRoutes } from './page-routes';

const ENCLOSURE = 'Desert vivarium';
const MISSING_ID = 999_999_999;

/** A design of the enclosure, made through the API by its keeper (the demo's enclosure has none). */
async function newDesign(enclosureId: number, cookie: string): Promise<Design> {
  const res = await fetch(`${BASE_URL}/api/enclosures/${enclosureId}/designs`, {
    method: 'POST',
    headers: { cookie, origin: BASE_URL, 'content-type': 'application/json' },
    body: JSON.stringify({ name: 'Page access check' }),
  });
  const body = (await res.json()) as { design?: { id: number } };
  if (res.status !== 201 || !body.design) throw new Error(`creating a design answered ${res.status}`);
  return (await Design.findByPk(body.design.id))!;
}

async function shopThings() {
  const shop = (await Organisation.findOne({ where: { name: DEMO_SHOP.name } }))!;
  const enclosure = (await Enclosure.findOne({ where: { organisationId: shop.id, name: ENCLOSURE } }))!;
  const owner = (await User.findByPk(enclosure.keeperId))!;
  const design =
    (await Design.findOne({ where: { enclosureId: enclosure.id } })) ??
    (await newDesign(enclosure.id, await signInCookie(owner.email, DEMO_PASSWORDS.keeper)));
  const variant = (await Variant.findOne({ where: { designId: design.id } }))!;
  const lamp = await Lamp.findOne({ where: { enclosureId: enclosure.id } });
  const species = (await SpeciesSheet.findOne({ where: { organisationId: shop.id } }))!;
  const lampType = (await LampType.findOne({ where: { organisationId: shop.id } }))!;
  // One of the shop's customers (personal data: owners and staff only), made here when the demo has none.
  const customer =
    (await Customer.findOne({ where: { organisationId: shop.id } })) ??
    (await Customer.create({ organisationId: shop.id, name: 'Page Access Customer', createdById: null }));
  // And a lamp tested at the counter for them.
  const counterLamp =
    (await CounterLamp.findOne({ where: { organisationId: shop.id } })) ??
    (await CounterLamp.create({
      organisationId: shop.id,
      customerId: customer.id,
      lampTypeId: lampType.id,
      label: 'Page access counter lamp',
      firstUsedOn: '2025-01-01',
      hoursPerDay: 12,
      createdById: null,
    }));
  const pages = [
    `/enclosures/${enclosure.id}`,
    `/enclosures/${enclosure.id}/lamps`,
    `/designs/${design.id}`,
    `/studio/${variant.id}`,
    ...(lamp ? [`/lamp-log/${lamp.id}`] : []),
    `/species/${species.id}/edit`,
    `/lamp-catalogue/${lampType.id}/edit`,
    `/customers/${customer.id}`,
    `/customers/${customer.id}/edit`,
    `/counter/lamps/${counterLamp.id}`,
  ];
  const ofTheEnclosure = [ENCLOSURE, enclosure.animalName, lamp?.label, customer.name].filter(
    Boolean,
  ) as string[];
  // The catalogue is the organisation's: its members may read it, another organisation may not.
  const ofTheShop = [...ofTheEnclosure, species.commonName, lampType.name];
  // The id of one of the shop's things for each dynamic route's first segment.
  const idOf: Record<string, number | undefined> = {
    enclosures: enclosure.id,
    designs: design.id,
    studio: variant.id,
    'lamp-log': lamp?.id,
    species: species.id,
    'lamp-catalogue': lampType.id,
    customers: customer.id,
    counter: counterLamp.id,
  };
  return { owner, pages, ofTheEnclosure, ofTheShop, idOf };
}

/** The signed-in app's dynamic page routes, from the page files: `/enclosures/[id]/lamps` and so on. */
function dynamicSignedInRoutes(): string[] {
  return pageRoutes(path.resolve(import.meta.dirname, '..', '..', 'app', '(app)')).filter((route) =>
    /\[[^\]]+\]/.test(route),
  );
}

const fill = (route: string, id: number | string) => route.replace(/\[[^\]]+\]/g, String(id));

async function page(path: string, cookie: string) {
  const res = await fetch(`${BASE_URL}${path}`, { headers: { cookie }, redirect: 'manual' });
  return { status: res.status, html: await res.text() };
}

/** What a person reads: the title and the text of <main>, without markup, scripts and per-request nonces. */
function readable(html: string): string {
  const title = /<title>([^<]*)<\/title>/.exec(html)?.[1] ?? '';
  const main = /<main\b[^>]*>([\s\S]*?)<\/main>/.exec(html)?.[1] ?? '';
  const text = main
    .replace(/<script\b[\s\S]*?<\/script>/g, '')
    .replace(/<[^>]+>/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  return `${title} | ${text}`;
}

describe('pages check access themselves', () => {
  it('another organisation and another keeper learn nothing of the enclosure', async () => {
    const { pages, ofTheEnclosure, ofTheShop, owner } = await shopThings();
    console.info(`page-access: ${pages.join(', ')}`);
    expect(pages.length).toBeGreaterThanOrEqual(7);
    const outsider = await signInCookie(demoSignIn('owner', DEMO_HOUSEHOLD.name).email, DEMO_PASSWORDS.owner);
    const otherKeeperPerson = DEMO_SHOP.people.find((p) => p.role === 'keeper' && p.email !== owner.email)!;
    const otherKeeper = await signInCookie(otherKeeperPerson.email, DEMO_PASSWORDS.keeper);
    const wrong: string[] = [];
    for (const [who, cookie, secrets] of [
      ['outsider', outsider, ofTheShop],
      ['other keeper', otherKeeper, ofTheEnclosure],
    ] as const) {
      for (const path of pages) {
        const r = await page(path, cookie);
        // Signed in (not sent to sign-in), answered, and nothing of the thing in the page or its payload:
        // the outsider gets 404 everywhere; the other keeper may read the shop's catalogue.
        const expected = who === 'outsider' ? [404] : [200, 404];
        if (!expected.includes(r.status)) wrong.push(`${who} ${path} → ${r.status}`);
        for (const s of secrets) if (r.html.includes(s)) wrong.push(`${who} ${path} shows "${s}"`);
      }
    }
    expect(wrong).toEqual([]);

    // The control: the enclosure's own keeper sees its page.
    const keeper = await signInCookie(owner.email, DEMO_PASSWORDS.keeper);
    const own = await page(pages[0]!, keeper);
    expect(own.status).toBe(200);
    expect(own.html).toContain(ENCLOSURE);
  });

  it('every dynamic signed-in page answers 404 for a missing id, the same as for a foreign one', async () => {
    const routes = dynamicSignedInRoutes();
    console.info(`page-access 404: ${routes.join(', ')}`);
    expect(routes).toEqual(expect.arrayContaining(['/enclosures/[id]', '/studio/[variantId]']));
    expect(routes.length).toBeGreaterThanOrEqual(9);
    const { idOf } = await shopThings();
    const outsider = await signInCookie(demoSignIn('owner', DEMO_HOUSEHOLD.name).email, DEMO_PASSWORDS.owner);
    const wrong: string[] = [];
    for (const route of routes) {
      const foreignId = idOf[route.split('/')[1]!];
      if (foreignId === undefined) {
        wrong.push(`${route}: no foreign id known for it (add one to shopThings)`);
        continue;
      }
      const missing = await page(fill(route, MISSING_ID), outsider);
      const foreign = await page(fill(route, foreignId), outsider);
      const notANumber = await page(fill(route, 'x'), outsider);
      for (const [what, r] of [
        ['missing', missing],
        ['foreign', foreign],
        ['not a number', notANumber],
      ] as const) {
        if (r.status !== 404) wrong.push(`${route} (${what} id) → ${r.status}`);
        if (!r.html.includes('Not found')) wrong.push(`${route} (${what} id) does not say "Not found"`);
        const title = /<title>([^<]*)<\/title>/.exec(r.html)?.[1];
        if (title !== 'Not found · Baskwell') wrong.push(`${route} (${what} id) is titled "${title}"`);
      }
      if (readable(missing.html) !== readable(foreign.html))
        wrong.push(
          `${route}: a foreign id reads "${readable(foreign.html)}", a missing one "${readable(missing.html)}"`,
        );
    }
    expect(wrong).toEqual([]);
  });

  it('pages a role may not open answer 404', async () => {
    const keeper = DEMO_SHOP.people.find((p) => p.role === 'keeper')!;
    const cookie = await signInCookie(keeper.email, DEMO_PASSWORDS.keeper);
    const statuses = await Promise.all(
      [
        '/keepers',
        '/members',
        '/customers',
        '/customers/new',
        '/counter',
        '/counter/dashboard',
        '/organisation',
      ].map(async (p) => `${p} → ${(await page(p, cookie)).status}`),
    );
    expect(statuses).toEqual([
      '/keepers → 404',
      '/members → 404',
      '/customers → 404',
      '/customers/new → 404',
      '/counter → 404',
      '/counter/dashboard → 404',
      '/organisation → 404',
    ]);
  });
});
