import Link from '@/components/ui/Link';
import { BrandMark } from '@/components/shell/BrandMark';
import { button } from '@/components/ui/styles';

export default function NotFound() {
  return (
    <main id="main" className="flex flex-1 flex-col items-center justify-center px-4 py-16 text-center">
      <BrandMark />
      <h1 className="mt-8 text-title">This page does not exist</h1>
      <p className="mt-2 max-w-md text-body text-basalt-600">
        The address may be mistyped, or the thing it pointed to was deleted — or belongs to an account you are
        not signed in with.
      </p>
      <Link href="/" className={`${button.primary} mt-6`}>
        Go to the start page
      </Link>
    </main>
  );
}
