// One well-formed request per route handler, aimed at organisation A's things (see access-world.ts).
// Well-formed matters: the pipeline parses before it checks access, so a malformed request would be
// refused with a 400 and prove nothing. Each is checked to get past parsing by A's owner (the control).
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';
import { FIXTURE_PASSWORD } from '../helpers/db';
import { currentVersion, ID_ROUTES, tinyPng, type World } from './access-world';
import { LAMP_TYPE_BODY, READING_BODY, SPECIES_BODY } from './valid-bodies';

export type RequestSpec = {
  query?: (w: World) => string;
  body?: (w: World) => unknown | Promise<unknown>;
  /** A non-JSON body (the photo upload). */
  raw?: { contentType: string; bytes: () => Uint8Array<ArrayBuffer> };
};

/** Which thing of the world a path's [id] names, by the route's pattern. */
export function idFor(pattern: string, w: World): Record<string, string> {
  if (pattern.startsWith('/s/[token]')) return { token: 'A'.repeat(43), version: '1', file: 'uvi.svg' };
  const route = ID_ROUTES.find((r) => pattern.startsWith(r.prefix));
  return route ? { id: String(w[route.thing]) } : {};
}

const enclosureBody = (w: World) => ({
  organisationId: w.orgA,
  keeperId: w.keeper1,
  name: 'Second enclosure',
  widthCm: 90,
  heightCm: 45,
  depthCm: 45,
});

/** A retest of A's counter lamp: a well-formed test that would add a reading to it. */
const COUNTER_TEST = (w: World) => ({
  organisationId: w.orgA,
  counterLampId: w.counterLamp,
  reading: { distance: 30, value: 38, unit: 'uvb', through: 'nothing', warmedUp: 'yes' },
});

export const REQUESTS: Record<string, RequestSpec> = {
  'PUT /api/account/password': {
    body: () => ({ currentPassword: FIXTURE_PASSWORD, newPassword: 'a-long-new-password' }),
  },
  'DELETE /api/account/sessions': {},
  'PUT /api/current-organisation': { body: (w) => ({ organisationId: w.orgA }) },
  'POST /api/counter/assess': { body: (w) => COUNTER_TEST(w) },
  'POST /api/counter/tests': { body: (w) => COUNTER_TEST(w) },
  'GET /api/counter/lamps/[id]': {},
  'GET /api/counter/lamps/[id]/slip': {},
  'POST /api/counter/lamps/[id]/slip': {},
  // A well-formed token of A's customer with a made-up signature: 404 for everyone.
  'GET /api/unsubscribe': { query: (w) => `token=${w.customer}.${'A'.repeat(43)}` },
  'GET /api/customers/[id]': {},
  'GET /api/customers/[id]/export': {},
  // A good file that would import (the control shows it), so a refusal comes from the access check.
  'POST /api/counter/import': {
    body: (w) => ({
      organisationId: w.orgA,
      csv: `customer,lamp_type,first_use,date,distance,value,unit\nKit Invented,${w.lampType},2025-01-10,2025-03-01,30,40,uvb\n`,
      commit: true,
    }),
  },
  // Linking A's customer to A's own keeper: well-formed, and the owner (the control) may.
  'PUT /api/customers/[id]/keeper': { body: (w) => ({ keeperId: w.keeper1 }) },
  'DELETE /api/customers/[id]/keeper': {},
  'PATCH /api/customers/[id]': { body: () => ({ notes: 'Asked about a new tube.' }) },
  'DELETE /api/customers/[id]': {},
  // A search that finds the customer, so a leak would show its marker.
  'GET /api/customers': { query: (w) => `organisationId=${w.orgA}&q=counter` },
  'POST /api/customers': { body: (w) => ({ organisationId: w.orgA, name: 'Another customer' }) },
  'GET /api/designs/[id]': {},
  'PATCH /api/designs/[id]': { body: () => ({ name: 'Renamed plan' }) },
  'PUT /api/designs/[id]': { body: () => ({ name: 'Renamed plan' }) },
  'DELETE /api/designs/[id]': {},
  'GET /api/designs/[id]/variants': {},
  'POST /api/designs/[id]/variants': { body: () => ({ name: 'Second variant' }) },
  'GET /api/enclosures/[id]/designs': {},
  'POST /api/enclosures/[id]/designs': { body: () => ({ name: 'Another plan' }) },
  'GET /api/enclosures/[id]/lamps': {},
  'POST /api/enclosures/[id]/lamps': {
    body: (w) => ({
      lampTypeId: w.lampType,
      label: 'Second lamp',
      firstUsedOn: '2025-02-01',
      hoursPerDay: 10,
    }),
  },
  'GET /api/enclosures/[id]': {},
  'PATCH /api/enclosures/[id]': { body: () => ({ name: 'Renamed enclosure' }) },
  'DELETE /api/enclosures/[id]': {},
  // Every list parameter, with a search that finds keeper 1's enclosure, so a leak would show its marker.
  'GET /api/enclosures': {
    query: (w) =>
      `organisationId=${w.orgA}&keeperId=${w.keeper1}&q=enclosure&sort=keeper&dir=asc&offset=0&limit=10`,
  },
  'POST /api/enclosures': { body: enclosureBody },
  'GET /api/health': {},
  'DELETE /api/invitations/[id]': {},
  'POST /api/invitations/accept': { body: () => ({ token: 'B'.repeat(43) }) },
  'GET /api/invitations': { query: (w) => `organisationId=${w.orgA}` },
  'POST /api/invitations': {
    body: (w) => ({ organisationId: w.orgA, email: 'another.keeper@example.com', role: 'keeper' }),
  },
  'GET /api/keepers': { query: (w) => `organisationId=${w.orgA}` },
  'POST /api/keepers': { body: (w) => ({ organisationId: w.orgA, email: 'walk.in@example.com' }) },
  'GET /api/lamp-types/[id]': {},
  'PATCH /api/lamp-types/[id]': { body: () => ({ notes: 'Edited.', watts: 30 }) },
  'DELETE /api/lamp-types/[id]': {},
  // A's type has too few tests for a curve: the owner (the control) gets past access to a 409.
  'GET /api/lamp-types/[id]/population': {},
  'POST /api/lamp-types/[id]/curve-adoption': { body: () => ({}) },
  'DELETE /api/lamp-types/[id]/curve-adoption': {},
  'GET /api/lamp-types': { query: (w) => `organisationId=${w.orgA}` },
  'POST /api/lamp-types': { body: (w) => LAMP_TYPE_BODY(w.orgA, 'Second tube') },
  'GET /api/lamps/[id]/calibration': { query: (w) => `variantId=${w.variant}` },
  'POST /api/lamps/[id]/calibration': { body: (w) => ({ variantId: w.variant }) },
  'GET /api/lamps/[id]/readings': {},
  'POST /api/lamps/[id]/readings': { body: () => READING_BODY('Second reading') },
  'GET /api/lamps/[id]': {},
  'PATCH /api/lamps/[id]': { body: () => ({ label: 'Renamed lamp' }) },
  'DELETE /api/lamps/[id]': {},
  'GET /api/lamps': { query: (w) => `organisationId=${w.orgA}` },
  'PATCH /api/organisations/[id]': { body: () => ({ contactPhone: '01234 567890' }) },
  'GET /api/organisations/[id]/jobs': {},
  'GET /api/organisations/[id]/members': {},
  'PATCH /api/organisations/[id]/members': { body: (w) => ({ userId: w.keeper1, role: 'staff' }) },
  'DELETE /api/organisations/[id]/members': { query: (w) => `userId=${w.keeper1}` },
  'POST /api/organisations': { body: () => ({ name: 'A new organisation' }) },
  'GET /api/readings/[id]': {},
  'PATCH /api/readings/[id]': { body: () => ({ value: 42 }) },
  'DELETE /api/readings/[id]': {},
  'POST /api/readings/import': {
    body: (w) => ({
      enclosureId: w.enclosure,
      csv: 'taken_at,value,unit,distance_cm\n2025-03-01T10:00:00Z,40,uvb,30\n',
    }),
  },
  'DELETE /api/shares/[id]': {},
  'POST /api/password-reset': { body: () => ({ email: 'nobody.here@example.com' }) },
  'POST /api/password-reset/complete': {
    body: () => ({ token: 'C'.repeat(43), password: 'a-long-new-password' }),
  },
  'POST /api/sign-up/confirm': { body: () => ({ token: 'C'.repeat(43) }) },
  'POST /api/sign-up/resend': { body: () => ({ email: 'nobody.here@example.com' }) },
  'POST /api/sign-up': {
    body: () => ({
      name: 'New Person',
      email: `new.person.${Date.now()}.${Math.random().toString(36).slice(2)}@example.com`,
      password: 'a-long-new-password',
      organisationName: 'New household',
    }),
  },
  'GET /api/species/[id]': {},
  'PATCH /api/species/[id]': { body: () => ({ notes: 'Edited.' }) },
  'DELETE /api/species/[id]': {},
  'GET /api/species': { query: (w) => `organisationId=${w.orgA}` },
  'POST /api/species': { body: (w) => SPECIES_BODY(w.orgA, 'Second skink') },
  'GET /api/uploads/[id]': {},
  'DELETE /api/uploads/[id]': {},
  'GET /api/uploads': { query: (w) => `enclosureId=${w.enclosure}` },
  'POST /api/uploads': {
    query: (w) => `kind=backdrop&enclosureId=${w.enclosure}&name=second.png`,
    raw: { contentType: 'image/png', bytes: () => new Uint8Array(tinyPng()) },
  },
  'GET /api/variants/[id]/export': { query: () => 'format=json' },
  'GET /api/variants/[id]': {},
  'PUT /api/variants/[id]': {
    body: async (w) => ({ design: EXAMPLE_DESIGN, baseVersion: await currentVersion(w.variant) }),
  },
  'PATCH /api/variants/[id]': { body: () => ({ name: 'Renamed variant' }) },
  'DELETE /api/variants/[id]': {},
  'GET /api/variants/[id]/shares': {},
  'POST /api/variants/[id]/shares': { body: () => ({ expiresInDays: 7 }) },
  'GET /s/[token]/held': {},
  'GET /s/[token]/report': { query: () => 'format=pdf' },
  'GET /s/[token]/picture/[version]/[file]': {},
};
