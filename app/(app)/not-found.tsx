import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { button } from '@/components/ui/styles';

// The page that called notFound() would otherwise lend it its own title ("Lamp", "Design"): a tab or a
// bookmark would name a thing that is not there.
export const metadata: Metadata = { title: 'Not found' };

export default function AppNotFound() {
  return (
    <div className="rounded-lg border border-basalt-200 bg-white p-8 text-center">
      <h1 className="text-title">Not found</h1>
      <p className="mx-auto mt-2 max-w-md text-body text-basalt-600">
        It may have been deleted, or it belongs to another organisation or another keeper. Check the
        organisation chosen at the top of the page.
      </p>
      <Link href="/enclosures" className={`${button.primary} mt-6`}>
        Go to enclosures
      </Link>
    </div>
  );
}
