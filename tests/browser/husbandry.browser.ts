// The husbandry verdicts as a shop's staff member meets them in Chromium: a UV lamp at one end and a
// heat lamp at the other is marked as two places that never meet; a chameleon's mesh lid under a
// halogen is marked as a burn; the safety findings stand above every studio tab and run, like the
// share page's, without a species sheet; and a mercury-vapour lamp that runs too hot is never told to
// be dimmed. Screenshots at desktop (1280×800) and phone (390×844) size.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import { api, eventually, JOURNEY_MS, studioReady } from './journey-helpers';

const session = withBrowser();
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 800 };

type Obj = Record<string, unknown>;
const design = (width: number, height: number, roomTempC: number, objects: Obj[]) => ({
  format: 'baskwell.design',
  version: 2,
  enclosure: { width, height, depth: 60, roomTempC },
  objects,
});

/** A 180 cm vivarium: a T5 tube with a reflector over a perch at the left, a 75 W halogen over a ledge at the right. */
const SPLIT = design(180, 60, 24, [
  {
    type: 'lamp',
    id: 'uv',
    name: 'UV tube',
    tech: 't5',
    form: 'tube',
    x: 40,
    y: 62,
    length: 55,
    uvbAt30: 42.5,
    reflectorGain: 2.2,
    watts: 24,
  },
  {
    type: 'lamp',
    id: 'heat',
    name: 'Heat lamp',
    tech: 'halogen',
    form: 'bulb',
    x: 150,
    y: 63,
    watts: 75,
    beamDeg: 30,
  },
  { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: 60, x2: 180, y2: 60 },
  { type: 'perch', id: 'perch', x1: 25, y1: 44, x2: 55, y2: 44, thickness: 4 },
  { type: 'ledge', id: 'ledge', x: 135, y: 25, width: 30, height: 8 },
  { type: 'hide', id: 'hide', x: 80, y: 0, width: 25, height: 12 },
]);

/** A tall mesh-topped enclosure with a 50 W halogen resting 3 cm above the lid and a branch below. */
const ON_MESH = design(60, 120, 22, [
  {
    type: 'lamp',
    id: 'heat',
    name: 'Basking lamp',
    tech: 'halogen',
    form: 'bulb',
    x: 30,
    y: 123,
    watts: 50,
    beamDeg: 30,
  },
  { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: 120, x2: 60, y2: 120 },
  { type: 'perch', id: 'branch', x1: 10, y1: 70, x2: 50, y2: 70, thickness: 3 },
]);

/** A halogen hung inside a low vivarium, 10 cm over a rock: within reach of any animal. */
const IN_REACH = design(90, 45, 24, [
  {
    type: 'lamp',
    id: 'heat',
    name: 'Low lamp',
    tech: 'halogen',
    form: 'bulb',
    x: 45,
    y: 40,
    watts: 75,
    beamDeg: 30,
  },
  { type: 'ledge', id: 'rock', x: 35, y: 0, width: 20, height: 30 },
]);

/** A self-ballasted mercury-vapour lamp as the only heat, too close to a tall rock. */
const VAPOUR = design(120, 60, 24, [
  {
    type: 'lamp',
    id: 'mv',
    name: 'Vapour lamp',
    tech: 'mercury-vapour',
    form: 'bulb',
    x: 60,
    y: 64,
    watts: 160,
  },
  { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: 60, x2: 120, y2: 60 },
  { type: 'ledge', id: 'rock', x: 45, y: 0, width: 30, height: 40 },
]);

async function signedInStaff(page: Page) {
  await signInAsDemo(page, 'staff', { timeoutMs: 60_000 });
  const s = await api(page, 'GET', '/api/auth/session');
  const user = s.body.user as { memberships: { organisationId: number }[] };
  return user.memberships[0]!.organisationId;
}

/** A new enclosure of the staff member's own, with the species named (or none) and this design. */
async function enclosureWith(
  page: Page,
  organisationId: number,
  name: string,
  speciesName: string | null,
  d: ReturnType<typeof design>,
): Promise<{ variantId: number }> {
  const made = await api(page, 'POST', '/api/enclosures', {
    organisationId,
    name: `${name} ${Date.now().toString(36)}`,
    widthCm: d.enclosure.width,
    heightCm: d.enclosure.height,
    depthCm: 60,
    speciesName,
  });
  expect(made.status, JSON.stringify(made.body)).toBe(201);
  const enclosureId = (made.body.id ?? (made.body.enclosure as { id: number }).id) as number;
  const plan = await api(page, 'POST', `/api/enclosures/${enclosureId}/designs`, {
    name: `${name} plan`,
    design: d,
  });
  expect(plan.status, JSON.stringify(plan.body)).toBe(201);
  return { variantId: (plan.body.variant as { id: number }).id };
}

const findingOf = (page: Page, id: string) => page.getByTestId(`finding-${id}`);
/** The canvas's husbandry marks in words (the summary for screen readers); '' when there are none. */
const husbandryReading = async (page: Page) =>
  (await page.getByTestId('husbandry-reading').allTextContents()).join(' ');

async function openCheck(page: Page, variantId: number) {
  await page.goto(`/studio/${variantId}`);
  await studioReady(page);
  if ((await page.getByTestId('tab-assess').getAttribute('aria-selected')) !== 'true') {
    await page.getByTestId('tab-assess').click();
  }
  await expect
    .poll(() => page.getByTestId('assessment-panel').locator('[data-testid^="finding-"]').count(), eventually)
    .toBeGreaterThan(0);
}

/**
 * The same design opened on a phone: the canvas fits the screen and the panels fold into a sheet under
 * it, opened here on the Check tab.
 */
async function phoneCheck(page: Page) {
  await page.setViewportSize(PHONE);
  await page.reload();
  await studioReady(page);
  const panel = page.getByTestId('assessment-panel');
  await page.getByTestId('tab-assess').click();
  if (!(await panel.isVisible())) await page.getByTestId('tab-assess').click();
  await expect.poll(() => panel.isVisible(), eventually).toBe(true);
  await expect.poll(() => panel.locator('[data-testid^="finding-"]').count(), eventually).toBeGreaterThan(0);
  // The status bar has no room for the whole estimate sentence on a phone; its short form stays in view.
  expect(await page.getByText('Estimates: verify').isVisible()).toBe(true);
}

describe('husbandry verdicts in the studio and on a share', () => {
  it(
    'marks a UV lamp at one end and a heat lamp at the other as a split, on the canvas and in the check',
    async () => {
      const page = session.page();
      const org = await signedInStaff(page);
      const { variantId } = await enclosureWith(page, org, 'Split basking', 'Bearded dragon', SPLIT);
      await openCheck(page, variantId);
      await expect
        .poll(() => page.getByTestId('species-select').locator('option:checked').textContent(), eventually)
        .toBe('Bearded dragon');

      const shared = findingOf(page, 'shared-basking');
      await expect.poll(() => shared.getAttribute('data-status'), eventually).toBe('fail');
      const text = (await shared.textContent()) ?? '';
      expect(text).toMatch(/UV and heat on one basking spot/);
      expect(text).toMatch(/cannot get its UV and its heat in the same place/);
      expect(text).toMatch(/The UV spot \(around 40 cm from the left\) and the hot spot \(around 150 cm\)/);
      expect(text).toMatch(/Baines et al\. 2016/);
      // The failing verdict comes first in the list, above the passes.
      expect(await page.locator('[data-testid^="finding-"]').first().getAttribute('data-testid')).toBe(
        'finding-shared-basking',
      );
      // The UV and heat checks one by one pass: only the shared spot says what is wrong.
      expect(await findingOf(page, 'basking-uvi').getAttribute('data-status')).toBe('pass');
      expect(await findingOf(page, 'hot-spot').getAttribute('data-status')).toBe('pass');
      // The canvas marks both places and the gap between them; its text version says the same.
      await expect
        .poll(() => husbandryReading(page), eventually)
        .toBe(
          'UV and heat apart: no spot gets both. The UV range falls around 40 cm from the left, the basking heat around 150 cm.',
        );
      // The legend keys both marks by colour (their labels on the canvas may be left out where crowded).
      await expect
        .poll(() => page.getByTestId('mark-key').locator('li').allTextContents(), eventually)
        .toEqual(['UV range', 'Basking heat']);
      await screenshot(page, 'husbandry-split-desktop');
      await phoneCheck(page);
      await shared.scrollIntoViewIfNeeded();
      await screenshot(page, 'husbandry-split-phone');
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );

  it(
    'marks a climber’s mesh lid under a halogen as a burn, with the safety banner above every tab',
    async () => {
      const page = session.page();
      const org = await signedInStaff(page);
      const { variantId } = await enclosureWith(page, org, 'Chameleon lid', 'Veiled chameleon', ON_MESH);
      await openCheck(page, variantId);
      const reach = findingOf(page, 'lamp-in-reach');
      await expect.poll(() => reach.getAttribute('data-status'), eventually).toBe('fail');
      expect(await reach.textContent()).toMatch(/heat is within 15 cm \(closest about 3 cm\)/);
      expect(await reach.textContent()).toMatch(/mesh is no guard for a climber/);
      expect(await findingOf(page, 'hot-spot').getAttribute('data-status')).toBe('fail');
      await expect
        .poll(() => husbandryReading(page), eventually)
        .toMatch(/Climbable mesh: burn risk \(heat, 3 cm\) — “Mesh lid”\./);

      const banner = page.getByTestId('safety-banner');
      for (const tab of ['inspect', 'fields', 'assess']) {
        await page.getByTestId(`tab-${tab}`).click();
        await expect.poll(() => banner.isVisible(), eventually).toBe(true);
        expect(await banner.textContent()).toMatch(/Lamps out of reach \(fail\)/);
        // Every tab also keeps the standing estimate note in view.
        expect(await page.getByText('All figures are estimates').first().isVisible()).toBe(true);
        await screenshot(page, `husbandry-climber-${tab}-desktop`);
      }
      // The banner's "Show where" marks the lamp on the canvas.
      await banner.getByRole('button', { name: 'Show where' }).first().click();
      await expect
        .poll(() => page.getByTestId('object-summary').getAttribute('data-highlight'), eventually)
        .toBe('lamp-in-reach');
      await phoneCheck(page);
      expect(await banner.isVisible()).toBe(true);
      await screenshot(page, 'husbandry-climber-phone');

      // The same enclosure for a species that stays off the mesh: no burn to mark, no banner.
      await page.setViewportSize(DESKTOP);
      await page.getByTestId('species-select').selectOption({ label: 'Bearded dragon' });
      await expect.poll(() => reach.getAttribute('data-status'), eventually).toBe('pass');
      await expect.poll(() => banner.count(), eventually).toBe(0);
      await expect.poll(() => husbandryReading(page), eventually).not.toMatch(/Climbable mesh/);
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );

  it(
    'runs the safety checks with no species sheet, in the studio and on the share page',
    async () => {
      const page = session.page();
      const org = await signedInStaff(page);
      const { variantId } = await enclosureWith(page, org, 'No sheet yet', null, ON_MESH);
      await openCheck(page, variantId);
      expect(await page.getByTestId('species-select').inputValue()).toBe('');
      const panel = page.getByTestId('assessment-panel');
      await expect.poll(() => panel.getByText('Safety checks').isVisible(), eventually).toBe(true);
      const reach = findingOf(page, 'lamp-in-reach');
      await expect.poll(() => reach.getAttribute('data-status'), eventually).toBe('attention');
      expect(await reach.textContent()).toMatch(
        /heat is within 15 cm \(about 3 cm\) of mesh an animal could hang from/,
      );
      // The mesh under the halogen is far too hot for a climber; the surfaces off it are not.
      const hot = findingOf(page, 'hot-surface');
      expect(await hot.getAttribute('data-status')).toBe('attention');
      expect(await hot.textContent()).toMatch(/Mesh an animal could hang from gets over 100 °C under a lamp/);
      // These hold only if the animal climbs: listed under Check, not raised as a banner.
      expect(await page.getByTestId('safety-banner').count()).toBe(0);
      await screenshot(page, 'husbandry-no-sheet-desktop');

      // The share page runs the same checks and lists them with the cautions.
      const share = await api(page, 'POST', `/api/variants/${variantId}/shares`, {});
      expect(share.status).toBe(201);
      const path = new URL((share.body.share as { url: string }).url).pathname;
      const visitor = await session.browser().newContext({ viewport: DESKTOP, locale: 'en-GB' });
      const view = await visitor.newPage();
      await view.goto(new URL(path, page.url()).toString());
      const findings = view.getByTestId('share-findings');
      await expect
        .poll(() => findings.getByRole('heading', { name: 'Safety checks' }).count(), eventually)
        .toBe(1);
      const shown = (await findings.textContent()) ?? '';
      expect(shown).toMatch(/No species is attached to this enclosure/);
      expect(shown).toMatch(/Lamps out of reach/);
      expect(shown).toMatch(/of mesh an animal could hang from/);
      expect(shown).toMatch(/Surfaces too hot to touch/);
      expect(shown).toMatch(/Mesh an animal could hang from gets over 100 °C/);
      const cautions = (await view.getByRole('region', { name: 'Safety', exact: true }).textContent()) ?? '';
      expect(cautions).toMatch(/Check this:\s*Lamps within reach burn/);
      expect(cautions).toMatch(/Every figure is an estimate/);
      expect(await view.getByText('Every figure on this page is an estimate').isVisible()).toBe(true);
      await screenshot(view, 'husbandry-share-no-sheet-desktop');
      await view.setViewportSize(PHONE);
      await screenshot(view, 'husbandry-share-no-sheet-phone');
      await visitor.close();

      // A lamp within reach of any animal fails with no sheet too, and the banner stands above every tab.
      const low = await enclosureWith(page, org, 'Low lamp', null, IN_REACH);
      await openCheck(page, low.variantId);
      const banner = page.getByTestId('safety-banner');
      for (const tab of ['inspect', 'fields', 'assess']) {
        await page.getByTestId(`tab-${tab}`).click();
        await expect.poll(() => banner.isVisible(), eventually).toBe(true);
        const said = (await banner.textContent()) ?? '';
        expect(said).toMatch(/Lamps out of reach \(fail\)/);
        expect(said).toMatch(/Surfaces too hot to touch \(fail\)/);
        expect(await page.getByText('All figures are estimates').first().isVisible()).toBe(true);
      }
      await screenshot(page, 'husbandry-no-sheet-in-reach-desktop');
      await phoneCheck(page);
      expect(await banner.isVisible()).toBe(true);
      // On a phone the banner keeps to the titles: the canvas stays in view, the reasons are under Check.
      expect(await banner.getByText(/mesh or glass guard/).isVisible()).toBe(false);
      await screenshot(page, 'husbandry-no-sheet-in-reach-phone');
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );

  it(
    'never tells a keeper to dim a mercury-vapour lamp, even when it runs too hot',
    async () => {
      const page = session.page();
      const org = await signedInStaff(page);
      const { variantId } = await enclosureWith(page, org, 'Vapour lamp', 'Bearded dragon', VAPOUR);
      await openCheck(page, variantId);
      const hot = findingOf(page, 'hot-spot');
      await expect.poll(() => hot.getAttribute('data-status'), eventually).toBe('fail');
      const text = (await hot.textContent()) ?? '';
      expect(text).toMatch(
        /too hot: raise the lamp or use a lower wattage, or replace part of the heat with a separate, thermostat-controlled heat source/,
      );
      expect(text).toMatch(/Switch “Vapour lamp” \(self-ballasted mercury vapour lamp\) by a timer only/);
      expect(text).toMatch(/never dim it or put it on a thermostat/);
      // No finding gives dimming or thermostat advice for it.
      const all = (await page.getByRole('list', { name: 'Findings' }).textContent()) ?? '';
      expect(all).not.toMatch(
        /dimming thermostat|turn down the thermostat|on an? (on\/off )?thermostat with its probe/i,
      );
      await screenshot(page, 'husbandry-vapour-desktop');
      await phoneCheck(page);
      await hot.scrollIntoViewIfNeeded();
      await screenshot(page, 'husbandry-vapour-phone');
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
