'use client';

import Link from '@/components/ui/Link';
import { useMemo, useState } from 'react';
import { input, link } from '@/components/ui/styles';
import type { SpeciesSheetDto } from '@/lib/species/schema';
import { formatRange, formatTempRange } from './format';
import { ProvenanceBadge } from './ProvenanceNote';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { useTempUnit } from '@/components/ui/units';
import { zoneBaskingUvi } from '@/lib/species/consistency';
import type { UvZone } from '@/simulation';

/** A sheet's zone with the UV Index its basking spot is judged by. */
function zoneCell(zone: number): string {
  const r = zoneBaskingUvi(zone as UvZone);
  return `Zone ${zone}: UVI ${r.min}–${r.max}`;
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

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <div className="w-full max-w-xs">
          <label htmlFor="species-search" className="mb-1 block text-body font-medium text-basalt-800">
            Search
          </label>
          <input
            id="species-search"
            type="search"
            className={input}
            placeholder="Common or scientific name"
            value={q}
            onChange={(e) => setQ(e.target.value)}
          />
        </div>
        <UnitToggle quantity="temperature" />
      </div>
      {shown.length === 0 ? (
        <p className="rounded-md border border-dashed border-basalt-300 px-4 py-6 text-center text-body text-basalt-600">
          No sheet matches “{q}”.
        </p>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
          <table className="min-w-full text-left text-body">
            <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
              <tr>
                <th scope="col" className="px-4 py-2">
                  Species
                </th>
                <th scope="col" className="px-4 py-2">
                  UV Index target
                </th>
                <th scope="col" className="px-4 py-2">
                  Basking surface
                </th>
                <th scope="col" className="px-4 py-2">
                  Cool side air
                </th>
                <th scope="col" className="px-4 py-2">
                  Rule of thumb (µW/cm²)
                </th>
                <th scope="col" className="px-4 py-2">
                  Figures
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-basalt-100">
              {shown.map((s) => (
                <tr key={s.id} className="hover:bg-basalt-50">
                  <td className="px-4 py-2">
                    <Link href={`/species/${s.id}`} className={link}>
                      {s.commonName}
                    </Link>
                    <div className="text-caption italic text-basalt-600">{s.scientificName}</div>
                  </td>
                  <td className="px-4 py-2 tabular-nums">{zoneCell(s.uvZone)}</td>
                  <td className="px-4 py-2 tabular-nums">{formatTempRange(s.baskingSurfaceC, unit)}</td>
                  <td className="px-4 py-2 tabular-nums">{formatTempRange(s.coolAirC, unit)}</td>
                  <td className="px-4 py-2 tabular-nums">{formatRange(s.uvbTargetUw, '', 0).trim()}</td>
                  <td className="px-4 py-2">
                    <ProvenanceBadge sources={s.sources} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
