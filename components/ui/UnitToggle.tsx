'use client';

import { LENGTH_UNITS, lengthLabel, TEMP_UNITS, tempLabel } from '@/shared/units';
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
  return <UnitButtons quantity="length" value={unit} onChange={setUnit} />;
}

function TemperatureChoice() {
  const [unit, setUnit] = useTempUnit();
  return <UnitButtons quantity="temperature" value={unit} onChange={setUnit} />;
}

/** Each quantity's switch: its name, and its units as the shared units module writes them. */
const QUANTITIES = {
  length: { label: 'Length unit', units: LENGTH_UNITS, text: lengthLabel as (unit: string) => string },
  temperature: { label: 'Temperature unit', units: TEMP_UNITS, text: tempLabel as (unit: string) => string },
};
export type UnitQuantity = keyof typeof QUANTITIES;
type UnitOf<Q extends UnitQuantity> = (typeof QUANTITIES)[Q]['units'][number];

// A page's switch stands on its own; the studio's sits among the toolbar's small buttons.
const LOOK = {
  page: {
    group: 'inline-flex rounded-md border border-basalt-300 bg-white p-0.5',
    button: 'rounded px-3 py-1 text-body',
    off: 'text-basalt-700 hover:bg-basalt-100',
  },
  toolbar: {
    group: 'inline-flex overflow-hidden rounded-md border border-basalt-200',
    button: 'h-7 px-2 text-sm',
    off: 'bg-white text-basalt-700 hover:bg-basalt-100',
  },
};

/** The units of one quantity as pressed buttons. */
export function UnitButtons<Q extends UnitQuantity>({
  quantity,
  value,
  onChange,
  look = 'page',
}: {
  quantity: Q;
  value: UnitOf<Q>;
  /** Called with a unit other than the current one. */
  onChange: (unit: UnitOf<Q>) => void;
  look?: keyof typeof LOOK;
}) {
  const { label, units, text } = QUANTITIES[quantity];
  const style = LOOK[look];
  return (
    <div role="group" aria-label={label} className={style.group}>
      {(units as readonly UnitOf<Q>[]).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={value === u}
          data-testid={`unit-${u}`}
          onClick={() => {
            if (value !== u) onChange(u);
          }}
          className={`${style.button} ${focusRing} ${value === u ? 'bg-basalt-800 text-white' : style.off}`}
        >
          {text(u)}
        </button>
      ))}
    </div>
  );
}
