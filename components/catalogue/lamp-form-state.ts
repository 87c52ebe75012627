import { LAMP_LIFETIME, LAMP_TECHS, techHalfLifeMonths, type LampTech as LampTechId } from '@/simulation';
import { cmToDisplay, displayToCm, type LengthUnit } from '@/shared/units';
import type { LampTypeDto, LampTypeField, LampTypeInput } from '@/lib/lamp-types/schema';

/** The lamp-type form as typed text; converted to the API's numbers once, on submit. */
export type LampFormState = {
  name: string;
  tech: LampTechId;
  form: 'tube' | 'bulb';
  length: string;
  lengthUnit: LengthUnit;
  uvbAt30: string;
  uviPerUvb: string;
  radiantFraction: string;
  beamDeg: string;
  reflectorGain: string;
  watts: string;
  halfLifeMonths: string;
  replaceAfterMonths: string;
  notes: string;
  sources: Partial<Record<LampTypeField, string>>;
};

const s = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));
const round = (v: number) => String(Math.round(v * 100) / 100);

export function initialLampState(t: LampTypeDto | null, lengthUnit: LengthUnit): LampFormState {
  if (t) {
    return {
      name: t.name,
      tech: t.tech,
      form: t.form,
      length: t.lengthCm === null ? '' : round(cmToDisplay(t.lengthCm, lengthUnit)),
      lengthUnit,
      uvbAt30: s(t.uvbAt30),
      uviPerUvb: s(t.uviPerUvb),
      radiantFraction: s(t.radiantFraction),
      beamDeg: s(t.beamDeg),
      reflectorGain: s(t.reflectorGain),
      watts: s(t.watts),
      halfLifeMonths: s(t.halfLifeMonths),
      replaceAfterMonths: s(t.replaceAfterMonths),
      notes: t.notes ?? '',
      sources: { ...t.sources },
    };
  }
  return { ...techDefaults('t5', lengthUnit), name: '', notes: '', sources: {}, length: '', lengthUnit };
}

/** The engine's defaults for a technology, as form text (a starting point, each to be checked). */
export function techDefaults(tech: LampTechId, lengthUnit: LengthUnit) {
  const d = LAMP_TECHS[tech];
  const life = LAMP_LIFETIME[tech];
  return {
    tech,
    form: d.form,
    lengthUnit,
    uvbAt30: s(d.uvbAt30),
    uviPerUvb: s(d.uviPerUvb),
    radiantFraction: s(d.radiantFraction),
    beamDeg: s(d.beamDeg),
    reflectorGain: '1',
    watts: s(d.watts),
    halfLifeMonths: s(techHalfLifeMonths(tech)),
    replaceAfterMonths: s(life.replaceMonths),
  };
}

export function withLengthUnit(st: LampFormState, unit: LengthUnit): LampFormState {
  if (st.lengthUnit === unit) return st;
  const v = Number(st.length);
  const length =
    st.length.trim() === '' || !Number.isFinite(v)
      ? st.length
      : round(cmToDisplay(displayToCm(v, st.lengthUnit), unit));
  return { ...st, length, lengthUnit: unit };
}

const num = (t: string): number | null => (t.trim() === '' ? null : Number(t.trim().replace(',', '.')));

export function lampPayload(st: LampFormState): Record<keyof Omit<LampTypeInput, 'decayPoints'>, unknown> {
  const len = num(st.length);
  return {
    name: st.name,
    tech: st.tech,
    form: st.form,
    lengthCm:
      st.form === 'bulb'
        ? null
        : len === null || Number.isNaN(len)
          ? len
          : Math.round(displayToCm(len, st.lengthUnit) * 100) / 100,
    uvbAt30: num(st.uvbAt30),
    uviPerUvb: num(st.uviPerUvb),
    radiantFraction: num(st.radiantFraction),
    beamDeg: num(st.beamDeg),
    reflectorGain: num(st.reflectorGain) ?? 1,
    watts: num(st.watts),
    halfLifeMonths: num(st.halfLifeMonths),
    replaceAfterMonths: num(st.replaceAfterMonths),
    notes: st.notes.trim() === '' ? null : st.notes,
    sources: Object.fromEntries(Object.entries(st.sources).filter(([, v]) => v && v.trim() !== '')),
  };
}
