'use client';

import { Table, type TableColumn } from '@/components/ui/Table';
import type { LampRow } from '@/lib/reports/lamps';

const cell = 'px-3 py-2';
const head = 'px-3 py-2 font-medium';
const text = (id: string, header: string, get: (l: LampRow) => string): TableColumn<LampRow> => ({
  id,
  header,
  headerClassName: head,
  className: cell,
  cell: ({ row }) => get(row.original),
});

const columns: TableColumn<LampRow>[] = [
  { ...text('name', 'Lamp', (l) => l.name), className: `${cell} font-medium`, rowHeader: true },
  text('technology', 'Technology', (l) => `${l.technology} (${l.form})`),
  text('position', 'Where', (l) => l.position),
  text('uvb', 'UVB at 30 cm', (l) => l.uvbAt30),
  text('power', 'Power', (l) => l.power),
  text('beam', 'Beam', (l) => l.beam),
  text('reflector', 'Reflector', (l) => l.reflector),
  text('age', 'Age', (l) => l.age),
];

/** The lamps of a design as the model used them (read-only). */
export function SharedLampList({ lamps }: { lamps: LampRow[] }) {
  return (
    <section aria-labelledby="lamps-heading" className="space-y-2">
      <h2 id="lamps-heading" className="text-lead font-semibold text-basalt-900">
        Lamps
      </h2>
      {lamps.length === 0 ? (
        <p className="text-body text-basalt-600">This design has no lamps yet.</p>
      ) : (
        <Table
          data={lamps}
          columns={columns}
          caption="Lamps of this design"
          rowKey={(l) => l.id}
          fullWidth
          rowClassName=""
        />
      )}
    </section>
  );
}
