// The world the access suite attacks: organisation A (an owner, staff, keeper 1 who owns an enclosure
// with everything in it, keeper 2 who owns nothing of it) and organisation B (its owner, the outsider).
// Everything of A is made through the real route handlers, as A's owner. Names carry markers so a reply
// that leaks them can be caught.
import { PNG } from 'pngjs';
import { QueryTypes } from 'sequelize';
import * as counterTests from '@/app/api/counter/tests/route';
import * as customers from '@/app/api/customers/route';
import * as enclosureDesigns from '@/app/api/enclosures/[id]/designs/route';
import * as enclosureLamps from '@/app/api/enclosures/[id]/lamps/route';
import * as invitations from '@/app/api/invitations/route';
import * as lampTypes from '@/app/api/lamp-types/route';
import * as lampReadings from '@/app/api/lamps/[id]/readings/route';
import * as species from '@/app/api/species/route';
import * as uploads from '@/app/api/uploads/route';
import * as variantShares from '@/app/api/variants/[id]/shares/route';
import { User, Variant } from '@/models';
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';
import { call, sessionCookie } from '../api/http';
import { LAMP_TYPE_BODY, READING_BODY, SPECIES_BODY } from './valid-bodies';
import {
  addMember,
  createEnclosure,
  createUser,
  resetDatabase,
  tablesInDeleteOrder,
  testDb,
} from '../helpers/db';
import { createWorld } from '../helpers/world';
import { loadRoutes, type RouteEntry } from './route-modules';

export const MARK = {
  enclosure: 'Zz-enclosure-of-keeper-one',
  design: 'Zz-design-of-keeper-one',
  variant: 'Zz-variant-of-keeper-one',
  lamp: 'Zz-lamp-of-keeper-one',
  reading: 'Zz-reading-of-keeper-one',
  keeperName: 'Zz Keeper One',
  invitee: 'zz.invitee@example.com',
  species: 'Zz shop skink',
  lampType: 'Zz shop tube',
  upload: 'zz-backdrop.png',
  customer: 'Zz Counter Customer',
  counterLamp: 'Zz-counter-lamp-of-the-customer',
} as const;

export type World = {
  orgA: number;
  orgB: number;
  ownerA: number;
  staffA: number;
  keeper1: number;
  keeper2: number;
  ownerB: number;
  enclosure: number;
  design: number;
  variant: number;
  share: number;
  species: number;
  lampType: number;
  lamp: number;
  reading: number;
  invitation: number;
  upload: number;
  customer: number;
  counterLamp: number;
};

/** A cookie for the user's current session version (a bumped version would refuse an older one). */
export async function cookieOf(userId: number): Promise<string> {
  return sessionCookie((await User.findByPk(userId))!);
}

/** A small real PNG (the upload route checks the content, not the header). */
export function tinyPng(): Buffer {
  const png = new PNG({ width: 4, height: 4 });
  png.data.fill(120);
  return PNG.sync.write(png);
}

function must(r: { status: number; text: string }, what: string) {
  if (r.status >= 300) throw new Error(`world: ${what} → ${r.status} ${r.text.slice(0, 300)}`);
}

export async function buildWorld(): Promise<World> {
  const {
    shop: a,
    owner: ownerA,
    staff: staffA,
    keeper: keeper1,
    otherOrg: b,
    outsider: ownerB,
  } = await createWorld({ names: { keeper: MARK.keeperName } });
  const keeper2 = (await createUser()).user;
  await addMember(a, keeper2, 'keeper');
  const enclosure = await createEnclosure(a, keeper1, { name: MARK.enclosure });
  const as = await cookieOf(ownerA.id);

  const design = await call(enclosureDesigns.POST, {
    method: 'POST',
    path: `/api/enclosures/${enclosure.id}/designs`,
    params: { id: enclosure.id },
    cookie: as,
    body: { name: MARK.design, variantName: MARK.variant, design: EXAMPLE_DESIGN },
  });
  must(design, 'design');
  const variantId: number = design.body.variant.id;
  const share = await call(variantShares.POST, {
    method: 'POST',
    path: `/api/variants/${variantId}/shares`,
    params: { id: variantId },
    cookie: as,
    body: { expiresInDays: 30 },
  });
  must(share, 'share');
  const sheet = await call(species.POST, {
    method: 'POST',
    path: '/api/species',
    cookie: as,
    body: SPECIES_BODY(a.id, MARK.species),
  });
  must(sheet, 'species');
  const type = await call(lampTypes.POST, {
    method: 'POST',
    path: '/api/lamp-types',
    cookie: as,
    body: LAMP_TYPE_BODY(a.id, MARK.lampType),
  });
  must(type, 'lamp type');
  const lampTypeId = type.body.lampType?.id ?? type.body.id;
  const lamp = await call(enclosureLamps.POST, {
    method: 'POST',
    path: `/api/enclosures/${enclosure.id}/lamps`,
    params: { id: enclosure.id },
    cookie: as,
    body: { lampTypeId, label: MARK.lamp, firstUsedOn: '2025-01-01', hoursPerDay: 12 },
  });
  must(lamp, 'lamp');
  const lampId = lamp.body.lamp?.id ?? lamp.body.id;
  const reading = await call(lampReadings.POST, {
    method: 'POST',
    path: `/api/lamps/${lampId}/readings`,
    params: { id: lampId },
    cookie: as,
    body: READING_BODY(MARK.reading),
  });
  must(reading, 'reading');
  const invitation = await call(invitations.POST, {
    method: 'POST',
    path: '/api/invitations',
    cookie: as,
    body: { organisationId: a.id, email: MARK.invitee, role: 'keeper' },
  });
  must(invitation, 'invitation');
  const upload = await uploadPng(as, enclosure.id);
  must(upload, 'upload');
  const customer = await call(customers.POST, {
    method: 'POST',
    path: '/api/customers',
    cookie: as,
    body: {
      organisationId: a.id,
      name: MARK.customer,
      email: 'zz.customer@example.com',
      reminderConsent: true,
    },
  });
  must(customer, 'customer');
  const counterLamp = await call(counterTests.POST, {
    method: 'POST',
    path: '/api/counter/tests',
    cookie: as,
    body: {
      organisationId: a.id,
      lamp: { lampTypeId, ageMonths: 5, hoursPerDay: 12, label: MARK.counterLamp },
      reading: { distance: 30, value: 40, unit: 'uvb', through: 'nothing', warmedUp: 'yes' },
      customer: { kind: 'existing', id: customer.body.customer.id },
    },
  });
  must(counterLamp, 'counter lamp');

  return {
    orgA: a.id,
    orgB: b.id,
    ownerA: ownerA.id,
    staffA: staffA.id,
    keeper1: keeper1.id,
    keeper2: keeper2.id,
    ownerB: ownerB.id,
    enclosure: enclosure.id,
    design: design.body.design.id,
    variant: variantId,
    share: share.body.share.id,
    species: sheet.body.species?.id ?? sheet.body.id,
    lampType: lampTypeId,
    lamp: lampId,
    reading: reading.body.reading?.id ?? reading.body.id,
    invitation: invitation.body.invitation?.id ?? invitation.body.id,
    upload: upload.body.upload.id,
    customer: customer.body.customer.id,
    counterLamp: counterLamp.body.lampId,
  };
}

/**
 * What a file that sends requests to every route starts from: an emptied database holding this world,
 * and every route handler found from the route files (it takes a while: give the hook two minutes).
 */
export async function worldAndRoutes(): Promise<{ world: World; routes: RouteEntry[] }> {
  await resetDatabase();
  return { world: await buildWorld(), routes: await loadRoutes() };
}

export async function uploadPng(cookie: string, enclosureId: number) {
  const path = `/api/uploads?kind=backdrop&enclosureId=${enclosureId}&name=${MARK.upload}`;
  const headers = new Headers({ origin: 'http://localhost:3000', cookie, 'content-type': 'image/png' });
  const res = await uploads.POST(
    new Request(`http://localhost:3000${path}`, { method: 'POST', headers, body: new Uint8Array(tinyPng()) }),
    {
      params: Promise.resolve({}),
    },
  );
  const text = await res.text();
  return { status: res.status, text, body: JSON.parse(text) };
}

/** A fingerprint of every table's content: equal before and after means nothing was written. */
export async function fingerprint(): Promise<string> {
  const sequelize = testDb();
  const tables = await tablesInDeleteOrder(sequelize);
  const rows = await sequelize.query<{ Table: string; Checksum: number | null }>(
    `CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')}`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => `${r.Table}:${r.Checksum}`).join(' ');
}

export const currentVersion = async (variantId: number) => (await Variant.findByPk(variantId))!.version;

/**
 * The routes about one thing named by the `[id]` in their address, by the address they start with: which
 * thing of the world it names (`idFor`), and the table whose row says which organisation owns it, for
 * the rows that carry one (`outsiderOwns`).
 */
export const ID_ROUTES: { prefix: string; thing: keyof World; table?: string }[] = [
  { prefix: '/api/enclosures/[id]', thing: 'enclosure', table: 'enclosures' },
  { prefix: '/api/designs/[id]', thing: 'design' },
  { prefix: '/api/variants/[id]', thing: 'variant' },
  { prefix: '/api/shares/[id]', thing: 'share' },
  { prefix: '/api/lamps/[id]', thing: 'lamp' },
  { prefix: '/api/readings/[id]', thing: 'reading' },
  { prefix: '/api/species/[id]', thing: 'species', table: 'species_sheets' },
  { prefix: '/api/lamp-types/[id]', thing: 'lampType', table: 'lamp_types' },
  { prefix: '/api/organisations/[id]', thing: 'orgA', table: 'organisations' },
  { prefix: '/api/invitations/[id]', thing: 'invitation', table: 'invitations' },
  { prefix: '/api/uploads/[id]', thing: 'upload', table: 'uploads' },
  { prefix: '/api/customers/[id]', thing: 'customer', table: 'customers' },
  { prefix: '/api/counter/lamps/[id]', thing: 'counterLamp', table: 'counter_lamps' },
];

/** The organisation that owns the row an id names under a route (none: a route not listed, or no table). */
function owningOrganisationSql(pattern: string): string | null {
  const table = ID_ROUTES.find((r) => pattern.startsWith(r.prefix))?.table;
  if (!table) return null;
  // An organisation is its own owner.
  const column = table === 'organisations' ? 'id' : 'organisation_id';
  return `SELECT ${column} AS org FROM ${table} WHERE id = :id`;
}

/**
 * Whether `id` (as the route's schema reads it: a number, "0x10" and " 7" included) names something of
 * an organisation the outsider owns (the suite's outsider makes organisations of their own as it goes):
 * reaching it is theirs to do, not a forgery.
 */
export async function outsiderOwns(pattern: string, id: string, outsiderId: number): Promise<boolean> {
  const n = Number(id.trim());
  if (!Number.isInteger(n) || n <= 0 || n > 4_294_967_295) return false;
  const sql = owningOrganisationSql(pattern);
  if (!sql) return false;
  const rows = await testDb().query<{ org: number }>(sql, {
    replacements: { id: n },
    type: QueryTypes.SELECT,
  });
  const org = rows[0]?.org;
  if (org === undefined) return false;
  const member = await testDb().query(
    "SELECT 1 FROM memberships WHERE organisation_id = :org AND user_id = :user AND role = 'owner'",
    { replacements: { org, user: outsiderId }, type: QueryTypes.SELECT },
  );
  return member.length > 0;
}
