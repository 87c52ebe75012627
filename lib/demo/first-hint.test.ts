import { describe, expect, it } from 'vitest';
import { loadUserById } from '@/lib/auth/session-user';
import { Design, Enclosure, Organisation, User, Variant } from '@/models';
import { createEnclosure, createMember, seedDemoShop, withTestDatabase } from '@/tests/helpers/db';
import {
  CURRENT_VARIANT_NAME,
  DESERT_DESIGN_NAME,
  DESERT_ENCLOSURE_NAME,
  IMPROVED_VARIANT_NAME,
} from './designs';
import { firstDesignHint } from './first-hint';
import { DEMO_HOUSEHOLD } from './scenario';

withTestDatabase();

async function signedIn(email: string) {
  const user = await User.findOne({ where: { email } });
  return (await loadUserById(user!.id))!;
}

/** The demo shop's desert design and its two variants, as the seed wrote them. */
async function desertDesign(shop: Organisation) {
  const enclosure = await Enclosure.findOne({
    where: { organisationId: shop.id, name: DESERT_ENCLOSURE_NAME },
  });
  const design = await Design.findOne({ where: { enclosureId: enclosure!.id, name: DESERT_DESIGN_NAME } });
  const variant = async (name: string) =>
    (await Variant.findOne({ where: { designId: design!.id, name } }))!.id;
  return {
    enclosure: enclosure!,
    designId: design!.id,
    current: await variant(CURRENT_VARIANT_NAME),
    improved: await variant(IMPROVED_VARIANT_NAME),
  };
}

describe('firstDesignHint', () => {
  it("points staff and the desert enclosure's keeper at its design and its two variants, current first", async () => {
    const shop = await seedDemoShop();
    const desert = await desertDesign(shop);
    const expected = { designId: desert.designId, compare: { a: desert.current, b: desert.improved } };
    expect(await firstDesignHint(await signedIn('idris.penhallow@example.com'), shop.id)).toEqual(expected);
    const keeper = await User.findByPk(desert.enclosure.keeperId);
    expect(await firstDesignHint(await signedIn(keeper!.email), shop.id)).toEqual(expected);
  });

  it('is null for a keeper who may not open the desert enclosure, and in an organisation without it', async () => {
    const shop = await seedDemoShop();
    expect(await firstDesignHint(await signedIn('aoife.lindmarr@example.com'), shop.id)).toBeNull();
    const household = await Organisation.findOne({ where: { name: DEMO_HOUSEHOLD.name } });
    expect(await firstDesignHint(await signedIn('lena.ashgrove@example.com'), household!.id)).toBeNull();
  });

  it('keeps to the first desert enclosure: a later one of that name is not a fallback', async () => {
    const shop = await seedDemoShop();
    const desert = await desertDesign(shop);
    const staff = await signedIn('idris.penhallow@example.com');
    const keeper = await User.findByPk(desert.enclosure.keeperId);
    const later = await createEnclosure(shop, keeper!, { name: DESERT_ENCLOSURE_NAME });
    const laterDesign = await Design.create({ enclosureId: later.id, name: DESERT_DESIGN_NAME });
    await Variant.create({ designId: laterDesign.id, name: IMPROVED_VARIANT_NAME, designJson: '{}' });
    expect((await firstDesignHint(staff, shop.id))?.designId).toBe(desert.designId);
    await Design.destroy({ where: { id: desert.designId } });
    expect(await firstDesignHint(staff, shop.id)).toBeNull();
  });

  it('is null in an organisation that is not example data, even with a design of the same names', async () => {
    const { organisation, user } = await createMember('owner');
    const enclosure = await createEnclosure(organisation, user, { name: DESERT_ENCLOSURE_NAME });
    await Design.create({ enclosureId: enclosure.id, name: DESERT_DESIGN_NAME });
    expect(await firstDesignHint((await loadUserById(user.id))!, organisation.id)).toBeNull();
    await organisation.update({ exampleData: true });
    expect(await firstDesignHint((await loadUserById(user.id))!, organisation.id)).toEqual({
      designId: expect.any(Number),
      compare: null,
    });
  });
});
