'use client';
// "Zone distances": how far below this lamp type the model puts each UV zone's basking range, bare,
// with a reflector and through a mesh lid. Computed in the browser by the engine from the type's own
// figures, so an edited type shows its own distances; never a chart's.
import { useMemo } from 'react';
import { card } from '@/components/ui/styles';
import { Table, type TableColumn } from '@/components/ui/Table';
import { useLengthUnit } from '@/components/ui/units';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { formatLengthRounded } from '@/shared/units';
import {
  allZoneDistances,
  UV_ZONES,
  ZONE_SETUP_ASSUMPTIONS,
  ZONE_FARTHEST_CM,
  ZONE_NEAREST_CM,
  type UvZone,
  type ZoneDistances,
  type ZoneSetup,
} from '@/simulation';
import { fmt } from './labels';

const SETUP_LABELS: Record<ZoneSetup, string> = {
  bare: 'Bare',
  reflector: 'With a reflector',
  mesh: 'Through a mesh lid',
};

/** Strongest zone first: the row a basking lamp is usually chosen for. */
const ZONES: UvZone[] = [4, 3, 2, 1];
const HEAD = 'py-1.5 pr-3 font-medium';

export function ZoneDistancesTable({ lampType: t }: { lampType: LampTypeDto }) {
  const [unit] = useLengthUnit();
  const results = useMemo(
    () =>
      allZoneDistances({
        tech: t.tech,
        form: t.form,
        ...(t.form === 'tube' && t.lengthCm !== null ? { length: t.lengthCm } : {}),
        uvbAt30: t.uvbAt30,
        uviPerUvb: t.uviPerUvb,
        beamDeg: t.beamDeg,
        watts: t.watts,
        radiantFraction: t.radiantFraction,
      }),
    [t.tech, t.form, t.lengthCm, t.uvbAt30, t.uviPerUvb, t.beamDeg, t.watts, t.radiantFraction],
  );
  if (!results) return null;
  const cell = (r: ZoneDistances, zone: UvZone) => {
    const z = r.zones.find((x) => x.zone === zone);
    if (!z) return 'not reached';
    const to = formatLengthRounded(z.toCm, unit);
    if (z.toCm >= ZONE_FARTHEST_CM) return `beyond ${formatLengthRounded(z.fromCm, unit)}`;
    if (z.fromCm <= ZONE_NEAREST_CM) return `up to ${to}`;
    return `${formatLengthRounded(z.fromCm, unit).replace(/\s*(cm|in)$/, '')}–${to}`;
  };
  return (
    <section className={`${card} p-5`} aria-labelledby="zone-distances-heading" data-testid="zone-distances">
      <h2 id="zone-distances-heading" className="text-lead font-semibold text-basalt-900">
        Zone distances — this model’s estimate
      </h2>
      <p className="mt-1 text-body text-basalt-700">
        How far below the lamp (straight below its centre) Baskwell’s model puts the UV Index inside each
        zone’s basking range (Ferguson et al. 2010). Computed from this entry’s own figures.
      </p>
      <Table
        data={ZONES}
        columns={[
          {
            id: 'zone',
            header: 'Basking UV Index',
            headerClassName: HEAD,
            className: 'py-1.5 pr-3 font-medium text-basalt-800',
            rowHeader: true,
            cell: ({ row: { original: zone } }) =>
              `Zone ${zone}: UVI ${fmt(UV_ZONES[zone].max[0])}–${fmt(UV_ZONES[zone].max[1])}`,
          },
          ...results.map((r): TableColumn<UvZone> => ({
            id: r.setup,
            header: SETUP_LABELS[r.setup],
            headerClassName: HEAD,
            className: 'py-1.5 pr-3 tabular-nums text-basalt-900',
            cell: ({ row }) => cell(r, row.original),
          })),
        ]}
        caption="Distances below the lamp of each UV zone's basking range"
        rowKey={(zone) => zone}
        head="plain"
        inline
        frameClassName="mt-3 overflow-x-auto"
      />
      <ul className="mt-3 list-disc space-y-0.5 pl-5 text-caption text-basalt-600">
        {results.map((r) => (
          <li key={r.setup}>
            {SETUP_LABELS[r.setup]}: {ZONE_SETUP_ASSUMPTIONS[r.setup]}.
          </li>
        ))}
        <li>
          An empty enclosure with nothing else in the way; walls, décor, the lamp’s age and its fitting change
          these. An estimate — verify with a UV Index meter at the basking spot before an animal goes in.
        </li>
      </ul>
    </section>
  );
}
