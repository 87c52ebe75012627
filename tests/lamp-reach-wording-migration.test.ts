import { describe, expect, it } from 'vitest';
import { startingLampType } from '@/lib/lamp-types/starting-lamp-types';
import { createLampType } from '@/lib/lamp-types/mutations';
import { up } from '@/migrations/0016-lamp-reach-wording';
import { LampType } from '@/models';
import { createOrganisation, testDb, withTestDatabase } from './helpers/db';

withTestDatabase();

// A medium T5 entry as the starting catalogue seeded it while presets carried a distance per class.
const OLD_NOTE =
  'Useful reach about 30 cm: the distance below a new, bare lamp at which the UV Index falls to 1 ' +
  '(the lower bound of the zone 3 mean of Ferguson et al. 2010). An estimate — verify with a meter.';
const OLD_SOURCE =
  'uvbAt30 from the useful reach of the class (common practice, no published source), 30 cm; length and watts from memory';

async function entry(
  organisationId: number,
  name: string,
  notes: string | null,
  source: string,
  presetKey: string | null,
) {
  const seeded = startingLampType('t5-medium');
  return createLampType(
    organisationId,
    { ...seeded, name, notes, sources: { ...seeded.sources, uvbAt30: source, watts: source } },
    null,
    { presetKey: presetKey ?? undefined },
  );
}

describe('migration 0016: no distance per output class in the starting catalogue', () => {
  it('rewrites the seeded note and output source, and leaves edited or own entries alone', async () => {
    const org = await createOrganisation();
    const seeded = await entry(org.id, 'Seeded tube', OLD_NOTE, OLD_SOURCE, 't5-medium');
    const editedNote = await entry(
      org.id,
      'Edited tube',
      'Our shop tube: reads 180 at 15 cm when new.',
      OLD_SOURCE,
      't8-medium',
    );
    const own = await entry(org.id, 'Own tube', OLD_NOTE, OLD_SOURCE, null);

    await up({ context: testDb().getQueryInterface() });
    const now = async (l: LampType) => (await LampType.findByPk(l.id))!;
    const s = await now(seeded);
    expect(s.notes).toBeNull();
    const sources = JSON.parse(s.sourcesJson) as Record<string, string>;
    // The same words a fresh seed writes today.
    expect(sources.uvbAt30).toBe(startingLampType('t5-medium').sources.uvbAt30);
    expect(sources.watts).toBe(startingLampType('t5-medium').sources.watts);
    expect(s.sourcesJson).not.toMatch(/useful reach|30 cm/);
    // Everything else of the row is untouched.
    expect(JSON.parse(s.sourcesJson).uviPerUvb).toBe(JSON.parse(seeded.sourcesJson).uviPerUvb);

    const e = await now(editedNote);
    expect(e.notes).toBe('Our shop tube: reads 180 at 15 cm when new.');
    expect(JSON.parse(e.sourcesJson).uvbAt30).toBe(startingLampType('t5-medium').sources.uvbAt30);
    const o = await now(own);
    expect(o.notes).toBe(OLD_NOTE);
    expect(JSON.parse(o.sourcesJson).uvbAt30).toBe(OLD_SOURCE);

    // Running it again changes nothing.
    await up({ context: testDb().getQueryInterface() });
    expect((await now(seeded)).sourcesJson).toBe(s.sourcesJson);
  });
});
