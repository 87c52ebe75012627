import { beforeEach, describe, expect, it } from 'vitest';
import { loadSessionUser, type CurrentUser } from '@/lib/auth/session-user';
import { parseDesign } from '@/simulation';
import { Design, Enclosure, SpeciesSheet, Variant, type Organisation, type User } from '@/models';
import { addMember, createUser, withTestDatabase } from '../../tests/helpers/db';
import { createWorld } from '../../tests/helpers/world';
import { createFromGuidedStart } from './mutations';
import { proposeFor } from './queries';

withTestDatabase();

let shop: Organisation;
let otherOrg: Organisation;
let staffUser: User;
let keeperUser: User;
let otherKeeper: User;
let outsiderUser: User;
let dragonId: number;

const who = async (u: User): Promise<CurrentUser> => (await loadSessionUser(u.id, u.sessionVersion ?? 1))!;

beforeEach(async () => {
  ({
    shop,
    otherOrg,
    staff: staffUser,
    keeper: keeperUser,
    outsider: outsiderUser,
  } = await createWorld({ catalogue: true }));
  otherKeeper = (await createUser()).user;
  await addMember(shop, otherKeeper, 'keeper');
  dragonId = (await SpeciesSheet.findOne({
    where: { organisationId: shop.id, seedKey: 'pogona-vitticeps' },
  }))!.id;
});

const input = (over: Record<string, unknown> = {}) => ({
  organisationId: shop.id,
  speciesId: dragonId,
  widthCm: 120,
  heightCm: 60,
  depthCm: 60,
  lid: 'mesh' as const,
  walls: 'glass' as const,
  roomTempC: 22,
  name: 'Desert vivarium',
  animalName: null,
  ...over,
});

describe('guided start on the server', () => {
  it('proposes from the organisation’s own catalogue and explains it', async () => {
    const v = await proposeFor(await who(keeperUser), input());
    expect(v.sheet.commonName).toBe('Bearded dragon');
    expect(v.assessment.findings.find((f) => f.id === 'basking-uvi')?.status).toBe('pass');
    expect(v.explanation.map((l) => l.heading)).toContain('Basking UV');
  });

  it('lets staff create an enclosure for a keeper, with its first design and variant', async () => {
    const r = await createFromGuidedStart(await who(staffUser), input({ keeperId: keeperUser.id }));
    const enclosure = (await Enclosure.findByPk(r.enclosureId))!;
    expect(enclosure).toMatchObject({ keeperId: keeperUser.id, speciesName: 'Bearded dragon', widthCm: 120 });
    const variant = (await Variant.findByPk(r.variantId))!;
    const design = (await Design.findByPk(variant.designId))!;
    expect(design.enclosureId).toBe(enclosure.id);
    const parsed = parseDesign(JSON.parse(variant.designJson));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) {
      expect(parsed.design.objects.some((o) => o.type === 'lamp')).toBe(true);
      expect(parsed.design.notes).toMatch(/estimate/);
    }
  });

  it('refuses a keeper starting an enclosure for someone else, and creates nothing', async () => {
    await expect(
      createFromGuidedStart(await who(keeperUser), input({ keeperId: otherKeeper.id })),
    ).rejects.toMatchObject({
      kind: 'forbidden',
    });
    expect(await Enclosure.count()).toBe(0);
  });

  it('hides another organisation and its sheets', async () => {
    await expect(proposeFor(await who(outsiderUser), input())).rejects.toMatchObject({ kind: 'not_found' });
    const foreignSheet = (await SpeciesSheet.findOne({ where: { organisationId: otherOrg.id } }))!;
    await expect(
      proposeFor(await who(staffUser), input({ speciesId: foreignSheet.id })),
    ).rejects.toMatchObject({
      kind: 'not_found',
    });
  });

  it('says so when the catalogue has no UV lamp that fits', async () => {
    const { LampType } = await import('@/models');
    await LampType.destroy({ where: { organisationId: shop.id } });
    await expect(proposeFor(await who(staffUser), input())).rejects.toMatchObject({ kind: 'invalid' });
  });

  it('refuses to build a design that could hurt the animal, and says why', async () => {
    // A White's tree frog (basking surface 28–31 °C on its sheet, from memory) in a room at 35 °C: every
    // surface is too hot whatever the lamps do.
    const frog = (await SpeciesSheet.findOne({
      where: { organisationId: shop.id, seedKey: 'litoria-caerulea' },
    }))!;
    const hot = input({ speciesId: frog.id, widthCm: 45, heightCm: 60, depthCm: 45, roomTempC: 35 });
    const view = await proposeFor(await who(staffUser), hot);
    expect(view.blocked).toMatch(/will not propose a design that could hurt the animal/);
    const before = await Enclosure.count();
    await expect(createFromGuidedStart(await who(staffUser), hot)).rejects.toMatchObject({ kind: 'invalid' });
    expect(await Enclosure.count()).toBe(before);
  });

  it('builds the design with the walls it was told', async () => {
    const view = await proposeFor(await who(staffUser), input({ walls: 'wood' }));
    expect(view.design.enclosure.walls).toBe('wood');
    expect(view.blocked).toBeNull();
  });
});
