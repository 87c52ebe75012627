import Link from '@/components/ui/Link';
import { redirect } from 'next/navigation';
import { BrandMark } from '@/components/shell/BrandMark';
import { EnclosureSketch } from '@/components/shell/EnclosureSketch';
import { button } from '@/components/ui/styles';
import { currentUser } from '@/lib/session';

const features = [
  {
    title: 'Plan in a side view',
    text: 'Draw the enclosure to scale — lamps, mesh lid, glass, perches, ledges, hides and plants — and move things around before anything is bought.',
  },
  {
    title: 'See UVB, UV Index and temperature',
    text: 'Estimated fields of UVB (µW/cm²), UV Index and surface temperature across the whole enclosure, recomputed as you drag.',
  },
  {
    title: 'Check against the species',
    text: 'A plain-language check of the basking zone, a UV-free refuge, the UV gradient and the hot and cool ends against the species sheet.',
  },
  {
    title: 'Compare variants',
    text: 'Try a lower lamp, a reflector or another lid side by side on the same colour scale, with a table of what changed.',
  },
  {
    title: 'Share with a customer',
    text: 'Send a read-only link to a customer, a friend or a vet, or export a report with the assessment, the cautions and the lamp list.',
  },
  {
    title: 'Replace lamps on evidence',
    text: 'Keep meter readings and lamp ages; Baskwell fits the decline and tells you when the basking zone will fall short.',
  },
];

export default async function LandingPage() {
  if (await currentUser()) redirect('/enclosures');
  return (
    <>
      <header className="border-b border-basalt-200 bg-white">
        <div className="mx-auto flex max-w-6xl items-center justify-between px-4 py-3 sm:px-6">
          <BrandMark />
          <nav aria-label="Account" className="flex items-center gap-2">
            <Link href="/sign-in" className={button.quiet}>
              Sign in
            </Link>
            <Link href="/sign-up" className={button.primary}>
              Create an account
            </Link>
          </nav>
        </div>
      </header>
      <main id="main" className="flex-1">
        <section className="mx-auto grid max-w-6xl items-center gap-10 px-4 py-14 sm:px-6 md:grid-cols-2">
          <div>
            <h1 className="text-display text-basalt-900">
              The light and heat of an enclosure, planned before it is built.
            </h1>
            <p className="mt-4 text-lead text-basalt-700">
              Baskwell helps reptile shops, rescues, zoos and keepers design the UV lighting and heating of
              reptile and amphibian enclosures, see the UVB, UV Index and temperature they will give, check
              them against the species&apos; needs, and keep the lamps right over the years from real meter
              readings.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <Link href="/sign-up" className={button.primary}>
                Start an organisation
              </Link>
              <Link
                href="/studio-scratch"
                prefetch={false}
                className={button.secondary}
                data-testid="try-studio"
              >
                Try the studio — no account
              </Link>
            </div>
            <p className="mt-3 text-caption text-basalt-500">
              Trying it keeps your design in this browser only; sign in or create an account to save and share
              designs.
            </p>
            <p className="mt-4 text-caption text-basalt-500">
              Invited by a shop or a keeper? Open the link in your invitation e-mail.
            </p>
          </div>
          <div className="rounded-xl border border-basalt-200 bg-basalt-100 p-4">
            <EnclosureSketch />
          </div>
        </section>
        <section aria-labelledby="what" className="border-t border-basalt-200 bg-white">
          <div className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
            <h2 id="what" className="text-title text-basalt-900">
              What you can do with it
            </h2>
            <ul className="mt-6 grid gap-6 sm:grid-cols-2 lg:grid-cols-3">
              {features.map((f) => (
                <li key={f.title} className="rounded-lg border border-basalt-200 bg-basalt-50 p-5">
                  <h3 className="font-semibold text-basalt-900">{f.title}</h3>
                  <p className="mt-2 text-body text-basalt-700">{f.text}</p>
                </li>
              ))}
            </ul>
            <h2 className="mt-12 text-title text-basalt-900">Who it is for</h2>
            <dl className="mt-4 grid gap-4 sm:grid-cols-3">
              <div>
                <dt className="font-semibold">Shop and rescue staff</dt>
                <dd className="text-basalt-700">
                  Design set-ups for customers, test their lamps, tell them when to replace.
                </dd>
              </div>
              <div>
                <dt className="font-semibold">Keepers</dt>
                <dd className="text-basalt-700">
                  Adjust your own designs, log your readings, get replacement reminders.
                </dd>
              </div>
              <div>
                <dt className="font-semibold">Zoos and vets</dt>
                <dd className="text-basalt-700">
                  Keep many enclosures in order and share a design with a colleague.
                </dd>
              </div>
            </dl>
          </div>
        </section>
      </main>
    </>
  );
}
