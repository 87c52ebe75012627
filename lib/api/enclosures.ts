import 'server-only';
import { col, fn } from 'sequelize';
import { z } from 'zod';
import { ENCLOSURE_MAX_CM, ENCLOSURE_MIN_CM } from '@/shared/enclosure-size';
import { Enclosure, Membership, User } from '@/models';
import { invalid, notFound } from '@/lib/errors';
import { idSchema, textSchema } from './schemas';

/** Enclosure fields as the API accepts them. Sizes are inside dimensions in centimetres. */
const size = (what: string) =>
  z
    .number({ error: `Enter the ${what} in centimetres.` })
    .finite(`Enter the ${what} in centimetres.`)
    .min(ENCLOSURE_MIN_CM, `The ${what} must be at least ${ENCLOSURE_MIN_CM} cm (0.4 in).`)
    .max(
      ENCLOSURE_MAX_CM,
      `The ${what} can be at most ${ENCLOSURE_MAX_CM} cm (${ENCLOSURE_MAX_CM / 100} m).`,
    );

const optionalText = (max: number) =>
  textSchema()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .nullish()
    .transform((v) => (v ? v : null));

export const enclosureFields = {
  name: textSchema('Enter a name for the enclosure.')
    .trim()
    .min(1, 'Enter a name for the enclosure.')
    .max(120, 'Use at most 120 characters.'),
  keeperId: idSchema('The keeper'),
  widthCm: size('width'),
  heightCm: size('height'),
  depthCm: size('depth'),
  speciesName: optionalText(160),
  animalName: optionalText(120),
  notes: optionalText(5000),
};

/** `keeperId` may be left out: the enclosure is then the caller's own. */
export const createEnclosureBody = z.object({
  organisationId: idSchema('The organisation id'),
  ...enclosureFields,
  keeperId: enclosureFields.keeperId.optional(),
});

export const updateEnclosureBody = z
  .object(enclosureFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Send at least one field to change.' });

export function enclosureJson(e: Enclosure & { keeper?: User | null }) {
  return {
    id: e.id,
    organisationId: e.organisationId,
    keeperId: e.keeperId,
    keeperName: e.keeper?.name ?? null,
    name: e.name,
    widthCm: e.widthCm,
    heightCm: e.heightCm,
    depthCm: e.depthCm,
    speciesName: e.speciesName ?? null,
    animalName: e.animalName ?? null,
    notes: e.notes ?? null,
    createdAt: e.createdAt.toISOString(),
    updatedAt: e.updatedAt.toISOString(),
  };
}

export type EnclosureJson = ReturnType<typeof enclosureJson>;

export async function enclosureCounts(
  organisationId: number,
  keeperIds: number[],
): Promise<Map<number, number>> {
  if (keeperIds.length === 0) return new Map();
  const rows = (await Enclosure.findAll({
    attributes: ['keeperId', [fn('COUNT', col('id')), 'n']],
    where: { organisationId, keeperId: keeperIds },
    group: ['keeperId'],
    raw: true,
  })) as unknown as { keeperId: number; n: number | string }[];
  return new Map(rows.map((r) => [r.keeperId, Number(r.n)]));
}

/** An enclosure's keeper must belong to the organisation (any role: staff may keep the shop's own animals). */
export async function assertKeeperInOrganisation(organisationId: number, keeperId: number): Promise<void> {
  const member = await Membership.findOne({
    where: { organisationId, userId: keeperId },
    attributes: ['id'],
  });
  if (!member) throw invalid('keeperId', 'That keeper is not a member of this organisation.');
}

export type EnclosureWithKeeper = Enclosure & { keeper?: User | null };

/** An enclosure with its keeper's name; 404 when there is none (access is the caller's check). */
export async function enclosureWithKeeper(id: number): Promise<EnclosureWithKeeper> {
  const enclosure = await Enclosure.findByPk(id, {
    include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }],
  });
  if (!enclosure) throw notFound('That enclosure');
  return enclosure;
}

/** A new enclosure kept by `keeperId`, who must belong to the organisation. */
export async function createEnclosure(
  fields: Omit<z.output<typeof createEnclosureBody>, 'keeperId'> & { keeperId: number },
): Promise<EnclosureWithKeeper> {
  await assertKeeperInOrganisation(fields.organisationId, fields.keeperId);
  const enclosure = await Enclosure.create(fields);
  const keeper = await User.findByPk(fields.keeperId, { attributes: ['id', 'name'] });
  return Object.assign(enclosure, { keeper });
}

/** Changes an enclosure; a new keeper must belong to its organisation. */
export async function updateEnclosure(
  enclosure: Enclosure,
  body: z.output<typeof updateEnclosureBody>,
): Promise<EnclosureWithKeeper> {
  if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
    await assertKeeperInOrganisation(enclosure.organisationId, body.keeperId);
  }
  await enclosure.update(body);
  return enclosureWithKeeper(enclosure.id);
}
