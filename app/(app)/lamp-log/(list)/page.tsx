import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { LampTable } from '@/components/lamp-log/LampTable';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button, link } from '@/components/ui/styles';
import { todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/outlook-store';
import { lampsOfOrganisation } from '@/lib/lamp-log/store';
import { roleIn } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Lamp log' };

const LIMIT = 500;

/** Every lamp of the organisation (a keeper: their own), most urgent first. */
export default async function LampLogPage({
  searchParams,
}: {
  searchParams: Promise<{ retired?: string; due?: string }>;
}) {
  const user = await requireUser('/lamp-log');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const { retired, due } = await searchParams;
  // `?due=1` is the reminder e-mail's link: only the lamps to replace or test soon.
  const dueOnly = due === '1';
  const includeRetired = retired === '1' && !dueOnly;
  const keeperOnly = roleIn(user, membership.organisationId) === 'keeper' ? user.id : null;
  const rows = await lampsOfOrganisation(membership.organisationId, keeperOnly, {
    limit: LIMIT,
    includeRetired,
  });
  const all = await summarise(rows.slice(0, LIMIT), todayIso());
  const lamps = dueOnly ? all.filter((l) => l.status === 'replace' || l.status === 'test-soon') : all;
  const counts = {
    replace: lamps.filter((l) => l.status === 'replace').length,
    test: lamps.filter((l) => l.status === 'test-soon').length,
  };

  return (
    <>
      <PageHeader
        title="Lamp log"
        lead="The lamps in use in each enclosure, their age, the latest meter reading, the fitted decline, and when the basking zone will fall below the species' need."
        actions={<UnitToggle />}
      />
      {lamps.length === 0 ? (
        <EmptyState
          title={
            dueOnly
              ? 'No lamp needs attention now'
              : includeRetired
                ? 'No lamps logged yet'
                : 'No lamps in use'
          }
          action={
            dueOnly ? (
              <Link href="/lamp-log" className={button.primary}>
                Show every lamp
              </Link>
            ) : (
              <Link href="/enclosures" className={button.primary}>
                Go to enclosures
              </Link>
            )
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
          {(counts.replace > 0 || counts.test > 0) && (
            <Notice tone={counts.replace > 0 ? 'warning' : 'info'}>
              {[
                counts.replace ? `${counts.replace} lamp${counts.replace > 1 ? 's' : ''} to replace` : '',
                counts.test ? `${counts.test} to test with a meter soon` : '',
              ]
                .filter(Boolean)
                .join(', ')}
              . Reminders go out by e-mail to each enclosure&apos;s keeper.
            </Notice>
          )}
          <LampTable lamps={lamps} showEnclosure />
          <p className="text-caption text-basalt-500">
            {rows.length > LIMIT && `Showing the first ${LIMIT} lamps. `}
            {dueOnly ? (
              <Link href="/lamp-log" className={link}>
                Showing the lamps to replace or test soon; show every lamp
              </Link>
            ) : (
              <Link href={includeRetired ? '/lamp-log' : '/lamp-log?retired=1'} className={link}>
                {includeRetired ? 'Hide retired lamps' : 'Show retired lamps too'}
              </Link>
            )}
          </p>
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
