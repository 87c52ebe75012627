'use client';
// Field view controls: which field, opacity, the legend, and the pinned probes with their readings.
import { command, runCommand } from '../commands/registry';
import { FIELD_TITLE, fieldHeading, fieldUnit } from '@/shared/field-scale';
import type { LegendEntry } from '../fields/legend';
import type { SimView } from '../fields/simTypes';
import { formatLength, formatNumber, formatTemp } from '@/shared/units';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { removeObjects } from '../state/document';
import type { FieldView } from '../state/session';
import { focusRing } from './CommandButton';
import { OpacitySlider, Section } from './FormFields';
import { PhotoPanel } from './PhotoPanel';

const FIELDS: { id: FieldView; cmd: string; short: string }[] = [
  { id: 'uvb', cmd: 'fields.uvb', short: 'UVB' },
  { id: 'uvi', cmd: 'fields.uvi', short: 'UV Index' },
  { id: 'tempC', cmd: 'fields.temp', short: 'Temperature' },
];

export function FieldsPanel({ sim, legend }: { sim: SimView; legend: LegendEntry[] }) {
  const ctx = useCommandContext();
  const { store } = ctx;
  const session = useStudio(store, (s) => s.session);
  const probes = useStudio(store, (s) => s.history.present.probes);
  const unit = fieldUnit(session.field, session.tempUnit);
  return (
    <div data-testid="fields-panel">
      <Section title="Field shown">
        <div role="radiogroup" aria-label="Field shown" className="grid grid-cols-3 gap-1">
          {FIELDS.map((f) => (
            <button
              key={f.id}
              type="button"
              role="radio"
              aria-checked={session.field === f.id}
              data-testid={`field-${f.id}`}
              onClick={() => runCommand(command(f.cmd), ctx)}
              className={`rounded-md border px-2 py-1.5 text-sm ${
                session.field === f.id
                  ? 'border-basalt-800 bg-basalt-800 text-white'
                  : 'border-basalt-200 bg-white text-basalt-800 hover:bg-basalt-50'
              } ${focusRing}`}
            >
              {f.short}
            </button>
          ))}
        </div>
        <label className="flex items-center gap-2 text-sm text-basalt-800">
          <input
            type="checkbox"
            className={`h-4 w-4 accent-moss-600 ${focusRing}`}
            checked={session.fieldsVisible}
            onChange={() => runCommand(command('fields.toggle'), ctx)}
          />
          Show the field on the canvas
        </label>
        <OpacitySlider
          label="Opacity"
          value={session.fieldOpacity}
          min={10}
          onChange={(fieldOpacity) => store.setSession({ fieldOpacity })}
        />
      </Section>
      <Section title={fieldHeading(session.field, session.tempUnit)}>
        {legend.length === 0 ? (
          <p className="text-sm text-basalt-600">
            {sim.status === 'error' ? 'No field: the calculation failed.' : 'Computing…'}
          </p>
        ) : (
          <ol
            className="flex flex-col-reverse gap-0.5"
            aria-label={`Legend, ${FIELD_TITLE[session.field]}`}
            data-testid="legend"
          >
            {legend.map((e) => (
              <li key={e.label} className="flex items-center gap-2 text-sm tabular-nums text-basalt-800">
                <span
                  className="inline-block h-4 w-7 rounded-sm border border-basalt-300"
                  style={{ background: e.color }}
                  aria-hidden="true"
                />
                {e.label} {unit}
              </li>
            ))}
          </ol>
        )}
        {session.field === 'uvi' && (
          <p className="text-caption text-basalt-500">
            Band edges follow the UV zones of Ferguson et al. (2010).
          </p>
        )}
        <p className="text-caption text-basalt-600">
          Estimates from a model of these lamps and materials — verify in the enclosure with a UV meter and a
          thermometer.
        </p>
      </Section>
      <PhotoPanel />
      <Section title="Pinned probes">
        {!probes || probes.length === 0 ? (
          <p className="text-sm text-basalt-600">
            None yet. Choose the Probe tool (I) to read values under the pointer; click to pin a probe to the
            design.
          </p>
        ) : (
          <ul className="flex flex-col gap-1.5" data-testid="probe-list">
            {probes.map((p, i) => {
              const r = sim.probeReadings.get(p.id);
              return (
                <li
                  key={p.id}
                  className="flex items-start justify-between gap-2 rounded-md bg-basalt-50 px-2 py-1.5 text-sm"
                >
                  <button
                    type="button"
                    className={`text-left ${focusRing}`}
                    onClick={() => store.setSession({ selection: [p.id], tab: 'inspect' })}
                  >
                    <span className="font-medium text-basalt-900">{p.label ?? `Probe ${i + 1}`}</span>
                    <span className="block text-caption text-basalt-600">
                      at {formatLength(p.x, session.lengthUnit)}, {formatLength(p.y, session.lengthUnit)} up
                    </span>
                    <span
                      className="block tabular-nums text-basalt-800"
                      data-testid={`probe-reading-${p.id}`}
                    >
                      {r
                        ? `UVI ${formatNumber(r.uvi, 2)} · ${formatNumber(r.uvb, 0)} µW/cm² · ${formatTemp(r.tempC, session.tempUnit)}`
                        : 'computing…'}
                    </span>
                  </button>
                  <button
                    type="button"
                    aria-label={`Remove ${p.label ?? `probe ${i + 1}`}`}
                    className={`rounded px-1 text-basalt-500 hover:bg-basalt-200 ${focusRing}`}
                    onClick={() => store.edit((d) => removeObjects(d, [p.id]))}
                  >
                    ✕
                  </button>
                </li>
              );
            })}
          </ul>
        )}
      </Section>
    </div>
  );
}
