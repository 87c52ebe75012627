'use client';

import { CsvImportPanel } from '@/components/ui/CsvImportPanel';
import { LocalTime } from '@/components/ui/LocalTime';
import { formatValue } from '@/components/lamp-log/format';
import type { CounterCsvRow } from '@/lib/counter/csv';

const EXAMPLE = `customer,lamp_type,first_use,date,distance,distance_unit,value,unit,meter
Alex Example,T5 tube,2025-01-10,2025-03-01,30,cm,41.5,uvb,broadband meter
Alex Example,T5 tube,2025-01-10,2025-09-02,30,cm,30.2,uvb,broadband meter
,Compact UV lamp,2024-11-01,2025-04-12,12,in,1.1,uvi,UV index meter`;

/**
 * Past counter tests from the shop's own records: a preview naming every problem by row and column, and
 * who would be added; then one import of every row, or none.
 */
export function CounterCsvImport({ organisationId }: { organisationId: number }) {
  return (
    <CsvImportPanel<CounterCsvRow>
      url="/api/counter/import"
      target={{ organisationId }}
      fileLabel="CSV file of past counter tests"
      noun={['test', 'tests']}
      help={
        <>
          <p className="mt-1">
            One test per row: <code>customer</code> (their name: an existing customer of that name, or a new
            one, added without consent to e-mails; empty for a walk-in), <code>lamp_type</code> (its name in
            the catalogue), <code>first_use</code> (the first switch-on, 2025-01-10), <code>date</code> of the
            test (2025-03-01 or 2025-03-01 10:30, your local time), <code>distance</code> with{' '}
            <code>distance_unit</code> cm or in, <code>value</code>, <code>unit</code> uvb (µW/cm²) or uvi,
            and an optional <code>meter</code>; optionally <code>through</code>,{' '}
            <code>through_transmission</code> and <code>warmed_up</code> as in the lamp log&apos;s import.
          </p>
          <p className="mt-1">
            Rows with the same customer, lamp type and first use are one lamp; each test gets the verdict the
            counter gives for the readings up to that day.
          </p>
          <pre className="mt-1 overflow-x-auto rounded bg-basalt-50 p-2">{EXAMPLE}</pre>
        </>
      }
      columns={[
        { header: 'Customer', cell: (r) => r.customerName ?? 'walk-in' },
        { header: 'Lamp type', cell: (r) => r.lampTypeName },
        { header: 'Tested', cell: (r) => <LocalTime value={r.takenAt} shown="day" /> },
        {
          header: 'Distance',
          cell: (r) => `${r.distanceCm} cm (${Math.round((r.distanceCm / 2.54) * 10) / 10} in)`,
        },
        { header: 'Value', cell: (r) => formatValue(r.value, r.unit) },
      ]}
      note={(p) => {
        const added = (p.newCustomers ?? []) as string[];
        return added.length > 0 ? (
          <p className="text-caption text-basalt-700">New customers the import adds: {added.join(', ')}.</p>
        ) : null;
      }}
      done={(r, name) =>
        `Imported ${r.imported} test${r.imported === 1 ? '' : 's'} from ${name}: ${r.lampsAdded} new lamp${r.lampsAdded === 1 ? '' : 's'}, ${r.customersAdded} new customer${r.customersAdded === 1 ? '' : 's'}.`
      }
    />
  );
}
