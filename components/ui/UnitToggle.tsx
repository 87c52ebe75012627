'use client';

import { LENGTH_UNITS, TEMP_UNITS } from '@/shared/units';
import { useLengthUnit, useTempUnit } from './units';
import { focusRing } from './styles';

/**
 * The unit switch of a page: centimetres or inches for every size (the default), or °C or °F for every
 * temperature. The choice is kept per browser and applies at once everywhere on the page.
 */
export function UnitToggle({ quantity = 'length' }: { quantity?: 'length' | 'temperature' }) {
  return quantity === 'length' ? <LengthChoice /> : <TemperatureChoice />;
}

function LengthChoice() {
  const [unit, setUnit] = useLengthUnit();
  return (
    <Choice label="Length unit" options={LENGTH_UNITS} value={unit} onChange={setUnit} show={(u) => u} />
  );
}

function TemperatureChoice() {
  const [unit, setUnit] = useTempUnit();
  return (
    <Choice
      label="Temperature unit"
      options={TEMP_UNITS}
      value={unit}
      onChange={setUnit}
      show={(u) => `°${u}`}
    />
  );
}

function Choice<T extends string>({
  label,
  options,
  value,
  onChange,
  show,
}: {
  label: string;
  options: readonly T[];
  value: T;
  onChange: (value: T) => void;
  show: (value: T) => string;
}) {
  return (
    <div
      role="group"
      aria-label={label}
      className="inline-flex rounded-md border border-basalt-300 bg-white p-0.5"
    >
      {options.map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={value === u}
          onClick={() => onChange(u)}
          className={`rounded px-3 py-1 text-body ${focusRing} ${
            value === u ? 'bg-basalt-800 text-white' : 'text-basalt-700 hover:bg-basalt-100'
          }`}
        >
          {show(u)}
        </button>
      ))}
    </div>
  );
}
