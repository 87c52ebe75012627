'use client';

import Link from '@/components/ui/Link';
import { useMemo, useState } from 'react';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { formatLengthRounded } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { input, link } from '@/components/ui/styles';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { LAMP_TECH_IDS, type LampTech as LampTechId } from '@/simulation';
import { fmt, months, techLabel } from './labels';

/** The catalogue, filterable by technology; tube lengths in cm or inches. */
export function LampTypeTable({ lampTypes }: { lampTypes: LampTypeDto[] }) {
  const [tech, setTech] = useState<LampTechId | ''>('');
  const [unit] = useLengthUnit();
  const shown = useMemo(
    () => (tech ? lampTypes.filter((t) => t.tech === tech) : lampTypes),
    [tech, lampTypes],
  );
  const present = LAMP_TECH_IDS.filter((t) => lampTypes.some((l) => l.tech === t));

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <div className="w-full max-w-xs">
          <label htmlFor="tech-filter" className="mb-1 block text-body font-medium text-basalt-800">
            Technology
          </label>
          <select
            id="tech-filter"
            className={input}
            value={tech}
            onChange={(e) => setTech(e.target.value as LampTechId | '')}
          >
            <option value="">All technologies</option>
            {present.map((t) => (
              <option key={t} value={t}>
                {techLabel(t)}
              </option>
            ))}
          </select>
        </div>
        <UnitToggle />
      </div>
      <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
        <table className="min-w-full text-left text-body">
          <thead className="bg-basalt-50 text-caption font-semibold text-basalt-600">
            <tr>
              <th scope="col" className="px-4 py-2">
                Lamp type
              </th>
              <th scope="col" className="px-4 py-2">
                Form
              </th>
              <th scope="col" className="px-4 py-2 text-right">
                UVB at 30 cm
              </th>
              <th scope="col" className="px-4 py-2 text-right">
                UVI per µW/cm²
              </th>
              <th scope="col" className="px-4 py-2 text-right">
                Power
              </th>
              <th scope="col" className="px-4 py-2 text-right">
                Beam
              </th>
              <th scope="col" className="px-4 py-2">
                Replace
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {shown.map((t) => (
              <tr key={t.id} className="hover:bg-basalt-50">
                <td className="px-4 py-2">
                  <Link href={`/lamp-catalogue/${t.id}`} className={link}>
                    {t.name}
                  </Link>
                  <div className="text-caption text-basalt-600">
                    {techLabel(t.tech)}
                    {t.presetKey === null && ' · added by your organisation'}
                  </div>
                </td>
                <td className="px-4 py-2">
                  {t.form === 'tube' && t.lengthCm !== null
                    ? `tube, ${formatLengthRounded(t.lengthCm, unit)}`
                    : 'bulb'}
                </td>
                <td className="px-4 py-2 text-right tabular-nums">
                  {t.uvbAt30 > 0 ? `${fmt(t.uvbAt30)} µW/cm²` : 'no UVB'}
                </td>
                <td className="px-4 py-2 text-right tabular-nums">
                  {t.uvbAt30 > 0 ? fmt(t.uviPerUvb, 3) : '—'}
                </td>
                <td className="px-4 py-2 text-right tabular-nums">{fmt(t.watts, 0)} W</td>
                <td className="px-4 py-2 text-right tabular-nums">{fmt(t.beamDeg, 0)}°</td>
                <td className="px-4 py-2">
                  {months(t.replaceAfterMonths, t.uvbAt30 > 0 ? 'by meter readings' : 'when it fails')}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
