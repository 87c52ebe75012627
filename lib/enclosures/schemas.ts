import { z } from 'zod';
import { idSchema, optionalTextSchema, textSchema } from '@/lib/api/schemas';
import { ENCLOSURE_MAX_CM, ENCLOSURE_MIN_CM } from '@/shared/enclosure-size';

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

export const enclosureFields = {
  name: textSchema('Enter a name for the enclosure.')
    .trim()
    .min(1, 'Enter a name for the enclosure.')
    .max(120, 'Use at most 120 characters.'),
  keeperId: idSchema('The keeper'),
  widthCm: size('width'),
  heightCm: size('height'),
  depthCm: size('depth'),
  speciesName: optionalTextSchema(160),
  animalName: optionalTextSchema(120),
  notes: optionalTextSchema(5000),
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
