import { z } from 'zod';
import { WALL_MATERIALS } from '@/simulation';
import { textSchema } from '@/lib/api/text';

/** What the guided start asks, as the server checks it. Sizes are inside dimensions in cm, °C. */

const id = (what: string) =>
  z.coerce
    .number({ error: `${what} must be a number.` })
    .int(`${what} must be a whole number.`)
    .positive(`Choose ${what.toLowerCase()}.`);

const size = (what: string) =>
  z
    .number({ error: `Enter the ${what}.` })
    .finite(`Enter the ${what}.`)
    .min(20, `The ${what} must be at least 20 cm (8 in).`)
    .max(400, `The guided start plans enclosures up to 400 cm (13 ft); use the studio for larger ones.`);

export const LIDS = ['mesh', 'glass', 'open'] as const;
/** The walls the guided start asks about: exactly the engine's wall table (simulation/model/walls.ts). */
export const GUIDED_WALLS = WALL_MATERIALS;

export const guidedStartSchema = z.strictObject({
  organisationId: id('The organisation'),
  speciesId: id('A species'),
  widthCm: size('width'),
  heightCm: size('height'),
  depthCm: size('depth'),
  lid: z.enum(LIDS, { error: 'Choose the lid: mesh, glass or open.' }),
  walls: z.enum(GUIDED_WALLS, {
    error: 'Choose what the walls are made of: glass, wood, PVC or melamine board, or mesh.',
  }),
  roomTempC: z
    .number({ error: 'Enter the room temperature.' })
    .finite('Enter the room temperature.')
    .min(5, 'The room temperature must be at least 5 °C (41 °F).')
    .max(40, 'The room temperature must be at most 40 °C (104 °F).'),
  keeperId: id('The keeper').optional(),
  name: textSchema('Enter a name for the enclosure.')
    .trim()
    .min(1, 'Enter a name for the enclosure.')
    .max(120, 'Use at most 120 characters.'),
  animalName: textSchema()
    .trim()
    .max(120, 'Use at most 120 characters.')
    .nullish()
    .transform((v) => (v ? v : null)),
});

export type GuidedStartInput = z.output<typeof guidedStartSchema>;
