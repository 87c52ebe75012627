import { describe, expect, it } from 'vitest';
import { toDto as sheetDto } from '@/lib/species/queries';
import { toEngineSheet } from '@/lib/species/to-engine';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { Design, Enclosure, Lamp, ShareLink, SpeciesSheet, Upload, Variant } from '@/models';
import { assess, type Design as DesignFile, type LampObject } from '@/simulation';
import { seedDemo, withTestDatabase } from '@/tests/helpers/db';
import { CURRENT_VARIANT_NAME, DEMO_DESIGNS, EXAMPLE_NOTE, IMPROVED_VARIANT_NAME } from './designs';

withTestDatabase();

async function desert() {
  const enclosure = await Enclosure.findOne({ where: { name: 'Desert vivarium' } });
  if (!enclosure) throw new Error('no desert vivarium');
  const design = await Design.findOne({ where: { enclosureId: enclosure.id } });
  const variants = await Variant.findAll({ where: { designId: design?.id ?? 0 }, order: [['id', 'ASC']] });
  const byName = (name: string) => {
    const v = variants.find((x) => x.name === name);
    if (!v) throw new Error(`no variant ${name}`);
    return { row: v, file: readStoredDesign(v.designJson) };
  };
  const sheet = await SpeciesSheet.findOne({
    where: { organisationId: enclosure.organisationId, commonName: 'Bearded dragon' },
  });
  return {
    enclosure,
    variants,
    current: byName(CURRENT_VARIANT_NAME),
    improved: byName(IMPROVED_VARIANT_NAME),
    species: toEngineSheet(sheetDto(sheet!)),
  };
}

const lamps = (d: DesignFile) => d.objects.filter((o): o is LampObject => o.type === 'lamp');
const uvLamp = (d: DesignFile) => lamps(d).find((l) => (l.uvbAt30 ?? 0) > 0)!;
const finding = (d: DesignFile, species: Parameters<typeof assess>[1], id: string) =>
  assess(d, species, { cellCm: 2 }).findings.find((f) => f.id === id)?.status;

describe('demo designs', () => {
  it('gives every demo enclosure a design marked as example data', async () => {
    await seedDemo();
    for (const plan of DEMO_DESIGNS) {
      const enclosure = await Enclosure.findOne({ where: { name: plan.enclosure } });
      const designs = await Design.findAll({ where: { enclosureId: enclosure!.id } });
      expect(
        designs.map((d) => d.name),
        plan.enclosure,
      ).toEqual([plan.design]);
      expect(designs[0]!.name).toMatch(/example/i);
      const variants = await Variant.findAll({ where: { designId: designs[0]!.id } });
      expect(variants.length).toBeGreaterThanOrEqual(1);
      for (const v of variants) expect(readStoredDesign(v.designJson).notes).toContain(EXAMPLE_NOTE);
    }
  });

  it('links every logged lamp of a demo enclosure to a lamp of its design, so calibration finds it', async () => {
    await seedDemo();
    const logged = await Lamp.findAll();
    expect(logged.length).toBeGreaterThan(0);
    for (const lamp of logged) {
      expect(lamp.designObjectId, lamp.label).not.toBeNull();
      const designs = await Design.findAll({ where: { enclosureId: lamp.enclosureId } });
      const variants = await Variant.findAll({ where: { designId: designs.map((d) => d.id) } });
      const ids = variants.flatMap((v) => lamps(readStoredDesign(v.designJson)).map((l) => l.id));
      expect(ids, lamp.label).toContain(lamp.designObjectId);
    }
  });

  it('tells the desert story: the current set-up basks without UV, the improved one passes with UV and heat on one spot', async () => {
    await seedDemo();
    const { current, improved, species } = await desert();
    // The same two lamps in both, but the tube moved: compare shows the difference.
    expect(
      lamps(current.file)
        .map((l) => l.id)
        .sort(),
    ).toEqual(
      lamps(improved.file)
        .map((l) => l.id)
        .sort(),
    );
    expect(uvLamp(current.file).x).not.toBe(uvLamp(improved.file).x);
    // Improved: the UV tube and the heat lamp hang over the same basking spot (within the tube's length).
    const tube = uvLamp(improved.file);
    // (A dragon needs a basking spot about as long as its body, so the heat may come from two emitters
    // side by side: each hangs along the tube, and the basking spot lies between them.)
    const heats = lamps(improved.file).filter((l) => !((l.uvbAt30 ?? 0) > 0));
    expect(heats.length).toBeGreaterThan(0);
    for (const heat of heats) expect(Math.abs(tube.x - heat.x)).toBeLessThan((tube.length ?? 0) / 2);
    const basking = improved.file.probes?.find((p) => p.id === 'basking-spot');
    expect(basking).toBeDefined();
    const xs = heats.map((h) => h.x);
    expect(basking!.x).toBeGreaterThan(Math.min(...xs) - 10);
    expect(basking!.x).toBeLessThan(Math.max(...xs) + 10);
    // The engine's own verdicts: the current set-up's basking spot lacks UV, the improved one has it.
    expect(finding(improved.file, species, 'basking-uvi')).toBe('pass');
    expect(finding(improved.file, species, 'hot-spot')).toBe('pass');
    expect(finding(current.file, species, 'basking-uvi')).not.toBe('pass');
    expect(assess(improved.file, species, { cellCm: 2 }).findings.filter((f) => f.status !== 'pass')).toEqual(
      [],
    );
    // The current set-up is the real tube, calibrated to its meter readings; pinned probes at the basking spot.
    expect(uvLamp(current.file).calibration?.from).toMatch(/meter readings/);
    expect(current.file.probes?.map((p) => p.id)).toContain('basking-spot');
  });

  it('gives the current set-up a drawn photo backdrop, and one live and one revoked share link', async () => {
    await seedDemo();
    const { current, improved, variants } = await desert();
    const backdrop = current.file.backdrop;
    expect(backdrop?.visible).toBe(true);
    const photo = await Upload.findByPk(backdrop!.uploadId);
    expect(photo?.kind).toBe('backdrop');
    expect(photo?.contentType).toBe('image/png');
    const links = await ShareLink.findAll({
      where: { variantId: variants.map((v) => v.id) },
      order: [['variantId', 'DESC']],
    });
    expect(links.map((l) => [l.variantId, l.revokedAt === null])).toEqual([
      [improved.row.id, true],
      [current.row.id, false],
    ]);
  });

  it('never duplicates a design and never overwrites what a user changed when seeded again', async () => {
    await seedDemo();
    const { current, improved } = await desert();
    const counts = async () => ({
      designs: await Design.count(),
      variants: await Variant.count(),
      shares: await ShareLink.count(),
      uploads: await Upload.count(),
    });
    const before = await counts();
    // A user renames a variant, moves its lamp and deletes the other variant.
    const edited = structuredClone(current.file);
    uvLamp(edited).x = 80;
    await current.row.update({ name: 'What I have now', designJson: JSON.stringify(edited) });
    await improved.row.destroy();

    const again = await seedDemo();

    expect(again.created).toMatchObject({ designs: 0, variants: 0, shares: 0, photos: 0 });
    expect(await counts()).toEqual({ ...before, variants: before.variants - 1, shares: before.shares - 1 });
    const after = await Variant.findByPk(current.row.id);
    expect(after?.name).toBe('What I have now');
    expect(uvLamp(readStoredDesign(after!.designJson)).x).toBe(80);
    expect(await Variant.findOne({ where: { name: IMPROVED_VARIANT_NAME } })).toBeNull();
  });
});
