'use client';

import { CsvImportPanel } from '@/components/ui/CsvImportPanel';
import { LocalTime } from '@/components/ui/LocalTime';
import type { CsvRow } from '@/lib/lamp-log/csv';
import { formatValue } from './format';

const EXAMPLE = `lamp,taken_at,distance,distance_unit,value,unit,through,through_transmission,warmed_up,meter,note
Basking tube,2025-03-01 10:30,30,cm,41.5,uvb,nothing,,yes,broadband meter,
Basking tube,2025-03-01 10:32,30,cm,1.7,uvi,nothing,,yes,UV index meter,same spot
Basking tube,2025-03-01 10:35,30,cm,25.1,uvb,lid,0.6,yes,broadband meter,through the lid`;

/**
 * Readings from a CSV file: first a preview with every problem named by row, nothing saved; then one
 * import of all rows, or none (the shared CsvImportPanel).
 */
export function CsvImport({ enclosureId }: { enclosureId: number }) {
  return (
    <CsvImportPanel<CsvRow>
      url="/api/readings/import"
      target={{ enclosureId }}
      fileLabel="CSV file of readings"
      noun={['reading', 'readings']}
      help={
        <>
          <p className="mt-1">
            One reading per row: <code>lamp</code> (its name here), <code>taken_at</code> (2025-03-01 or
            2025-03-01 10:30, your local time), <code>distance</code> with <code>distance_unit</code> cm or
            in, <code>value</code>, <code>unit</code> uvb (µW/cm²) or uvi, and optional <code>meter</code> and{' '}
            <code>note</code>.
          </p>
          <p className="mt-1">
            How each reading was taken (optional columns): <code>through</code> — what was between lamp and
            meter: nothing, lid, screen or glass; <code>through_transmission</code> — the share of UVB it
            passes, 0–1 (for the lid, the lamp&apos;s own setting when empty; a screen must give it);{' '}
            <code>warmed_up</code> — yes or no. Left out or empty, they read &ldquo;not recorded&rdquo;, and
            the lamp log takes such a reading as the bare lamp and says so. Readings through glass of unknown
            share or of a lamp not yet warmed up are kept but not used for the decay.
          </p>
          <pre className="mt-1 overflow-x-auto rounded bg-basalt-50 p-2">{EXAMPLE}</pre>
        </>
      }
      columns={[
        { header: 'Lamp', cell: (r) => r.lampLabel },
        { header: 'Taken', cell: (r) => <LocalTime value={r.takenAt} shown="day" /> },
        { header: 'Distance', cell: (r) => `${r.distanceCm} cm` },
        { header: 'Value', cell: (r) => formatValue(r.value, r.unit) },
      ]}
      done={(r, name) => `Imported ${r.imported} reading${r.imported === 1 ? '' : 's'} from ${name}.`}
    />
  );
}
