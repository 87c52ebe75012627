import type { Metadata } from 'next';
import { cookies } from 'next/headers';
import Link from '@/components/ui/Link';
import { EnclosureTable } from '@/components/enclosures/EnclosureTable';
import { FirstDesignHint } from '@/components/enclosures/FirstDesignHint';
import { NewEnclosure } from '@/components/enclosures/NewEnclosure';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button, link } from '@/components/ui/styles';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { listEnclosures } from '@/lib/enclosures/queries';
import { FIRST_HINT_COOKIE, firstDesignHint } from '@/lib/demo/first-hint';
import { memberName } from '@/lib/people/queries';
import { listQueryForView, viewFromSearchParams } from '@/lib/enclosures/list-view';
import { toSearchParams } from '@/lib/list-view';
import { can, roleIn } from '@/lib/permissions';
import { requireMembership, type SearchParamsProps } from '@/lib/session';

export const metadata: Metadata = { title: 'Enclosures' };

export default async function EnclosuresPage({ searchParams }: SearchParamsProps) {
  const session = await requireMembership('/enclosures');
  if (!session) return null;
  const { user, membership, organisationId: orgId } = session;
  const isKeeper = roleIn(user, orgId) === 'keeper';
  const seesAll = can(user, 'read', { kind: 'member', organisationId: orgId });
  const params = await searchParams;
  const keeperFilter =
    seesAll && typeof params.keeper === 'string' ? Number(params.keeper) || undefined : undefined;
  // The first page is rendered here, for the view the address names; the table then fetches others.
  const view = viewFromSearchParams(toSearchParams(params));
  const keeperId = isKeeper ? user.id : keeperFilter;
  const hintDone = (await cookies()).has(FIRST_HINT_COOKIE);
  const [firstPage, filtered, hint] = await Promise.all([
    listEnclosures({ organisationId: orgId, keeperId, ...listQueryForView(view) }),
    // Only the person the address filters by: the new-enclosure form searches people as one types.
    keeperFilter ? memberName(orgId, keeperFilter) : Promise.resolve(null),
    // The hint is about the demo's example enclosure: only an organisation of example data has one.
    hintDone || !membership.exampleData ? Promise.resolve(null) : firstDesignHint(user, orgId),
  ]);
  const filteredName = filtered?.name;

  return (
    <>
      <PageHeader
        title="Enclosures"
        lead={
          isKeeper
            ? 'Your enclosures. Each one holds its lighting and heating designs, lamps and meter readings.'
            : `Every enclosure of ${membership.organisationName}: your customers' and your own. Each holds its designs, lamps and readings.`
        }
        actions={<UnitToggle />}
      />
      {hint && (
        <FirstDesignHint
          cookie={FIRST_HINT_COOKIE}
          designHref={`/designs/${hint.designId}`}
          compareHref={hint.compare ? `/compare?a=${hint.compare.a}&b=${hint.compare.b}` : null}
        />
      )}
      {filteredName && (
        <div className="mb-4">
          <Notice tone="info">
            Showing the enclosures of {filteredName}.{' '}
            <Link href="/enclosures" className={link}>
              Show all
            </Link>
          </Notice>
        </div>
      )}
      <div className="mb-6 flex flex-wrap items-start justify-end gap-3">
        {/* The guided start is the quickest way to a checked set-up; the blank form is for a known design. */}
        <Link href="/enclosures/new" className={button.primary}>
          Guided start
        </Link>
        <NewEnclosure organisationId={orgId} chooseKeeper={seesAll} variant="secondary" />
      </div>
      {firstPage.total === 0 && !view.q ? (
        <EmptyState
          title={filteredName ? `${filteredName} has no enclosures yet` : 'No enclosures yet'}
          action={
            <Link href="/enclosures/new" className={button.primary}>
              Plan a first enclosure with the guided start
            </Link>
          }
        >
          <p>
            An enclosure is the real tank or vivarium an animal lives in: its inside size, the species and the
            animal. The guided start asks for the species and the enclosure and proposes a first lighting and
            heating set-up, checked against the species sheet; or add a blank one with “New enclosure”.
          </p>
          {!isKeeper && (
            <p>Add customers as keepers first (Keepers page) to file enclosures under their names.</p>
          )}
        </EmptyState>
      ) : (
        <QueryProvider>
          <EnclosureTable
            organisationId={orgId}
            keeperId={isKeeper ? undefined : keeperFilter}
            showKeeper={!isKeeper}
            initial={{ view, page: firstPage }}
          />
        </QueryProvider>
      )}
    </>
  );
}
