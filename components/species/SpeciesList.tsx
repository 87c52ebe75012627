'use client';

import Link from '@/components/ui/Link';
import { useMemo, useState } from 'react';
import { link } from '@/components/ui/styles';
import { Field } from '@/components/ui/Field';
import type { SpeciesSheetDto } from '@/lib/species/schema';
import type { TempUnit } from '@/shared/units';
import { formatRange, formatTempRange } from './format';
import { ProvenanceBadge } from './ProvenanceNote';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { useTempUnit } from '@/components/ui/units';
import { zoneBaskingUvi } from '@/lib/species/consistency';
import type { UvZone } from '@/simulation';
import { Table, type TableColumn } from '@/components/ui/Table';

/** A sheet's zone with the UV Index its basking spot is judged by. */
function zoneCell(zone: number): string {
  const r = zoneBaskingUvi(zone as UvZone);
  return `Zone ${zone}: UVI ${r.min}–${r.max}`;
}

const cell = 'px-4 py-2';
const figure = 'px-4 py-2 tabular-nums';
const head = 'px-4 py-2';

function columnsFor(unit: TempUnit): TableColumn<SpeciesSheetDto>[] {
  return [
    {
      id: 'species',
      header: 'Species',
      headerClassName: head,
      className: cell,
      cell: ({ row: { original: s } }) => (
        <>
          <Link href={`/species/${s.id}`} className={link}>
            {s.commonName}
          </Link>
          <div className="text-caption italic text-basalt-600">{s.scientificName}</div>
        </>
      ),
    },
    {
      id: 'uvZone',
      header: 'UV Index target',
      headerClassName: head,
      className: figure,
      cell: ({ row }) => zoneCell(row.original.uvZone),
    },
    {
      id: 'basking',
      header: 'Basking surface',
      headerClassName: head,
      className: figure,
      cell: ({ row }) => formatTempRange(row.original.baskingSurfaceC, unit),
    },
    {
      id: 'coolAir',
      header: 'Cool side air',
      headerClassName: head,
      className: figure,
      cell: ({ row }) => formatTempRange(row.original.coolAirC, unit),
    },
    {
      id: 'uvbTarget',
      header: 'Rule of thumb (µW/cm²)',
      headerClassName: head,
      className: figure,
      cell: ({ row }) => formatRange(row.original.uvbTargetUw, '', 0).trim(),
    },
    {
      id: 'figures',
      header: 'Figures',
      headerClassName: head,
      className: cell,
      cell: ({ row }) => <ProvenanceBadge sources={row.original.sources} />,
    },
  ];
}

/** The organisation's species sheets: search by either name, temperatures in the chosen unit. */
export function SpeciesList({ sheets }: { sheets: SpeciesSheetDto[] }) {
  const [q, setQ] = useState('');
  const [unit] = useTempUnit();
  const shown = useMemo(() => {
    const needle = q.trim().toLowerCase();
    if (!needle) return sheets;
    return sheets.filter((s) => `${s.commonName} ${s.scientificName}`.toLowerCase().includes(needle));
  }, [q, sheets]);

  const columns = useMemo(() => columnsFor(unit), [unit]);

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <Field
          id="species-search"
          label="Search"
          type="search"
          className="w-full max-w-xs"
          placeholder="Common or scientific name"
          value={q}
          onChange={(e) => setQ(e.target.value)}
        />
        <UnitToggle quantity="temperature" />
      </div>
      {shown.length === 0 ? (
        <p className="rounded-md border border-dashed border-basalt-300 px-4 py-6 text-center text-body text-basalt-600">
          No sheet matches “{q}”.
        </p>
      ) : (
        <Table data={shown} columns={columns} caption="Species sheets" rowKey={(s) => s.id} stack />
      )}
    </div>
  );
}
