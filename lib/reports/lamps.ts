import { LAMP_TECHS, lampZ, resolveLamp, type Design, type LampObject } from '@/simulation';

/** One line of a report's lamp list: what the lamp is and the values the model used for it. */
export type LampRow = {
  id: string;
  name: string;
  technology: string;
  form: 'tube' | 'bulb';
  position: string;
  uvbAt30: string;
  power: string;
  beam: string;
  reflector: string;
  age: string;
};

const num = (v: number, digits = 1) => Number(v.toFixed(digits)).toString();

export function lampRows(design: Design): LampRow[] {
  return design.objects
    .filter((o): o is LampObject => o.type === 'lamp')
    .map((lamp) => {
      const r = resolveLamp(lamp);
      const tech = LAMP_TECHS[lamp.tech];
      return {
        id: lamp.id,
        name: lamp.name ?? lamp.id,
        technology: tech.label,
        form: lamp.form,
        position:
          (lamp.form === 'tube'
            ? `centre x ${num(lamp.x)} cm, y ${num(lamp.y)} cm, ${num(r.length)} cm long`
            : `x ${num(lamp.x)} cm, y ${num(lamp.y)} cm`) +
          `, ${num(lampZ(lamp, design.enclosure))} cm from the front`,
        uvbAt30: r.uvbAt30 > 0 ? `${num(r.uvbAt30)} µW/cm²` : 'none',
        power: `${num(r.watts, 0)} W`,
        beam: `${num(r.beamDeg, 0)}°`,
        reflector: r.reflectorGain > 1 ? `×${num(r.reflectorGain, 2)}` : 'none',
        age: `${num(r.ageMonths)} months`,
      };
    });
}
