// The studio when the server refuses a save for good, in Chromium: a keeper has a design open while
// staff move the enclosure to another keeper (the save answers 404: the keeper may no longer even see
// it), and later while the keeper's session is gone (401). Each time the studio turns view-only and says
// why and what to do, keeps the unsaved design on this device and offers it as a file; "Try saving
// again" saves it once access is back, and signing in again offers it back. Nothing is lost.
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { screenshot, signIn, withBrowser } from './harness';
import { api, demoKeeperEnclosure, readVariant, staffPage } from './journey-helpers';
import { eventually, keys, openStudio, summary, waitSaved } from './studio-helpers';

const session = withBrowser();

type Json = Record<string, unknown>;

const saveState = (page: Page) => page.getByTestId('save-state').getAttribute('data-state');
const lamps = (v: Awaited<ReturnType<typeof readVariant>>) =>
  (v.variant?.design.objects ?? []).filter((o) => o.type === 'lamp');

describe('studio when the server refuses saves', () => {
  it('turns view-only when the enclosure goes to another keeper or the session ends, and loses nothing', async () => {
    const keeperPage = session.page();
    keeperPage.setDefaultTimeout(60_000);
    const keeper = demoSignIn('keeper');

    // Staff give the demo keeper a new enclosure (so the demo's own are left alone) with a design.
    const staff = await staffPage(session.browser());
    const { organisationId, keeperId, enclosureId, variantId } = await demoKeeperEnclosure(staff, 'Handover');
    const keepers = await api(staff, 'GET', `/api/keepers?organisationId=${organisationId}`);
    const other = (keepers.body.items as Json[]).find((k) => k.userId !== keeperId)!.userId as number;

    // The keeper opens it in the studio and places a lamp: saved.
    await signIn(keeperPage, keeper.email, DEMO_PASSWORDS.keeper);
    await openStudio(keeperPage, `/studio/${variantId}`);
    expect(await keeperPage.getByTestId('view-only').count()).toBe(0);
    await keys(keeperPage, 'l', 'Enter');
    await expect.poll(() => summary(keeperPage), eventually).toMatch(/Lamp: T5/);
    await waitSaved(keeperPage);
    expect(lamps(await readVariant(keeperPage, variantId))).toHaveLength(1);

    // Meanwhile staff move the enclosure to another keeper. The keeper's next change is refused.
    expect((await api(staff, 'PATCH', `/api/enclosures/${enclosureId}`, { keeperId: other })).status).toBe(
      200,
    );
    await keys(keeperPage, 'd', 'Enter');
    await expect.poll(() => saveState(keeperPage), eventually).toBe('refused');
    const banner = keeperPage.getByTestId('view-only');
    await banner.waitFor({ state: 'visible' });
    expect(await banner.getAttribute('data-reason')).toBe('no-access');
    expect(await banner.textContent()).toMatch(/You can no longer change this design.*Nothing is lost/);
    expect(await keeperPage.getByTestId('save-state').textContent()).toMatch(/kept on this device/);
    await screenshot(keeperPage, 'studio-refused-no-access');
    // View only: placing tools are off, Delete does nothing, the hide stays on screen.
    expect(await keeperPage.getByTestId('tool-lamp').isDisabled()).toBe(true);
    await keys(keeperPage, 'Delete');
    expect(await summary(keeperPage)).toMatch(/Hide: 25 cm wide/);
    // The unsaved design is on this device and can be downloaded as a design file.
    const backup = await keeperPage.evaluate(
      (id) => localStorage.getItem(`baskwell.studio.unsaved.variant:${id}`),
      variantId,
    );
    expect(JSON.parse(backup!).design.objects.map((o: Json) => o.type)).toContain('hide');
    const [download] = await Promise.all([
      keeperPage.waitForEvent('download'),
      banner.getByRole('button', { name: /Download my changes/ }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/handover-plan.*\.baskwell\.json$/);
    const file = JSON.parse(readFileSync((await download.path())!, 'utf8')) as {
      format: string;
      objects: Json[];
    };
    expect(file.format).toBe('baskwell.design');
    expect(file.objects.map((o) => o.type).sort()).toEqual(['hide', 'lamp', 'screen']);

    // Handed back, "Try saving again" saves the kept design and the studio is editable again.
    expect((await api(staff, 'PATCH', `/api/enclosures/${enclosureId}`, { keeperId })).status).toBe(200);
    await banner.getByRole('button', { name: 'Try saving again' }).click();
    await waitSaved(keeperPage);
    await banner.waitFor({ state: 'detached' });
    expect(await keeperPage.getByTestId('tool-lamp').isDisabled()).toBe(false);
    const handedBack = await readVariant(keeperPage, variantId);
    expect(handedBack.variant!.design.objects.map((o) => o.type).sort()).toEqual(['hide', 'lamp', 'screen']);

    // The session ends (cookies gone, as after signing out elsewhere): the next change is refused with 401.
    await session.context().clearCookies();
    await keys(keeperPage, 'Delete');
    await expect.poll(() => summary(keeperPage), eventually).not.toMatch(/Hide:/);
    await expect.poll(() => saveState(keeperPage), eventually).toBe('refused');
    expect(await banner.getAttribute('data-reason')).toBe('signed-out');
    expect(await banner.textContent()).toMatch(/You are signed out.*kept on this device/);
    await screenshot(keeperPage, 'studio-refused-signed-out');

    // Signing in again from the banner comes back to the studio, which offers the kept change back.
    await banner.getByRole('link', { name: 'Sign in again' }).click();
    await keeperPage.waitForURL(/\/sign-in/);
    await keeperPage.getByLabel('Email').fill(keeper.email);
    await keeperPage.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORDS.keeper);
    await keeperPage.getByRole('button', { name: 'Sign in' }).click();
    await keeperPage.waitForURL(new RegExp(`/studio/${variantId}$`));
    const restore = keeperPage.getByTestId('restore-banner');
    await restore.waitFor({ state: 'visible', timeout: 60_000 });
    expect(await summary(keeperPage)).toMatch(/Hide:/);
    await restore.getByRole('button', { name: 'Restore them' }).click();
    await expect.poll(() => summary(keeperPage), eventually).not.toMatch(/Hide:/);
    await waitSaved(keeperPage);
    const after = await readVariant(keeperPage, variantId);
    expect(after.variant!.design.objects.map((o) => o.type).sort()).toEqual(['lamp', 'screen']);
    expect(session.pageErrors()).toEqual([]);
    await staff.context().close();
  });
});
