'use client';

import Link from '@/components/ui/Link';
import { LocalTime } from '@/components/ui/LocalTime';
import { link } from '@/components/ui/styles';
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import type { LampSummary } from '@/lib/lamp-log/store';
import { STATUS_RANK } from '@/lib/lamp-log/status';
import { formatAge, formatDay, formatValue } from './format';
import { StatusBadge } from './StatusBadge';

type Row = LampSummary;

export function LampCell({ l }: { l: Row }) {
  return (
    <>
      <Link href={`/lamp-log/${l.id}`} className={link}>
        {l.label}
      </Link>
      <div className="text-caption text-basalt-500">{l.lampType.name}</div>
    </>
  );
}

export function EnclosureCell({ l }: { l: Row }) {
  return (
    <>
      <Link href={`/enclosures/${l.enclosure.id}/lamps`} className={link}>
        {l.enclosure.name}
      </Link>
      {l.enclosure.speciesName && (
        <div className="text-caption text-basalt-500">{l.enclosure.speciesName}</div>
      )}
    </>
  );
}

export function AgeCell({ l }: { l: Row }) {
  return (
    <>
      {formatAge(l.ageDays)}
      <div className="text-caption text-basalt-500">{l.hoursPerDay} h a day</div>
    </>
  );
}

export function LastReadingCell({ l, unit }: { l: Row; unit: LengthUnit }) {
  return l.lastReading ? (
    <>
      {formatValue(l.lastReading.value, l.lastReading.unit)}
      <div className="text-caption text-basalt-500">
        at {formatLengthRounded(l.lastReading.distanceCm, unit)},{' '}
        <LocalTime value={l.lastReading.takenAt} shown="day" />
      </div>
    </>
  ) : (
    <span className="text-basalt-500">None yet</span>
  );
}

export function RemainingCell({ l }: { l: Row }) {
  return (
    <>
      {l.status === 'heat-only' ? '—' : `${Math.round(l.remainingFraction * 100)} %`}
      <div className="text-caption text-basalt-500">
        {l.fit.kind === 'none' ? 'usual curve' : l.fit.certainty === 'fitted' ? 'fitted' : 'uncertain'}
      </div>
    </>
  );
}

export function FallsBelowCell({ l }: { l: Row }) {
  return l.fallsBelowOn ? (
    <>
      <span className="tabular-nums">{formatDay(l.fallsBelowOn)}</span>
      {l.fallsBelowEarliestOn && l.fallsBelowEarliestOn < l.fallsBelowOn && (
        <div className="text-caption text-basalt-500">as early as {formatDay(l.fallsBelowEarliestOn)}</div>
      )}
    </>
  ) : l.basking ? (
    <span className="text-basalt-500">Not within 5 years</span>
  ) : l.missing.length > 0 && l.status !== 'retired' && l.status !== 'heat-only' ? (
    <span className="text-caption text-basalt-500">Needs {l.missing.join('; ')}</span>
  ) : (
    <span className="text-basalt-500">—</span>
  );
}

export function StatusCell({ l }: { l: Row }) {
  return (
    <>
      <StatusBadge status={l.status} label={l.statusLabel} />
      <div className="mt-1 max-w-56 text-caption text-basalt-500">{l.reasons[0]}</div>
    </>
  );
}

export const LAMP_CELL = {
  text: 'px-4 py-3 text-basalt-700',
  figure: 'whitespace-nowrap px-4 py-3 tabular-nums text-basalt-700',
};

/**
 * The lamp log table: one row per lamp with its age, last reading, fitted remaining output, the date the
 * basking zone falls below the species' need (or what is missing to say), and its status.
 */
export function LampTable({ lamps, showEnclosure }: { lamps: LampSummary[]; showEnclosure: boolean }) {
  const [unit] = useLengthUnit();
  const rows = [...lamps].sort(
    (a, b) => STATUS_RANK[a.status] - STATUS_RANK[b.status] || a.label.localeCompare(b.label),
  );
  return (
    <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
      <table className="min-w-full divide-y divide-basalt-200 text-left text-body" data-testid="lamp-table">
        <caption className="sr-only">Lamps, most urgent first</caption>
        <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
          <tr>
            <th scope="col" className="px-4 py-2 font-semibold">
              Lamp
            </th>
            {showEnclosure && (
              <th scope="col" className="px-4 py-2 font-semibold">
                Enclosure
              </th>
            )}
            <th scope="col" className="px-4 py-2 font-semibold">
              Age
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Last reading
            </th>
            <th
              scope="col"
              className="px-4 py-2 font-semibold"
              title="Fitted output today as a share of the output when new"
            >
              Output left
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Basking zone below need
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Status
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {rows.map((l) => (
            <tr key={l.id} className="align-top hover:bg-basalt-50">
              <td className="px-4 py-3">
                <LampCell l={l} />
              </td>
              {showEnclosure && (
                <td className="px-4 py-3">
                  <EnclosureCell l={l} />
                </td>
              )}
              <td className={LAMP_CELL.figure}>
                <AgeCell l={l} />
              </td>
              <td className={LAMP_CELL.figure}>
                <LastReadingCell l={l} unit={unit} />
              </td>
              <td className={LAMP_CELL.figure}>
                <RemainingCell l={l} />
              </td>
              <td className={LAMP_CELL.text}>
                <FallsBelowCell l={l} />
              </td>
              <td className="px-4 py-3">
                <StatusCell l={l} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
