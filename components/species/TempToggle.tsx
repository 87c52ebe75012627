'use client';

import { focusRing } from '@/components/ui/styles';
import type { TempUnit } from '@/components/studio/geometry/units';
import { useTempUnit } from './temp-unit';

/** Celsius or Fahrenheit for every temperature on the page. */
export function TempToggle() {
  const [unit, setUnit] = useTempUnit();
  return (
    <div
      role="group"
      aria-label="Temperature unit"
      className="inline-flex rounded-md border border-basalt-300 bg-white p-0.5"
    >
      {(['C', 'F'] as TempUnit[]).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={unit === u}
          onClick={() => setUnit(u)}
          className={`rounded px-3 py-1 text-body ${focusRing} ${
            unit === u ? 'bg-basalt-800 text-white' : 'text-basalt-700 hover:bg-basalt-100'
          }`}
        >
          °{u}
        </button>
      ))}
    </div>
  );
}
