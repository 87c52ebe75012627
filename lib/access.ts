import 'server-only';
import type { Includeable } from 'sequelize';
import { parseId } from '@/lib/api/schemas';
import { forbidden, notFound } from '@/lib/errors';
import { can, type Action, type Resource, type SessionUser } from '@/lib/permissions';
import {
  CounterLamp,
  Customer,
  Design,
  Enclosure,
  Invitation,
  Lamp,
  LampType,
  Reading,
  ShareLink,
  SpeciesSheet,
  Upload,
  User,
  Variant,
} from '@/models';

/**
 * "May they": throws unless `can` allows. Someone with no right to even see the thing gets "not found",
 * so the existence of another organisation's (or another keeper's) things is never revealed; someone who
 * may see it but not change it gets "forbidden". Domain errors: the route pipeline answers them 404 and
 * 403, a page with its 404.
 */
export function allow(
  user: SessionUser,
  action: Action,
  resource: Resource,
  what = 'That',
  refusal?: string,
): void {
  if (can(user, action, resource)) return;
  if (action !== 'read' && can(user, 'read', resource)) throw forbidden(refusal);
  throw notFound(what);
}

export type EnclosureWithKeeper = Enclosure & { keeper?: User | null };
export type DesignWithEnclosure = Design & { enclosure: Enclosure };
export type VariantWithOwner = Variant & { design: DesignWithEnclosure };
export type ShareWithOwner = ShareLink & { variant: VariantWithOwner };
export type LampWithEnclosure = Lamp & { enclosure: Enclosure };
export type ReadingWithLamp = Reading & { lamp: LampWithEnclosure };
export type UploadWithEnclosure = Upload & { enclosure: Enclosure | null };

/** The record each kind loads as, with what its ownership is read from. */
type Owned = {
  enclosure: EnclosureWithKeeper;
  design: DesignWithEnclosure;
  variant: VariantWithOwner;
  share: ShareWithOwner;
  lamp: LampWithEnclosure;
  reading: ReadingWithLamp;
  species: SpeciesSheet;
  'lamp-type': LampType;
  /** A lamp type as the shop's measured figures (its curve, adopting one): owners' and staff's. */
  'lamp-type-figures': LampType;
  customer: Customer;
  'counter-lamp': CounterLamp;
  invitation: Invitation;
  upload: UploadWithEnclosure;
};
export type OwnedKind = keyof Owned;
export type OwnedRecord<K extends OwnedKind> = Owned[K];

type KindRule<R> = {
  /** How the thing is named in "… was not found." */
  what: string;
  load: (id: number) => Promise<R | null>;
  /** What `can` needs: always read from the stored row (or the enclosure above it), never from the client. */
  resource: (record: R) => Resource;
  /** What "forbidden" says, when it says more than the usual. */
  refusal?: string;
};

const withEnclosure: Includeable = { model: Enclosure, as: 'enclosure', required: true };
const designWithEnclosure: Includeable = {
  model: Design,
  as: 'design',
  required: true,
  include: [withEnclosure],
};
const variantWithOwner: Includeable = {
  model: Variant,
  as: 'variant',
  required: true,
  include: [designWithEnclosure],
};
const lampWithEnclosure: Includeable = { model: Lamp, as: 'lamp', required: true, include: [withEnclosure] };

/** Things in an enclosure follow its rules: its organisation and its keeper. */
const inEnclosure =
  (kind: 'enclosure' | 'design' | 'variant' | 'share' | 'lamp' | 'reading') =>
  (e: Enclosure): Resource => ({ kind, organisationId: e.organisationId, keeperId: e.keeperId });

/** Things of the whole organisation (its catalogue, customers and figures): their own row names it. */
const ofOrganisation = <R extends { organisationId: number }>(
  what: string,
  load: (id: number) => Promise<R | null>,
  kind: 'species' | 'lamp-type' | 'shop-figures' | 'customer',
): KindRule<R> => ({ what, load, resource: (r) => ({ kind, organisationId: r.organisationId }) });

const KINDS: { [K in OwnedKind]: KindRule<Owned[K]> } = {
  enclosure: {
    what: 'The enclosure',
    load: (id) =>
      Enclosure.findByPk(id, { include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }] }),
    resource: inEnclosure('enclosure'),
  },
  design: {
    what: 'The design',
    load: (id) => Design.findByPk(id, { include: [withEnclosure] }) as Promise<DesignWithEnclosure | null>,
    resource: (d) => inEnclosure('design')(d.enclosure),
  },
  variant: {
    what: 'The variant',
    load: (id) =>
      Variant.findByPk(id, { include: [designWithEnclosure] }) as Promise<VariantWithOwner | null>,
    resource: (v) => inEnclosure('variant')(v.design.enclosure),
  },
  share: {
    what: 'The share link',
    load: (id) => ShareLink.findByPk(id, { include: [variantWithOwner] }) as Promise<ShareWithOwner | null>,
    resource: (s) => inEnclosure('share')(s.variant.design.enclosure),
  },
  lamp: {
    what: 'The lamp',
    load: (id) => Lamp.findByPk(id, { include: [withEnclosure] }) as Promise<LampWithEnclosure | null>,
    resource: (l) => inEnclosure('lamp')(l.enclosure),
  },
  reading: {
    what: 'The reading',
    load: (id) => Reading.findByPk(id, { include: [lampWithEnclosure] }) as Promise<ReadingWithLamp | null>,
    resource: (r) => inEnclosure('reading')(r.lamp.enclosure),
  },
  species: ofOrganisation('That species sheet', (id) => SpeciesSheet.findByPk(id), 'species'),
  'lamp-type': ofOrganisation('That lamp type', (id) => LampType.findByPk(id), 'lamp-type'),
  'lamp-type-figures': ofOrganisation('That lamp type', (id) => LampType.findByPk(id), 'shop-figures'),
  customer: ofOrganisation('The customer', (id) => Customer.findByPk(id), 'customer'),
  // A lamp tested at the counter is the customer's: its rules are the customers'.
  'counter-lamp': ofOrganisation('The lamp', (id) => CounterLamp.findByPk(id), 'customer'),
  invitation: {
    what: 'That invitation',
    load: (id) => Invitation.findByPk(id),
    // The role it grants: staff may withdraw an invitation of a keeper, not of staff or an owner.
    resource: (i) => ({ kind: 'invitation', organisationId: i.organisationId, role: i.role }),
  },
  upload: {
    what: 'The file',
    load: (id) =>
      Upload.findByPk(id, {
        include: [{ model: Enclosure, as: 'enclosure', required: false }],
      }) as Promise<UploadWithEnclosure | null>,
    // A file filed under an enclosure goes with it; one no longer filed (its enclosure was deleted) is its
    // uploader's and the organisation's owners' and staff's.
    resource: (u) =>
      u.enclosure
        ? inEnclosure('enclosure')(u.enclosure)
        : { kind: 'upload', organisationId: u.organisationId, uploaderId: u.ownerId },
    refusal: 'Only the person who uploaded it, or an owner, can delete this file.',
  },
};

const isId = (id: number) => Number.isSafeInteger(id) && id > 0;

/** What `can` is asked about a loaded record (for a page's further questions: may they edit, delete). */
export const ownerOf = <K extends OwnedKind>(kind: K, record: Owned[K]): Resource =>
  KINDS[kind].resource(record);

/**
 * The one way to load a thing by id for a user: the record of that kind, or "not found" when there is
 * none or this user may not even see it, or "forbidden" when they may see it but not do `action` to it
 * (`allow`). Ownership comes from the stored row, so an id of another organisation reveals nothing.
 */
export async function loadOwned<K extends OwnedKind>(
  kind: K,
  id: number,
  user: SessionUser,
  action: Action,
): Promise<Owned[K]> {
  const rule = KINDS[kind] as KindRule<Owned[K]>;
  const record = isId(id) ? await rule.load(id) : null;
  if (!record) throw notFound(rule.what);
  allow(user, action, rule.resource(record), rule.what, rule.refusal);
  return record;
}

/**
 * For a page: the record if this user may read it, else null (the page answers its 404 whether the thing
 * is missing or someone else's), with whether they may change and delete it. `id` may be the raw route
 * segment; anything but a positive whole number is null.
 */
export async function loadOwnedForPage<K extends OwnedKind>(
  kind: K,
  id: number | string,
  user: SessionUser,
): Promise<{ record: Owned[K]; resource: Resource; canEdit: boolean; canDelete: boolean } | null> {
  const n = typeof id === 'number' ? id : parseId(id);
  if (n === null || !isId(n)) return null;
  const rule = KINDS[kind] as KindRule<Owned[K]>;
  const record = await rule.load(n);
  if (!record) return null;
  const resource = rule.resource(record);
  if (!can(user, 'read', resource)) return null;
  return {
    record,
    resource,
    canEdit: can(user, 'update', resource),
    canDelete: can(user, 'delete', resource),
  };
}
