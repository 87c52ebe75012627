'use client';
import type { ReactNode } from 'react';
import { barrierUvbTransmission, DEFAULT_ROOM_TEMP_C } from '@/simulation';
import { segmentAngleDeg, segmentLength } from '../geometry/objects';
import { formatLength, formatNumber } from '@/shared/units';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { setEnclosure, updateProbe } from '../state/document';
import { kindOf } from '@/shared/object-kinds';
import { focusRing } from './CommandButton';
import type {
  BoxObject,
  Enclosure,
  FoliageObject,
  GlassObject,
  ProbePoint,
  ScreenObject,
  SegmentObject,
} from '../state/types';
import { Grid2, NumberField, Section, SelectField, TextField } from './FormFields';
import { DEFAULT_WALLS, WALL_MATERIALS, WALLS } from '@/simulation';
import { useObjectEdit, useUnits } from './useObjectEdit';
import { checkEnclosureEdit, checkWithinDepth, type FieldKind } from './validate';

type EditField = ReturnType<typeof useObjectEdit>['field'];

/** Where a kind of object sits: its length fields, two to a row, as field key and label. */
const SEGMENT_ENDS = [
  ['x1', 'First end x'],
  ['y1', 'First end y'],
  ['x2', 'Second end x'],
  ['y2', 'Second end y'],
] as const;
const BOX_PLACE = [
  ['x', 'Left x'],
  ['y', 'Bottom y'],
  ['width', 'Width'],
  ['height', 'Height'],
] as const;

function LengthFields({
  fields,
  field,
}: {
  fields: readonly (readonly [key: string, label: string])[];
  field: EditField;
}) {
  return (
    <Grid2>
      {fields.map(([key, label]) => (
        <NumberField key={key} label={label} testId={`field-${key}`} {...field(key, 'length')} />
      ))}
    </Grid2>
  );
}

/**
 * The share of UVB a barrier or planting passes, in a section of its own; left empty, the engine's
 * default for its kind, shown as the fallback.
 */
export function UvbPassedSection({
  o,
  title,
  label,
  hint,
}: {
  o: ScreenObject | GlassObject | FoliageObject;
  title: string;
  label: string;
  hint?: string;
}) {
  const { field } = useObjectEdit(o);
  return (
    <Section title={title}>
      <NumberField
        label={label}
        optional
        fallback={barrierUvbTransmission({ ...o, uvbTransmission: undefined })}
        testId="field-uvbTransmission"
        hint={hint}
        {...field('uvbTransmission', 'percent')}
      />
    </Section>
  );
}

/** A segment's ends, its length and angle, then what its kind adds (`children`). */
export function SegmentForm({ o, children }: { o: SegmentObject; children?: ReactNode }) {
  const { field, units } = useObjectEdit(o);
  return (
    <>
      <Section title="Ends">
        <LengthFields fields={SEGMENT_ENDS} field={field} />
        <p className="text-caption text-basalt-500">
          Length {formatLength(segmentLength(o), units.length)}, angle {formatNumber(segmentAngleDeg(o), 0)}°
        </p>
      </Section>
      {children}
    </>
  );
}

/** A box's place and size, then what its kind adds (`children`). */
export function BoxForm({ o, children }: { o: BoxObject; children?: ReactNode }) {
  const { field } = useObjectEdit(o);
  return (
    <>
      <Section title="Place and size">
        <LengthFields fields={BOX_PLACE} field={field} />
      </Section>
      {children}
    </>
  );
}

export function ProbeForm({ probe }: { probe: ProbePoint }) {
  const { store } = useCommandContext();
  const units = useUnits();
  const edit = (patch: Partial<ProbePoint>) => store.edit((d) => updateProbe(d, probe.id, patch));
  const num = (key: 'x' | 'y') => ({
    kind: 'length' as FieldKind,
    units,
    value: probe[key],
    check: (v: number | undefined) =>
      v === undefined || !Number.isFinite(v) || Math.abs(v) > 5000
        ? { ok: false as const, message: 'Enter a position within 5000 cm.' }
        : { ok: true as const, value: v },
    onCommit: (v: number | undefined) => v !== undefined && edit({ [key]: v }),
  });
  return (
    <Section title="Pinned probe">
      <TextField
        label="Label"
        value={probe.label}
        placeholder="e.g. basking spot"
        onCommit={(label) => edit({ label })}
      />
      <Grid2>
        <NumberField label="x" testId="field-x" {...num('x')} />
        <NumberField label="y" testId="field-y" {...num('y')} />
      </Grid2>
      <p className="text-caption text-basalt-500">Pinned probes are saved with the design.</p>
    </Section>
  );
}

/** Every object as a button: a visible, keyboard-friendly way to pick what is hard to click. */
export function ObjectList() {
  const { store } = useCommandContext();
  const objects = useStudio(store, (s) => s.history.present.objects);
  if (objects.length === 0) {
    return (
      <Section title="Objects">
        <p className="text-sm text-basalt-600">
          The enclosure is empty. Pick an object in the palette and click on the canvas, drag it in, or press
          its key and Enter.
        </p>
      </Section>
    );
  }
  return (
    <Section title={`Objects (${objects.length})`}>
      <ul className="flex flex-col gap-0.5" data-testid="object-list">
        {[...objects].reverse().map((o) => (
          <li key={o.id}>
            <button
              type="button"
              onClick={() => store.setSession({ selection: [o.id] })}
              className={`w-full rounded px-2 py-1 text-left text-sm text-basalt-800 hover:bg-basalt-100 ${focusRing}`}
            >
              {kindOf(o.type).name} <span className="text-basalt-500">{o.name ?? o.id}</span>
            </button>
          </li>
        ))}
      </ul>
      <p className="text-caption text-basalt-500">
        Top of the list is drawn in front. N / Shift+N step through them.
      </p>
    </Section>
  );
}

export function EnclosureForm() {
  const { store } = useCommandContext();
  const enclosure = useStudio(store, (s) => s.history.present.enclosure);
  const units = useUnits();
  const f = (key: Exclude<keyof Enclosure, 'walls'>, kind: FieldKind) => ({
    kind,
    units,
    value: enclosure[key],
    check: (v: number | undefined) => checkEnclosureEdit(enclosure, key, v, kind, units),
    onCommit: (v: number | undefined) => store.edit((d) => setEnclosure(d, { [key]: v })),
  });
  return (
    <Section title="Enclosure">
      <p className="text-caption text-basalt-500">
        Nothing selected: these are the enclosure’s inside measurements.
      </p>
      <Grid2>
        <NumberField label="Width" testId="enclosure-width" {...f('width', 'length')} />
        <NumberField label="Height" testId="enclosure-height" {...f('height', 'length')} />
        <NumberField label="Depth" testId="enclosure-depth" {...f('depth', 'length')} />
        <NumberField
          label="Side view at"
          optional
          fallback={enclosure.depth / 2}
          testId="enclosure-sectionZ"
          hint="From the front: the fields’ plane"
          {...f('sectionZ', 'length')}
          check={(v) =>
            checkWithinDepth(v, enclosure.depth, units) ??
            checkEnclosureEdit(enclosure, 'sectionZ', v, 'length', units)
          }
        />
        <NumberField
          label="Room temperature"
          optional
          fallback={DEFAULT_ROOM_TEMP_C}
          testId="enclosure-roomTemp"
          {...f('roomTempC', 'temp')}
        />
      </Grid2>
      <SelectField
        label="Walls (how much heat they hold in)"
        testId="enclosure-walls"
        value={enclosure.walls ?? DEFAULT_WALLS}
        options={WALL_MATERIALS.map((w) => ({ value: w, label: WALLS[w].label }))}
        onChange={(walls) =>
          store.edit((d) => setEnclosure(d, { walls: walls === DEFAULT_WALLS ? undefined : walls }))
        }
      />
    </Section>
  );
}
