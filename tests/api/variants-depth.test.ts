// Design files gained depth in version 2. Designs saved before it stay version 1 in the database and
// are upgraded as they are read (no database migration rewrites them), so nothing a user saved is lost
// and a stored file only changes when its owner saves it again.
import { describe, expect, it } from 'vitest';
import * as designVariantsRoute from '@/app/api/designs/[id]/variants/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import { designLampsOf } from '@/lib/lamp-log/design-lamps';
import { Variant } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { createKeeperWorld } from '../helpers/world';
import { call, exportVariant, postDesign } from './variants.helpers';

withTestDatabase();

/** A version-1 file as the app wrote it before depth existed (every optional field it could carry). */
const v1 = {
  format: 'baskwell.design',
  version: 1,
  enclosure: { width: 90, height: 45, depth: 45, roomTempC: 23 },
  objects: [
    {
      type: 'lamp',
      id: 'uv1',
      name: 'Basking tube',
      tech: 't5',
      form: 'tube',
      x: 45,
      y: 47,
      length: 55,
      uvbAt30: 25,
      reflectorGain: 2,
      ageMonths: 4,
      decay: { halfLifeMonths: 11 },
      calibration: { at: '2026-10-01', from: '5 readings' },
    },
    { type: 'lamp', id: 'heat1', tech: 'halogen', form: 'bulb', x: 70, y: 47, watts: 50, beamDeg: 30 },
    { type: 'screen', id: 'lid', x1: 0, y1: 45, x2: 90, y2: 45 },
    { type: 'perch', id: 'b1', name: 'Branch', x1: 10, y1: 10, x2: 50, y2: 25, thickness: 3 },
  ],
  probes: [{ id: 'probe-1', x: 40, y: 20, label: 'top of branch' }],
  notes: 'Written before depth existed.',
};

async function world() {
  const { keeper, enclosure } = await createKeeperWorld('Depth Test Rooms', {
    enclosure: { widthCm: 90, heightCm: 45, depthCm: 45 },
  });
  return { keeper, enclosure, ...(await postDesign(keeper, enclosure.id, { name: 'Old plan' })) };
}

const getVariant = (w: Awaited<ReturnType<typeof world>>) =>
  call(variantRoute.GET, {
    path: `/api/variants/${w.variantId}`,
    params: { id: w.variantId },
    user: w.keeper,
  });

describe('version-1 designs saved before depth', () => {
  it('are read as version 2 with every field kept, and stay version 1 in the database until saved', async () => {
    const w = await world();
    // As an older app stored it.
    await Variant.update({ designJson: JSON.stringify(v1) }, { where: { id: w.variantId } });

    const read = await getVariant(w);
    expect(read.status).toBe(200);
    expect(read.body.variant.design).toEqual({ ...v1, version: 2 });

    const exported = await exportVariant(w.keeper, w.variantId, 'format=json');
    expect(exported.status).toBe(200);
    expect(exported.body).toEqual({ ...v1, version: 2 });

    // The lamp log still finds its lamps in it.
    const lamps = await designLampsOf(w.enclosure.id);
    expect(lamps.map((l) => l.objectId).sort()).toEqual(['heat1', 'uv1']);

    // Reading changed nothing stored.
    const row = await Variant.findByPk(w.variantId);
    expect(JSON.parse(row!.designJson)).toEqual(v1);

    // Saving it again (the studio sets the tube's depth) stores version 2 with everything else unchanged.
    const edited = structuredClone(read.body.variant.design);
    edited.objects[0].z = 40;
    edited.enclosure.sectionZ = 35;
    const saved = await call(variantRoute.PUT, {
      method: 'PUT',
      path: `/api/variants/${w.variantId}`,
      params: { id: w.variantId },
      user: w.keeper,
      body: { design: edited, baseVersion: read.body.variant.version },
    });
    expect(saved.status).toBe(200);
    const stored = JSON.parse((await Variant.findByPk(w.variantId))!.designJson);
    expect(stored).toEqual(edited);
    expect(stored.version).toBe(2);
    expect(stored.objects[0]).toMatchObject({ ...v1.objects[0], z: 40 });
    expect(stored.probes).toEqual(v1.probes);
    expect(stored.notes).toBe(v1.notes);
  });

  it('uploaded as a file, a version-1 design is stored upgraded; a bad depth is refused naming the field', async () => {
    const w = await world();
    const upload = (design: unknown) =>
      call(designVariantsRoute.POST, {
        method: 'POST',
        path: `/api/designs/${w.designId}/variants`,
        params: { id: w.designId },
        user: w.keeper,
        body: { name: 'Imported', design },
      });
    const ok = await upload(v1);
    expect(ok.status).toBe(201);
    const row = await Variant.findByPk(ok.body.variant.id);
    expect(JSON.parse(row!.designJson)).toEqual({ ...v1, version: 2 });

    const tooDeep = structuredClone({ ...v1, version: 2 });
    (tooDeep.objects[1] as Record<string, unknown>).z = 50;
    const refused = await upload(tooDeep);
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe('design.objects[1].z');
    expect(refused.body.error.message).toBe(
      "objects[1].z: must be within the enclosure's depth (0 to 45 cm)",
    );
    const badSection = await upload({ ...v1, version: 2, enclosure: { ...v1.enclosure, sectionZ: -2 } });
    expect(badSection.status).toBe(400);
    expect(badSection.body.error.field).toBe('design.enclosure.sectionZ');
  });
});
