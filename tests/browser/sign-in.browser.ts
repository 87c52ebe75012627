import { describe, expect, it } from 'vitest';
import { DEMO_SHOP, demoSignIn } from '@/lib/demo/scenario';
import { screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

const keepers = DEMO_SHOP.people.filter((p) => p.role === 'keeper');
const enclosureNames = keepers.flatMap((k) => (k.enclosures ?? []).map((e) => e.name));

describe('signing in', () => {
  it('refuses a wrong password with a clear message and stays signed out', async () => {
    const page = session.page();
    const staff = demoSignIn('staff');
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill(staff.email);
    await page.getByLabel('Password', { exact: true }).fill('not-the-right-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect
      .poll(() => page.getByText('That email and password do not match').count(), { timeout: 20_000 })
      .toBe(1);
    await screenshot(page, 'sign-in-wrong-password');
    // Still signed out: the app sends us back to sign in.
    await page.goto('/enclosures');
    await page.waitForURL((url) => url.pathname === '/sign-in');
    expect(session.pageErrors()).toEqual([]);
  });

  it("a staff member signs in and sees the organisation's enclosures and keepers", async () => {
    const page = session.page();
    const staff = demoSignIn('staff');
    await signIn(page, staff.email, staff.password);
    await page.waitForURL((url) => url.pathname === '/enclosures');
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent(), { timeout: 20_000 })
      .toBe('Enclosures');
    const table = page.getByRole('table', { name: 'Enclosures' });
    for (const name of enclosureNames) {
      expect(await table.getByRole('link', { name, exact: true }).count()).toBe(1);
    }
    // Every keeper of the shop appears as the keeper of their enclosures.
    for (const k of keepers) expect(await table.getByText(k.name).count()).toBeGreaterThan(0);
    // Not the other organisation's.
    expect(await page.getByText('Python vivarium').count()).toBe(0);
    // The size toggle switches the table to inches.
    const first = keepers[0]?.enclosures?.[0];
    if (!first) throw new Error('the demo shop has a keeper with an enclosure');
    await page.getByRole('button', { name: 'in', exact: true }).click();
    const inches = `${Number((first.widthCm / 2.54).toFixed(1))} ×`;
    await expect.poll(() => table.getByText(inches).count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'cm', exact: true }).click();

    // Newest first by default; the Enclosure header sorts A–Z and says so to assistive technology.
    const updatedHeader = table.getByRole('columnheader', { name: 'Updated' });
    expect(await updatedHeader.getAttribute('aria-sort')).toBe('descending');
    await table.getByRole('button', { name: 'Enclosure' }).click();
    const nameHeader = table.getByRole('columnheader', { name: 'Enclosure' });
    await expect.poll(() => nameHeader.getAttribute('aria-sort'), { timeout: 10_000 }).toBe('ascending');
    expect(await updatedHeader.getAttribute('aria-sort')).toBe('none');
    // The server sorts: the rows follow once the page arrives, and the address carries the order.
    const collator = new Intl.Collator(undefined, { sensitivity: 'base', numeric: true });
    const demoShown = async () =>
      (await table.locator('tbody a').allTextContents()).filter((n) => enclosureNames.includes(n));
    await expect.poll(demoShown, { timeout: 10_000 }).toEqual([...enclosureNames].sort(collator.compare));
    expect(new URL(page.url()).searchParams.get('sort')).toBe('name');
    // Back returns to newest first; Forward to A–Z again.
    await page.goBack();
    await expect.poll(() => updatedHeader.getAttribute('aria-sort'), { timeout: 10_000 }).toBe('descending');
    await page.goForward();
    await expect.poll(() => nameHeader.getAttribute('aria-sort'), { timeout: 10_000 }).toBe('ascending');

    // Searching by a keeper's name keeps only their enclosures; a search with no match says so.
    const searched = keepers[1];
    if (!searched) throw new Error('the demo shop has a second keeper');
    const search = page.getByLabel('Search enclosures');
    await search.fill(searched.name);
    const theirs = (searched.enclosures ?? []).map((e) => e.name);
    // The demo's enclosures among the rows, and whether every row is the searched keeper's: files running
    // alongside may give this keeper enclosures of their own.
    const searchedShown = async () => {
      const rows = await table.locator('tbody tr').allInnerTexts();
      return rows.every((r) => r.includes(searched.name)) ? await demoShown() : rows;
    };
    await expect.poll(searchedShown, { timeout: 10_000 }).toEqual([...theirs].sort(collator.compare));
    // The search is in the address too, so a reload (or a shared link) shows the same list.
    await expect
      .poll(() => new URL(page.url()).searchParams.get('q'), { timeout: 10_000 })
      .toBe(searched.name);
    // Back clears the search box with the search; Forward brings both back.
    await page.goBack();
    await expect.poll(() => search.inputValue(), { timeout: 10_000 }).toBe('');
    await expect.poll(demoShown, { timeout: 10_000 }).toEqual([...enclosureNames].sort(collator.compare));
    await page.goForward();
    await expect.poll(() => search.inputValue(), { timeout: 10_000 }).toBe(searched.name);
    await expect.poll(searchedShown, { timeout: 10_000 }).toEqual([...theirs].sort(collator.compare));
    await page.reload();
    expect(await page.getByLabel('Search enclosures').inputValue()).toBe(searched.name);
    await expect.poll(searchedShown, { timeout: 10_000 }).toEqual([...theirs].sort(collator.compare));
    await screenshot(page, 'sign-in-staff-enclosures-search');
    await search.fill('no such enclosure anywhere');
    await expect.poll(() => page.getByText('No enclosure matches').count(), { timeout: 10_000 }).toBe(1);
    await page.getByRole('button', { name: 'Clear the search' }).click();
    await expect
      .poll(() => table.locator('tbody a').count(), { timeout: 10_000 })
      .toBeGreaterThanOrEqual(enclosureNames.length);
    await screenshot(page, 'sign-in-staff-enclosures');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Keepers' }).click();
    await page.waitForURL((url) => url.pathname === '/keepers');
    const list = page.getByRole('table', { name: 'Keepers' });
    await list.waitFor();
    for (const k of keepers) {
      const row = list.getByRole('row').filter({ hasText: k.name });
      const n = k.enclosures?.length ?? 0;
      // At least the demo's: other journeys on the same test database may plan more for a keeper.
      const shown = /(\d+) enclosures?/.exec(await row.innerText())?.[1];
      expect(Number(shown)).toBeGreaterThanOrEqual(n);
    }
    expect(await page.getByRole('button', { name: 'Invite keeper' }).count()).toBe(1);
    await screenshot(page, 'sign-in-staff-keepers');
    expect(session.pageErrors()).toEqual([]);
  });

  it('a keeper sees only their own enclosures and no Keepers page', async () => {
    const page = session.page();
    const keeper = keepers[0];
    if (!keeper) throw new Error('the demo shop has keepers');
    await signIn(page, keeper.email, demoSignIn('keeper').password);
    await page.waitForURL((url) => url.pathname === '/enclosures');
    const table = page.getByRole('table', { name: 'Enclosures' });
    await table.waitFor();
    const own = (keeper.enclosures ?? []).map((e) => e.name);
    const others = enclosureNames.filter((n) => !own.includes(n));
    for (const name of own) expect(await table.getByRole('link', { name, exact: true }).count()).toBe(1);
    for (const name of others) expect(await page.getByText(name, { exact: true }).count()).toBe(0);
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.getByRole('link', { name: 'Keepers' }).count()).toBe(0);
    // Typing the address shows the not-found page (the list is never sent to a keeper).
    await page.goto('/keepers');
    await expect
      .poll(() => page.getByRole('heading', { name: 'Not found' }).count(), { timeout: 20_000 })
      .toBe(1);
    expect(await page.getByText(keepers[1]?.email ?? 'no-such-keeper').count()).toBe(0);
    await page.goto('/enclosures');
    await table.waitFor();
    await screenshot(page, 'sign-in-keeper-enclosures');
  });
});
