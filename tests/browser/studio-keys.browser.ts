// The studio's keyboard, help, units and server states in Chromium, so a regression in any of them shows:
// tool keys, select-next, delete, undo/redo (both redo keys), duplicate and nudges; the help panel opened
// with "?" listing every command of the registry; cm/in and °C/°F everywhere including the findings'
// own sentences; a lamp calibrated from the lamp log marked as such; and the banner when someone else
// saved the design meanwhile (409).
import { describe, expect, it } from 'vitest';
import { COMMANDS } from '@/components/studio/commands/registry';
import { exampleDesign } from '@/components/studio/examples/exampleDesign';
import { displayShortcut } from '@/components/studio/commands/shortcuts';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import { enclosureIdByName, readVariant } from './journey-helpers';
import {
  click,
  eventually,
  fieldsSettled,
  keys,
  openStudio,
  setField,
  summary,
  waitSaved,
} from './studio-helpers';

const session = withBrowser();

const objectCount = async (page: Parameters<typeof summary>[0]) =>
  Number(/; (\d+) objects/.exec(await summary(page))?.[1] ?? NaN);

describe('studio keyboard and help (no account)', () => {
  it('runs tools and commands from the keyboard and lists every shortcut in the help panel', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');

    // "?" opens the help panel; it lists every command of the registry with its keys; Escape closes it.
    await keys(page, '?');
    const help = page.getByTestId('help-dialog');
    await help.waitFor({ state: 'visible' });
    const helpText = (await help.textContent()) ?? '';
    for (const c of COMMANDS) {
      // The photo backdrop's commands exist only in the studio of an enclosure (studio-backdrop.browser.ts).
      if (c.group === 'Photo') {
        expect(helpText).not.toContain(c.label);
        continue;
      }
      expect(helpText).toContain(c.label);
      for (const s of c.shortcuts) expect(helpText).toContain(displayShortcut(s, false));
    }
    await screenshot(page, 'studio-help');
    await page.keyboard.press('Escape');
    await help.waitFor({ state: 'hidden' });

    // A tool key picks the tool (the palette shows it pressed); V goes back to selecting.
    await keys(page, 'g');
    await expect
      .poll(() => page.getByTestId('tool-glass').getAttribute('aria-pressed'), eventually)
      .toBe('true');
    await keys(page, 'v');
    await expect
      .poll(() => page.getByTestId('tool-select').getAttribute('aria-pressed'), eventually)
      .toBe('true');
    expect(await page.getByTestId('tool-glass').getAttribute('aria-pressed')).toBe('false');

    // N selects the first object, Delete removes it; Ctrl+Z, Ctrl+Shift+Z and Ctrl+Y step through it.
    expect(await objectCount(page)).toBe(8);
    await keys(page, 'n');
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
      .toBe('uv1');
    await keys(page, 'Delete');
    await expect.poll(() => objectCount(page), eventually).toBe(7);
    expect(await summary(page)).not.toMatch(/T5 fluorescent tube/);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);
    expect(await summary(page)).toMatch(/T5 fluorescent tube/);
    await keys(page, 'Control+Shift+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(7);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);
    await keys(page, 'Control+Y');
    await expect.poll(() => objectCount(page), eventually).toBe(7);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);

    // Ctrl+D duplicates the selection; arrows nudge by 1 cm, with Shift by 10 cm; each is one undo step.
    await keys(page, 'Escape');
    await click(page, 45, 29);
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
      .toBe('b1');
    await keys(page, 'Control+D');
    await expect.poll(() => objectCount(page), eventually).toBe(9);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);
    await click(page, 45, 29);
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
      .toBe('b1');
    await keys(page, 'ArrowRight');
    await expect
      .poll(() => summary(page), eventually)
      .toMatch(/Perch: from \(21 cm, 20 cm\) to \(71 cm, 38 cm\)/);
    await keys(page, 'Shift+ArrowUp');
    await expect
      .poll(() => summary(page), eventually)
      .toMatch(/Perch: from \(21 cm, 30 cm\) to \(71 cm, 48 cm\)/);
    await keys(page, 'Control+Z', 'Control+Z');
    await expect
      .poll(() => summary(page), eventually)
      .toMatch(/Perch: from \(20 cm, 20 cm\) to \(70 cm, 38 cm\)/);
    expect(session.pageErrors()).toEqual([]);
  });

  it('shows every figure in inches and °F when chosen, the findings’ sentences included', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');

    // Nothing selected: the enclosure's width, in cm then in inches (U switches).
    const width = page.getByTestId('enclosure-width');
    expect(await width.inputValue()).toBe('120');
    await keys(page, 'u');
    await expect.poll(() => width.inputValue(), eventually).toBe('47.244');
    expect(await summary(page)).toMatch(/Enclosure 47\.2 in wide, 23\.6 in high/);

    // Shift+U: °F. The species check speaks °F and inches, in its numbers and in its sentences.
    await keys(page, 'Shift+U');
    // The same choices as the rest of the app's pages (their unit toggles read these).
    await expect
      .poll(
        () =>
          page.evaluate(() => [
            localStorage.getItem('baskwell.lengthUnit'),
            localStorage.getItem('baskwell.tempUnit'),
          ]),
        eventually,
      )
      .toEqual(['in', 'F']);
    await page.getByTestId('tab-assess').click();
    await page.getByTestId('species-select').selectOption({ label: 'Bearded dragon' });
    await page.getByTestId('finding-hot-spot').waitFor({ state: 'visible', timeout: 60_000 });
    await fieldsSettled(page);
    const findings = page.locator('[data-testid^=finding-]');
    const texts = await findings.allTextContents();
    expect(texts.length).toBeGreaterThan(4);
    for (const t of texts) {
      expect(t).not.toMatch(/°C/);
      expect(t.replace(/µW\/cm²/g, '')).not.toMatch(/\d\s?cm\b/);
    }
    const hot = (await page.getByTestId('finding-hot-spot').textContent()) ?? '';
    // The sentence and the numbers under it both in °F (a bearded dragon's basking range is above 100 °F).
    expect(hot).toMatch(/about \d+(\.\d)? °F; Bearded dragon needs \d+(\.\d)?–\d+(\.\d)? °F/);
    expect(hot).toMatch(/Target on the species sheet\d+(\.\d)?–\d+(\.\d)? °F/);
    const reach = (await page.getByTestId('finding-lamp-in-reach').textContent()) ?? '';
    expect(reach).toMatch(/within 5\.9 in/);

    // The temperature legend in °F.
    await keys(page, '3');
    await page.getByTestId('tab-fields').click();
    await expect.poll(() => page.getByTestId('legend').textContent(), eventually).toMatch(/°F/);
    await screenshot(page, 'studio-units-imperial');

    // Ageing: the findings follow the slider, and the panel says when the UV stops being enough.
    await page.getByTestId('tab-assess').click();
    expect(await page.getByTestId('months-until-unmet').textContent()).toMatch(/month|even with new lamps/);
    expect(await page.getByTestId('cautions').textContent()).toContain('thermostat');
    await page.getByTestId('ageing-slider').fill('12');
    await page.getByText('With lamps 12 months older than set.').waitFor({ state: 'visible' });
    await screenshot(page, 'studio-scratch-assessment');
    expect(session.pageErrors()).toEqual([]);
  });
});

describe('studio on a stored variant (signed in)', () => {
  it('marks a calibrated lamp, and shows the conflict banner when someone else saved meanwhile', async () => {
    const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 60_000 });
    const enclosureId = await enclosureIdByName(page, 'Desert vivarium');

    // A design whose tube was calibrated in the lamp log (the note the lamp log writes).
    const example = exampleDesign();
    const tube = example.objects.find((o) => o.id === 'uv1')!;
    const lid = example.objects.find((o) => o.id === 'lid')!;
    const design = {
      ...example,
      objects: [
        { ...tube, x: 60, uvbAt30: 48.2, calibration: { at: '2026-11-30', from: '6 meter readings' } },
        lid,
      ],
    };
    const created = await page.evaluate(
      async ({ id, design }) => {
        const res = await fetch(`/api/enclosures/${id}/designs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ name: `Calibrated ${Date.now().toString(36)}`, design }),
        });
        return { status: res.status, body: (await res.json()) as { variant?: { id: number } } };
      },
      { id: enclosureId, design },
    );
    expect(created.status).toBe(201);
    const variantId = created.body.variant!.id;

    await openStudio(page, `/studio/${variantId}`);
    expect(await summary(page)).toMatch(/Lamp: T5 fluorescent tube, 55 cm long, .*, calibrated 30 Nov 2026/);
    await keys(page, 'n');
    const mark = page.getByTestId('lamp-calibrated');
    await expect
      .poll(() => mark.textContent(), eventually)
      .toMatch(/Calibrated 30 Nov 2026.*6 meter readings/);
    // Moving the lamp keeps the mark; typing another output removes it; undo brings it back.
    await keys(page, 'ArrowRight');
    await expect
      .poll(() => summary(page), eventually)
      .toMatch(/at 61 cm from the left, .*calibrated 30 Nov 2026/);
    await screenshot(page, 'studio-calibrated-lamp');
    await setField(page, 'field-uvbAt30', 80);
    await page.getByTestId('lamp-uncalibrated').waitFor({ state: 'visible' });
    expect(await summary(page)).not.toMatch(/calibrated/);
    await keys(page, 'Control+Z');
    await mark.waitFor({ state: 'visible' });
    await waitSaved(page);

    // Offline: the change is kept and shown as such, then saved when the network is back.
    await session.context().setOffline(true);
    await keys(page, 'ArrowRight');
    await expect
      .poll(() => page.getByTestId('save-state').getAttribute('data-state'), eventually)
      .toBe('offline');
    expect(await page.getByTestId('save-state').textContent()).toMatch(/kept on this device/);
    await screenshot(page, 'studio-variant-offline');
    await session.context().setOffline(false);
    await waitSaved(page);
    const afterOffline = await readVariant(page, variantId);
    expect(afterOffline.variant!.design.objects.find((o) => o.id === 'uv1')).toMatchObject({ x: 62 });

    // Someone else saves this variant (another tab, another person): the next save gets 409.
    const theirs = await page.evaluate(async (id) => {
      const got = (await (await fetch(`/api/variants/${id}`)).json()) as {
        variant: { version: number; design: { objects: unknown[] } };
      };
      const design = {
        ...got.variant.design,
        objects: [
          ...got.variant.design.objects,
          { type: 'hide', id: 'their-hide', x: 5, y: 0, width: 25, height: 14 },
        ],
      };
      const res = await fetch(`/api/variants/${id}`, {
        method: 'PUT',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ design, baseVersion: got.variant.version }),
      });
      return res.status;
    }, variantId);
    expect(theirs).toBe(200);
    await keys(page, 'ArrowLeft');
    const banner = page.getByTestId('conflict-banner');
    await banner.waitFor({ state: 'visible', timeout: 60_000 });
    expect(await page.getByTestId('save-state').getAttribute('data-state')).toBe('conflict');
    expect(await banner.textContent()).toMatch(/Someone else saved this design/);
    await screenshot(page, 'studio-conflict');

    // Taking theirs shows their hide, clears the banner, and leaves nothing unsaved.
    await banner.getByRole('button', { name: 'Load theirs' }).click();
    await banner.waitFor({ state: 'hidden' });
    await expect.poll(() => summary(page), eventually).toMatch(/Hide: 25 cm wide/);
    await waitSaved(page);
    expect(session.pageErrors()).toEqual([]);
  });
});
