'use client';

import Link from 'next/link';
import { formatSize, useLengthUnit } from '@/components/ui/units';
import { link } from '@/components/ui/styles';
import type { EnclosureView } from './types';

export function EnclosureTable({
  enclosures,
  showKeeper,
}: {
  enclosures: EnclosureView[];
  showKeeper: boolean;
}) {
  const [unit] = useLengthUnit();
  return (
    <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
      <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
        <caption className="sr-only">Enclosures</caption>
        <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
          <tr>
            <th scope="col" className="px-4 py-2 font-semibold">
              Enclosure
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Animal
            </th>
            {showKeeper && (
              <th scope="col" className="px-4 py-2 font-semibold">
                Keeper
              </th>
            )}
            <th scope="col" className="px-4 py-2 font-semibold">
              Size (W × H × D)
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Updated
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {enclosures.map((e) => (
            <tr key={e.id} className="hover:bg-basalt-50">
              <td className="px-4 py-3">
                <Link href={`/enclosures/${e.id}`} className={link}>
                  {e.name}
                </Link>
              </td>
              <td className="px-4 py-3 text-basalt-700">
                {e.animalName || e.speciesName ? (
                  <>
                    {e.animalName && <span className="font-medium text-basalt-900">{e.animalName}</span>}
                    {e.animalName && e.speciesName && ' · '}
                    {e.speciesName}
                  </>
                ) : (
                  <span className="text-basalt-500">Not set</span>
                )}
              </td>
              {showKeeper && <td className="px-4 py-3 text-basalt-700">{e.keeperName ?? 'Former member'}</td>}
              <td className="whitespace-nowrap px-4 py-3 tabular-nums text-basalt-700">
                {formatSize(e.widthCm, e.heightCm, e.depthCm, unit)}
              </td>
              <td className="whitespace-nowrap px-4 py-3 text-basalt-500">
                <time dateTime={e.updatedAt}>{e.updatedAt.slice(0, 10)}</time>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
