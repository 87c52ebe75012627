import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { ExampleDataMark } from '@/components/lamp-log/ExampleDataMark';
import { LampLogTable } from '@/components/lamp-log/LampLogTable';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button, link } from '@/components/ui/styles';
import { filteredEnclosure, lampListQuery, listLamps } from '@/lib/lamp-log/list-queries';
import { memberName } from '@/lib/people/queries';
import { lampListView } from '@/lib/lamp-log/list-view';
import { toSearchParams } from '@/lib/list-view';
import { can, roleIn } from '@/lib/permissions';
import { requireMembership, type SearchParamsProps } from '@/lib/session';
import { LAMP_TECH_IDS, LAMP_TECHS } from '@/simulation';

export const metadata: Metadata = { title: 'Lamp log' };

/**
 * The organisation's lamps (a keeper: their own), most urgent first, from the stored outlooks: the first
 * page is rendered here for the view the address names; the table fetches the others.
 */
export default async function LampLogPage({ searchParams }: SearchParamsProps) {
  const session = await requireMembership('/lamp-log');
  if (!session) return null;
  const { user, membership, organisationId: orgId } = session;
  const isKeeper = roleIn(user, orgId) === 'keeper';
  const seesAll = can(user, 'read', { kind: 'member', organisationId: orgId });
  const view = lampListView.viewFromSearchParams(toSearchParams(await searchParams));
  // The same parse as the API's: one set of rules for what a view may ask.
  const parsed = lampListQuery.safeParse(
    Object.fromEntries(lampListView.apiQueryForView(view, { organisationId: orgId })),
  );
  const query = parsed.success ? parsed.data : lampListQuery.parse({ organisationId: orgId });
  const { keeper, ...rest } = query;
  const keeperId = isKeeper ? user.id : keeper;
  // Asked together: each is a round trip to the database, and none needs another's answer.
  const [firstPage, keeperShown, enclosure] = await Promise.all([
    listLamps({ ...rest, keeperId }),
    // Only the keeper the address filters by: the filter searches the others as one types.
    seesAll && keeper ? memberName(orgId, keeper, 'keeper') : Promise.resolve(null),
    query.enclosure ? filteredEnclosure(orgId, query.enclosure, isKeeper ? user.id : undefined) : null,
  ]);
  // Read with the session's membership: no query of its own.
  const example = membership.exampleData === true;
  const { counts } = firstPage;
  const techs = LAMP_TECH_IDS.map((id) => ({ id, label: LAMP_TECHS[id].label }));
  const unfiltered = !view.q && Object.keys(view.filters ?? {}).length === 0;

  return (
    <>
      <PageHeader
        title="Lamp log"
        lead="The lamps in use in each enclosure, their age, the latest meter reading, the fitted decline, and when the basking zone will fall below the species' need."
        actions={<UnitToggle />}
      />
      {example && <ExampleDataMark />}
      {firstPage.total === 0 && unfiltered && counts.pending === 0 ? (
        <EmptyState
          title="No lamps in use"
          action={
            <Link href="/enclosures" className={button.primary}>
              Go to enclosures
            </Link>
          }
        >
          <p>
            Open an enclosure and choose <strong>Lamps</strong> to log a lamp with its type, the date it was
            first switched on and its hours a day. Then add meter readings as you take them — typed in or
            uploaded as CSV.
          </p>
          <p>
            From the readings Baskwell fits the lamp&apos;s decline, estimates the date the basking zone will
            fall below the species&apos; need, and e-mails a reminder before then.
          </p>
        </EmptyState>
      ) : (
        <div className="space-y-4">
          {(counts.replace > 0 || counts.testSoon > 0) && (
            <Notice tone={counts.replace > 0 ? 'warning' : 'info'}>
              {[
                counts.replace ? `${counts.replace} lamp${counts.replace > 1 ? 's' : ''} to replace` : '',
                counts.testSoon ? `${counts.testSoon} to test with a meter soon` : '',
              ]
                .filter(Boolean)
                .join(', ')}{' '}
              of {counts.inUse} in use. Reminders go out by e-mail to each enclosure&apos;s keeper.
            </Notice>
          )}
          {counts.pending > 0 && (
            <Notice tone="info" title="Some figures are being brought up to date.">
              {counts.pending} lamp{counts.pending > 1 ? 's' : ''} changed (or a new day began) and{' '}
              {counts.pending > 1 ? 'are' : 'is'} being recomputed: the lamps shown are current, but the
              order, the counts and the filters may still move. Reload in a minute.
            </Notice>
          )}
          {enclosure && (
            <Notice tone="info">
              Showing the lamps of {enclosure.name}.{' '}
              <Link href="/lamp-log" className={link}>
                Show all
              </Link>
            </Notice>
          )}
          <QueryProvider>
            <LampLogTable
              organisationId={orgId}
              seesKeepers={seesAll && !isKeeper}
              keeper={keeperShown}
              techs={techs}
              initial={{ view, page: firstPage }}
            />
          </QueryProvider>
        </div>
      )}
      <p className="mt-6 max-w-prose text-caption text-basalt-500">
        Dates and outputs are estimates from your readings (or the lamp type&apos;s usual curve when there are
        few). Readings taken at other distances are brought to 30 cm with the same geometry as the studio.
        Always confirm with a UV meter at the basking spot; a reptile-experienced vet has the last word on an
        animal&apos;s needs.
      </p>
    </>
  );
}
