'use client';

import { card } from '@/components/ui/styles';
import { formatLengthRounded } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { UnitToggle } from '@/components/ui/UnitToggle';
import {
  LAMP_FIELD_LABELS,
  LAMP_TYPE_FIELDS,
  type LampTypeDto,
  type LampTypeField,
} from '@/lib/lamp-types/schema';
import { fmt, months, techLabel } from './labels';

/** One catalogue entry: every default with where it comes from. */
export function LampTypeView({ lampType: t }: { lampType: LampTypeDto }) {
  const [unit] = useLengthUnit();
  const values: Record<LampTypeField, string> = {
    uvbAt30: t.uvbAt30 > 0 ? `${fmt(t.uvbAt30)} µW/cm² (new, bare, directly below)` : 'none — no UVB',
    uviPerUvb: t.uvbAt30 > 0 ? fmt(t.uviPerUvb, 3) : '—',
    radiantFraction: `${fmt(t.radiantFraction * 100, 0)} % of the power leaves as radiant heat`,
    beamDeg: t.beamDeg >= 360 ? '360° (bare, all around)' : `${fmt(t.beamDeg, 0)}° full angle, pointing down`,
    reflectorGain: t.reflectorGain > 1 ? `× ${fmt(t.reflectorGain, 2)} inside the beam` : 'none (bare)',
    watts: `${fmt(t.watts, 0)} W`,
    lengthCm:
      t.form === 'tube' && t.lengthCm !== null ? `${formatLengthRounded(t.lengthCm, unit)}` : '— (a bulb)',
    halfLifeMonths: t.decayPoints
      ? `a table of ${t.decayPoints.length} points`
      : months(t.halfLifeMonths, t.uvbAt30 > 0 ? 'the technology’s default' : '— (no UVB)'),
    replaceAfterMonths: months(t.replaceAfterMonths, 'when it fails, or when meter readings say so'),
  };
  return (
    <section className={`${card} p-5`} aria-labelledby="defaults-heading">
      <div className="mb-3 flex items-center justify-between gap-3">
        <h2 id="defaults-heading" className="text-lead font-semibold text-basalt-900">
          {techLabel(t.tech)} — defaults for a new lamp
        </h2>
        <UnitToggle />
      </div>
      <dl className="divide-y divide-basalt-100">
        {LAMP_TYPE_FIELDS.filter((f) => f !== 'lengthCm' || t.form === 'tube').map((f) => (
          <div key={f} className="grid gap-1 py-2 sm:grid-cols-[14rem_1fr]">
            <dt className="font-medium text-basalt-700">{LAMP_FIELD_LABELS[f]}</dt>
            <dd>
              <span className="tabular-nums text-basalt-900">{values[f]}</span>
              <span className="mt-0.5 block text-caption text-basalt-500">
                Source: {t.sources[f] ? t.sources[f] : 'not given'}
              </span>
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
