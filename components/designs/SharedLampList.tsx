import type { LampRow } from '@/lib/reports/lamps';

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
        <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
          <table className="w-full text-left text-body">
            <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-500">
              <tr>
                <th className="px-3 py-2 font-medium">Lamp</th>
                <th className="px-3 py-2 font-medium">Technology</th>
                <th className="px-3 py-2 font-medium">Where</th>
                <th className="px-3 py-2 font-medium">UVB at 30 cm</th>
                <th className="px-3 py-2 font-medium">Power</th>
                <th className="px-3 py-2 font-medium">Beam</th>
                <th className="px-3 py-2 font-medium">Reflector</th>
                <th className="px-3 py-2 font-medium">Age</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-basalt-100">
              {lamps.map((l) => (
                <tr key={l.id}>
                  <td className="px-3 py-2 font-medium">{l.name}</td>
                  <td className="px-3 py-2">
                    {l.technology} ({l.form})
                  </td>
                  <td className="px-3 py-2">{l.position}</td>
                  <td className="px-3 py-2">{l.uvbAt30}</td>
                  <td className="px-3 py-2">{l.power}</td>
                  <td className="px-3 py-2">{l.beam}</td>
                  <td className="px-3 py-2">{l.reflector}</td>
                  <td className="px-3 py-2">{l.age}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
