'use client';

import Link from '@/components/ui/Link';
import { useMemo, useState } from 'react';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { Table, type TableColumn } from '@/components/ui/Table';
import { useLengthUnit } from '@/components/ui/units';
import { link } from '@/components/ui/styles';
import { Select } from '@/components/ui/Select';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { LAMP_TECH_IDS, type LampTech as LampTechId } from '@/simulation';
import { fmt, months, techLabel } from './labels';

const figure = 'px-4 py-2 text-right tabular-nums';
const figureHead = 'px-4 py-2 font-semibold text-right';

function columnsFor(unit: LengthUnit): TableColumn<LampTypeDto>[] {
  return [
    {
      id: 'name',
      header: 'Lamp type',
      className: 'px-4 py-2',
      cell: ({ row: { original: t } }) => (
        <>
          <Link href={`/lamp-catalogue/${t.id}`} className={link}>
            {t.name}
          </Link>
          <div className="text-caption text-basalt-600">
            {techLabel(t.tech)}
            {t.presetKey === null && ' · added by your organisation'}
          </div>
        </>
      ),
    },
    {
      id: 'form',
      header: 'Form',
      className: 'px-4 py-2',
      cell: ({ row: { original: t } }) =>
        t.form === 'tube' && t.lengthCm !== null ? `tube, ${formatLengthRounded(t.lengthCm, unit)}` : 'bulb',
    },
    {
      id: 'uvb',
      header: 'UVB at 30 cm',
      headerClassName: figureHead,
      className: figure,
      cell: ({ row: { original: t } }) => (t.uvbAt30 > 0 ? `${fmt(t.uvbAt30)} µW/cm²` : 'no UVB'),
    },
    {
      id: 'uvi',
      header: 'UVI per µW/cm²',
      headerClassName: figureHead,
      className: figure,
      cell: ({ row: { original: t } }) => (t.uvbAt30 > 0 ? fmt(t.uviPerUvb, 3) : '—'),
    },
    {
      id: 'power',
      header: 'Power',
      headerClassName: figureHead,
      className: figure,
      cell: ({ row: { original: t } }) => `${fmt(t.watts, 0)} W`,
    },
    {
      id: 'beam',
      header: 'Beam',
      headerClassName: figureHead,
      className: figure,
      cell: ({ row: { original: t } }) => `${fmt(t.beamDeg, 0)}°`,
    },
    {
      id: 'replace',
      header: 'Replace',
      className: 'px-4 py-2',
      cell: ({ row: { original: t } }) =>
        months(t.replaceAfterMonths, t.uvbAt30 > 0 ? 'by meter readings' : 'when it fails'),
    },
  ];
}

/** The catalogue, filterable by technology; tube lengths in cm or inches. */
export function LampTypeTable({ lampTypes }: { lampTypes: LampTypeDto[] }) {
  const [tech, setTech] = useState<LampTechId | ''>('');
  const [unit] = useLengthUnit();
  const shown = useMemo(
    () => (tech ? lampTypes.filter((t) => t.tech === tech) : lampTypes),
    [tech, lampTypes],
  );
  const columns = useMemo(() => columnsFor(unit), [unit]);
  const present = LAMP_TECH_IDS.filter((t) => lampTypes.some((l) => l.tech === t));

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <Select
          id="tech-filter"
          label="Technology"
          className="w-full max-w-xs"
          value={tech}
          onChange={(e) => setTech(e.target.value as LampTechId | '')}
        >
          <option value="">All technologies</option>
          {present.map((t) => (
            <option key={t} value={t}>
              {techLabel(t)}
            </option>
          ))}
        </Select>
        <UnitToggle />
      </div>
      <Table data={shown} columns={columns} caption="Lamp types" rowKey={(t) => t.id} head="plain" stack />
    </div>
  );
}
