import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { withdrawConsentByToken } from '@/lib/customers/mutations';

// The token in the address is the permission: never send it on to another site, never index the page.
export const metadata: Metadata = {
  title: 'E-mails stopped',
  referrer: 'no-referrer',
  robots: { index: false, follow: false },
};

type Props = { searchParams: Promise<{ token?: string | string[] }> };

/**
 * Where the one-click link in a customer's e-mails lands (`/api/unsubscribe` sends it here): signed out,
 * it withdraws the consent its signed token names (again, harmlessly, when the link already did) and says
 * so, naming only the shop. A token that does not verify gets the same "not found" as any missing page.
 * Server-rendered, so it works without JavaScript.
 */
export default async function UnsubscribePage({ searchParams }: Props) {
  const { token } = await searchParams;
  const shop = typeof token === 'string' && token.length <= 200 ? await withdrawConsentByToken(token) : null;
  if (shop === null) notFound();
  return (
    <>
      <p className="mb-2 text-caption font-medium uppercase tracking-wide text-moss-700">Lamp test e-mails</p>
      <h1 className="mb-3 text-title">E-mails stopped</h1>
      <p className="mb-4 text-body text-basalt-700">
        You will get no more e-mails about your lamp tests from <strong>{shop}</strong>: no test slips and no
        reminders to test again.
      </p>
      <p className="text-caption text-basalt-500">
        Nothing else was changed. To have the e-mails again, ask the shop. You can close this page.
      </p>
    </>
  );
}
