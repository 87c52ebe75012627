import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { createEnclosureBody } from '@/lib/enclosures/schemas';
import { createLampBody, createReadingBody } from '@/lib/lamp-log/schemas';
import { lampTypePatchSchema } from '@/lib/lamp-types/schema';
import { speciesPatchSchema } from '@/lib/species/schema';
import { nameField } from '@/lib/variants/schemas';
import { organisationNameSchema, personNameSchema } from './schemas';
import { BROKEN_CHARACTER_MESSAGE, isWellFormedText, textSchema } from './text';

const HIGH = '\uD83E'; // the first half of U+1F98E (lizard) alone
const LOW = '\uDD8E'; // its second half alone
const LIZARD = '\uD83E\uDD8E';

/** The first issue of a failed parse, as the API reports it: the field path and the message. */
function firstIssue(schema: z.ZodType, value: unknown) {
  const r = schema.safeParse(value);
  if (r.success) return null;
  return { path: r.error.issues[0]!.path.join('.'), message: r.error.issues[0]!.message };
}

describe('isWellFormedText', () => {
  it.each([
    ['plain text', 'Basking tube', true],
    ['a whole emoji', `Rex ${LIZARD}`, true],
    ['accents and symbols', 'Café µW/cm² °C', true],
    ['a lone high surrogate at the end', `Rex ${HIGH}`, false],
    ['a lone low surrogate at the start', `${LOW}Rex`, false],
    ['two high surrogates', `${HIGH}${HIGH}${LOW}`, false],
    ['halves in the wrong order', `${LOW}${HIGH}`, false],
  ])('%s → %s', (_name, text, ok) => {
    expect(isWellFormedText(text)).toBe(ok);
  });
});

describe('textSchema and the schemas built on it', () => {
  it('keeps whole emoji and refuses half of one with a clear message', () => {
    expect(textSchema().trim().parse(`  ${LIZARD} Rex  `)).toBe(`${LIZARD} Rex`);
    expect(firstIssue(textSchema(), `Rex ${HIGH}`)).toEqual({ path: '', message: BROKEN_CHARACTER_MESSAGE });
    expect(BROKEN_CHARACTER_MESSAGE).toMatch(/unpaired UTF-16 surrogate/);
    // A value that is not text keeps its own message.
    expect(firstIssue(textSchema('Enter a name.'), 42)?.message).toBe('Enter a name.');
  });

  it.each([
    ['person name', personNameSchema, `Nell ${HIGH}`, ''],
    ['organisation name', organisationNameSchema, `Quarry ${LOW}house`, ''],
    ['design or variant name', nameField, `Plan ${HIGH}`, ''],
    [
      'enclosure notes',
      createEnclosureBody,
      { organisationId: 1, name: 'Viv', widthCm: 90, heightCm: 45, depthCm: 45, notes: `dusty ${LOW}` },
      'notes',
    ],
    ['species common name', speciesPatchSchema, { commonName: `Dragon ${HIGH}` }, 'commonName'],
    [
      'species source citation',
      speciesPatchSchema,
      { sources: [{ citation: `From memory ${LOW}`, confidence: 'verify' }] },
      'sources.0.citation',
    ],
    ['lamp type name', lampTypePatchSchema, { name: `Tube ${HIGH}` }, 'name'],
    [
      'lamp label',
      createLampBody,
      { enclosureId: 1, lampTypeId: 1, label: `Basking ${HIGH}`, firstUsedOn: '2026-01-10', hoursPerDay: 12 },
      'label',
    ],
    [
      'reading meter name',
      createReadingBody,
      { takenAt: '2026-01-10T10:00:00Z', distance: 30, value: 80, unit: 'uvb', meter: `meter ${LOW}` },
      'meter',
    ],
  ])('%s: refuses an unpaired surrogate, naming the field', (_name, schema, value, path) => {
    expect(firstIssue(schema as z.ZodType, value)).toEqual({ path, message: BROKEN_CHARACTER_MESSAGE });
  });
});
