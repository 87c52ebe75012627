import { describe, expect, it } from 'vitest';
import { screenshot, withBrowser } from './harness';

const session = withBrowser();

describe('landing page', () => {
  it('answers 200 and renders without page errors', async () => {
    const page = session.page();
    const response = await page.goto('/');
    expect(response?.status()).toBe(200);
    await expect.poll(() => page.title()).not.toBe('');
    expect(await page.locator('body').innerText()).toMatch(/\S/);
    await screenshot(page, 'landing');
    expect(session.pageErrors()).toEqual([]);
  });
});
