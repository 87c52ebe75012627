'use client';

import { useLengthUnit, type LengthUnit } from './units';
import { focusRing } from './styles';

/** Centimetres or inches, for every size on the page. */
export function UnitToggle() {
  const [unit, setUnit] = useLengthUnit();
  return (
    <div
      role="group"
      aria-label="Length unit"
      className="inline-flex rounded-md border border-basalt-300 bg-white p-0.5"
    >
      {(['cm', 'in'] as LengthUnit[]).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={unit === u}
          onClick={() => setUnit(u)}
          className={`rounded px-3 py-1 text-body ${focusRing} ${
            unit === u ? 'bg-basalt-800 text-white' : 'text-basalt-700 hover:bg-basalt-100'
          }`}
        >
          {u}
        </button>
      ))}
    </div>
  );
}
