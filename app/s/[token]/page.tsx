import { LocalTime } from '@/components/ui/LocalTime';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CautionList } from '@/components/cautions/CautionList';
import { FindingList } from '@/components/cautions/FindingList';
import { FieldImage, FieldLegend } from '@/components/designs/FieldSvg';
import { staticHtml } from '@/components/designs/static-svg';
import { SharedLampList } from '@/components/designs/SharedLampList';
import { BrandMark } from '@/components/shell/BrandMark';
import { NO_SPECIES_SAFETY_LEAD } from '@/shared/cautions';
import { sizeBoth, tempBoth } from '@/shared/units';
import { sharePicturePath } from '@/lib/variants/share-picture';
import type { SegmentPageProps } from '@/lib/session';
import { findShare } from '@/lib/variants/queries';
import { sharePageView, type SharePageView } from '@/lib/variants/share-page';
import type { FieldName } from '@/simulation';

export const dynamic = 'force-dynamic';

// The token is the key: keep the page out of search engines and out of other sites' referrer logs.
export const metadata: Metadata = {
  title: 'Shared design',
  robots: { index: false, follow: false },
  referrer: 'no-referrer',
};

/**
 * The species check and the cautions: most of the page, and the same for every visitor of a view. Their
 * markup is written once per view (escaped as React escapes it: `staticHtml` writes exactly what
 * React's renderer would) and sent as it is, instead of React rendering and serialising some hundred
 * elements again for each visitor. Plain markup with nothing to hydrate. Keyed by the view held in
 * memory (lib/variants/share-page), which holds the sheet the species name comes from.
 */
const markup = new WeakMap<SharePageView, { findings: string; cautions: string }>();
function heldMarkup(view: SharePageView, speciesName: string | null) {
  let held = markup.get(view);
  if (!held) {
    const { design, result } = view;
    const assessment = result!.assessment;
    held = {
      findings: staticHtml(
        speciesName ? (
          <FindingList assessment={assessment} speciesName={speciesName} />
        ) : (
          <FindingList assessment={assessment} title="Safety checks" lead={NO_SPECIES_SAFETY_LEAD} />
        ),
      ),
      cautions: staticHtml(<CautionList design={design} assessment={assessment} />),
    };
    markup.set(view, held);
  }
  return held;
}

const FIELDS: { id: FieldName; label: string }[] = [
  { id: 'uvi', label: 'UV Index' },
  { id: 'uvb', label: 'UVB' },
  { id: 'tempC', label: 'Temperature' },
];

/**
 * The public, read-only view of one shared variant: its fields, the assessment for the enclosure's
 * species, the lamps and the cautions. No sign-in, no edit controls, nothing else of the organisation.
 * A revoked, expired or unknown link is a plain 404.
 */
export default async function SharedVariantPage({
  params,
  searchParams,
}: SegmentPageProps<{ token: string }>) {
  const { token } = await params;
  // Checked on every view (one query), so a revoked or expired link stops at once.
  const shared = await findShare(token);
  if (!shared) notFound();
  const requested = (await searchParams).field;
  const field = FIELDS.find((f) => f.id === requested)?.id ?? 'uvi';
  // Worked out once per design, field and species sheet, then held in memory (lib/variants/share-page):
  // a link is opened by many people. The field picture itself is its own cacheable file (./picture/…):
  // the page carries only its address.
  const view = await sharePageView(shared, field);
  const { design, lamps, problem, result } = view;
  const species = shared.species;

  if (problem || !result) {
    return (
      <main id="main" className="mx-auto w-full max-w-5xl flex-1 space-y-4 px-4 py-8 sm:px-6">
        <BrandMark />
        <h1 className="text-title text-basalt-900">{shared.variant.name}</h1>
        <p className="text-body text-basalt-700">
          The server does not draw this shared design: {problem} Ask whoever shared it to simplify it in the
          studio.
        </p>
      </main>
    );
  }
  const { scale, figures: f } = result;
  const held = heldMarkup(view, species?.name ?? null);
  const figure = (v: number, digits: number) => Number(v.toFixed(digits)).toString();

  return (
    <main id="main" className="mx-auto w-full max-w-5xl flex-1 space-y-6 px-4 py-8 sm:px-6">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <BrandMark />
        <span className="rounded-full bg-basalt-100 px-3 py-1 text-caption font-medium text-basalt-700">
          Shared read-only
        </span>
      </header>
      <div>
        <h1 className="text-title text-basalt-900">{shared.variant.name}</h1>
        <p className="mt-1 text-body text-basalt-600">
          {shared.designName} · {shared.enclosureName}
          {shared.organisationName ? ` · shared by ${shared.organisationName}` : ''}
        </p>
        <p className="mt-1 text-caption text-basalt-500">
          Enclosure {sizeBoth(design.enclosure)} (width × height × depth), seen from the front, lamps as
          installed.
          {shared.expiresAt ? (
            <>
              {' '}
              This link works until <LocalTime value={shared.expiresAt} />.
            </>
          ) : (
            ''
          )}
        </p>
      </div>

      <p className="rounded-md border border-sand-300 bg-sand-50 px-4 py-3 text-body text-sand-900">
        Every figure on this page is an estimate from a model. Verify it with a UV meter and a thermometer in
        the enclosure before an animal lives with it, and defer to a reptile-experienced vet and local codes.
      </p>

      <section
        aria-labelledby="field-heading"
        className="space-y-3 rounded-lg border border-basalt-200 bg-white p-4"
      >
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="field-heading" className="text-lead font-semibold text-basalt-900">
            {scale.label}
          </h2>
          <nav aria-label="Field" className="inline-flex overflow-hidden rounded-md border border-basalt-300">
            {FIELDS.map((x) => (
              <a
                key={x.id}
                href={`?field=${x.id}`}
                aria-current={x.id === field ? 'true' : undefined}
                className={`px-3 py-1.5 text-body ${x.id === field ? 'bg-basalt-800 text-white' : 'bg-white text-basalt-700 hover:bg-basalt-50'}`}
              >
                {x.label}
              </a>
            ))}
          </nav>
        </div>
        {lamps.length === 0 && (
          <p className="rounded-md border border-dashed border-basalt-300 px-3 py-2 text-body text-basalt-700">
            This variant has no lamps yet, so there is no UV anywhere and every surface sits at the room
            temperature. Ask whoever shared it to add the lamps in the studio.
          </p>
        )}
        <FieldImage
          design={design}
          src={sharePicturePath(token, shared.variant.version, field)}
          alt={`${scale.label} of ${shared.variant.name}`}
        />
        <FieldLegend scale={scale} />
        <p className="text-caption text-basalt-500">
          Lamps are drawn where they hang (orange: UV lamp, red: heat lamp); the white ring marks the hot
          spot, the warmest surface an animal can reach.
        </p>
        <dl className="grid gap-x-6 gap-y-1 text-body sm:grid-cols-2">
          {[
            ['Basking UV Index (highest on a surface)', figure(f.baskingUviMax, 2)],
            ['Basking UVB (highest on a surface)', `${figure(f.baskingUvbMax, 1)} µW/cm²`],
            ['Hot spot (warmest surface)', tempBoth(f.hotSpotC)],
            ['Cool end (coolest floor)', tempBoth(f.coolEndC)],
            ['UV-free share of the cross-section', `${figure(f.uvFreeShare, 0)} %`],
          ].map(([k, v]) => (
            <div key={k} className="flex justify-between gap-3 border-b border-basalt-100 py-1">
              <dt className="text-basalt-600">{k}</dt>
              <dd className="tabular-nums text-basalt-900">{v} (estimate)</dd>
            </div>
          ))}
        </dl>
        <a
          className="inline-block text-body font-medium text-moss-700 underline"
          href={`/s/${token}/report?format=pdf&field=${field}`}
          download
        >
          Download the report (PDF)
        </a>
      </section>

      <div
        className="rounded-lg border border-basalt-200 bg-white p-4"
        data-testid="share-findings"
        dangerouslySetInnerHTML={{ __html: held.findings }}
      />

      <SharedLampList lamps={lamps} />
      <div dangerouslySetInnerHTML={{ __html: held.cautions }} />
    </main>
  );
}
