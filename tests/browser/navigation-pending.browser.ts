// Signed-in pages that may answer 404 have no loading skeleton (it would start their response with a
// 200), so a click on a link to one shows a bar across the top of the window until the page is there.
// The test holds the page's request back until it has seen the bar, then lets it through: nothing
// depends on how fast the server answers.
import { describe, expect, it } from 'vitest';
import { signInAsDemo, withBrowser } from './harness';

const session = withBrowser();
const SHEET = /^\/species\/\d+$/;

describe('navigation pending', () => {
  it('shows a bar while the page a link opens is loading, and removes it when the page is there', async () => {
    const page = await signInAsDemo(session.page(), 'staff');
    await page.goto('/species');
    // The list streams in after its skeleton: wait for a sheet's link rather than read the page at `load`.
    const href = await page
      .waitForFunction(
        (source) =>
          [...document.querySelectorAll('main a[href]')]
            .map((a) => a.getAttribute('href') ?? '')
            .find((h) => new RegExp(source).test(h)) ?? null,
        SHEET.source,
        { timeout: 30_000 },
      )
      .then((h) => h.jsonValue() as Promise<string>);

    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(
      (url) => SHEET.test(url.pathname),
      async (route) => {
        await held;
        await route.continue();
      },
    );
    const bar = page.getByTestId('navigation-pending');
    expect(await bar.count()).toBe(0);
    await page.locator(`main a[href="${href}"]`).first().click();
    await bar.waitFor({ state: 'visible' });
    // Still on the list: the bar is the only sign the click was taken.
    expect(new URL(page.url()).pathname).toBe('/species');

    release();
    await page.waitForURL((url) => url.pathname === href);
    await page.getByRole('link', { name: '← All species' }).waitFor();
    await bar.waitFor({ state: 'detached' });
    await page.unrouteAll({ behavior: 'ignoreErrors' });
    expect(session.pageErrors()).toEqual([]);
  });
});
