// The signed-in pages check access themselves, as the route handlers do: another organisation's owner
// and a keeper of the same shop who does not own the enclosure open each page of the shop's enclosure
// (its lamps, lamp log, designs, studio) and the catalogue editors, and the page and its payload say
// nothing of the thing (its name, the animal's name, the lamp's label; for the other organisation also
// the catalogue entries). The status may be 200 for "Not found" when the page streamed its loading
// state first, so the content is what is checked. The enclosure's own keeper, the control, sees it.
import { describe, expect, it } from 'vitest';
import { getSequelize } from '@/lib/db';
import { DEMO_HOUSEHOLD, DEMO_PASSWORDS, DEMO_SHOP, demoSignIn } from '@/lib/demo/scenario';
import { Design, Enclosure, Lamp, LampType, Organisation, SpeciesSheet, User, Variant } from '@/models';
import { BASE_URL } from './harness';
import { signInCookie } from './sign-in-cookie';

const ENCLOSURE = 'Desert vivarium';

async function shopThings() {
  getSequelize();
  const shop = (await Organisation.findOne({ where: { name: DEMO_SHOP.name } }))!;
  const enclosure = (await Enclosure.findOne({ where: { organisationId: shop.id, name: ENCLOSURE } }))!;
  const design = await Design.findOne({ where: { enclosureId: enclosure.id } });
  const variant = design ? await Variant.findOne({ where: { designId: design.id } }) : null;
  const lamp = await Lamp.findOne({ where: { enclosureId: enclosure.id } });
  const species = (await SpeciesSheet.findOne({ where: { organisationId: shop.id } }))!;
  const lampType = (await LampType.findOne({ where: { organisationId: shop.id } }))!;
  const owner = (await User.findByPk(enclosure.keeperId))!;
  const pages = [
    `/enclosures/${enclosure.id}`,
    `/enclosures/${enclosure.id}/lamps`,
    ...(design ? [`/designs/${design.id}`] : []),
    ...(variant ? [`/studio/${variant.id}`] : []),
    ...(lamp ? [`/lamp-log/${lamp.id}`] : []),
    `/species/${species.id}/edit`,
    `/lamp-catalogue/${lampType.id}/edit`,
  ];
  const ofTheEnclosure = [ENCLOSURE, enclosure.animalName, lamp?.label].filter(Boolean) as string[];
  // The catalogue is the organisation's: its members may read it, another organisation may not.
  const ofTheShop = [...ofTheEnclosure, species.commonName, lampType.name];
  return { owner, pages, ofTheEnclosure, ofTheShop };
}

async function page(path: string, cookie: string) {
  const res = await fetch(`${BASE_URL}${path}`, { headers: { cookie }, redirect: 'manual' });
  return { status: res.status, html: await res.text() };
}

describe('pages check access themselves', () => {
  it('another organisation and another keeper learn nothing of the enclosure', async () => {
    const { pages, ofTheEnclosure, ofTheShop, owner } = await shopThings();
    console.info(`page-access: ${pages.join(', ')}`);
    expect(pages.length).toBeGreaterThanOrEqual(5);
    const outsider = await signInCookie(demoSignIn('owner', DEMO_HOUSEHOLD.name).email, DEMO_PASSWORDS.owner);
    const otherKeeperPerson = DEMO_SHOP.people.find((p) => p.role === 'keeper' && p.email !== owner.email)!;
    const otherKeeper = await signInCookie(otherKeeperPerson.email, DEMO_PASSWORDS.keeper);
    const wrong: string[] = [];
    for (const [who, cookie, secrets] of [
      ['outsider', outsider, ofTheShop],
      ['other keeper', otherKeeper, ofTheEnclosure],
    ] as const) {
      for (const path of pages) {
        const r = await page(path, cookie);
        // Signed in (not sent to sign-in), answered, and nothing of the thing in the page or its payload.
        if (![200, 404].includes(r.status)) wrong.push(`${who} ${path} → ${r.status}`);
        for (const s of secrets) if (r.html.includes(s)) wrong.push(`${who} ${path} shows "${s}"`);
      }
    }
    expect(wrong).toEqual([]);

    // The control: the enclosure's own keeper sees its page.
    const keeper = await signInCookie(owner.email, DEMO_PASSWORDS.keeper);
    const own = await page(pages[0]!, keeper);
    expect(own.status).toBe(200);
    expect(own.html).toContain(ENCLOSURE);
  });
});
