// "Sign out everywhere" as a person does it: signed in on two devices (two browser contexts), they use the
// account page on one; the other, on its next page, is back at sign-in. Uses the household's owner, whom
// no other browser test signs in as.
import { describe, expect, it } from 'vitest';
import { DEMO_HOUSEHOLD, DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { newContext, screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

describe('sign out everywhere', () => {
  it('ends the session on the other device too', async () => {
    const who = demoSignIn('owner', DEMO_HOUSEHOLD.name);
    const phone = session.page();
    await signIn(phone, who.email, DEMO_PASSWORDS.owner);
    const laptopContext = await newContext(session.browser());
    try {
      const laptop = await laptopContext.newPage();
      await signIn(laptop, who.email, DEMO_PASSWORDS.owner);
      await laptop.goto('/enclosures');
      expect(new URL(laptop.url()).pathname).toBe('/enclosures');

      await phone.getByRole('link', { name: new RegExp(who.name) }).click();
      await phone.waitForURL('**/account');
      await phone.getByRole('heading', { name: 'Your account' }).waitFor();
      await screenshot(phone, 'account-page');
      await phone.getByRole('button', { name: 'Sign out everywhere' }).click();
      await phone.waitForURL((u) => u.pathname === '/sign-in', { timeout: 30_000 });
      await phone.getByText('You were signed out on every device.').waitFor();

      // The other device's very next page is the sign-in page: its cookie no longer counts.
      await laptop.goto('/enclosures');
      expect(new URL(laptop.url()).pathname).toBe('/sign-in');
      // And signing in again works.
      await signIn(laptop, who.email, DEMO_PASSWORDS.owner);
      expect(new URL(laptop.url()).pathname).not.toBe('/sign-in');
    } finally {
      await laptopContext.close();
    }
  });
});
