import { describe, expect, it } from 'vitest';
import type { Assessment, Design } from '@/simulation';
import { applicableCautions, CAUTIONS } from './cautions';

const design = (objects: Design['objects']) => ({ objects });
const uvTube = { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 50, y: 62, length: 55 } as const;
const ceramic = { type: 'lamp', id: 'ce', tech: 'ceramic', form: 'bulb', x: 80, y: 62, uvbAt30: 0 } as const;
const ids = (r: ReturnType<typeof applicableCautions>) => r.map((c) => c.caution.id);

describe('applicable cautions', () => {
  it('always says every figure is an estimate', () => {
    expect(ids(applicableCautions({}))).toEqual(['estimate']);
  });

  it('adds the UV caution for a UV lamp and heat cautions for any lamp', () => {
    expect(ids(applicableCautions({ design: design([uvTube]) }))).toEqual([
      'uv-eyes-skin',
      'burns',
      'thermostat',
      'fire',
      'estimate',
    ]);
    expect(ids(applicableCautions({ design: design([ceramic]) }))).toEqual([
      'burns',
      'thermostat',
      'fire',
      'estimate',
    ]);
    expect(ids(applicableCautions({ techs: ['mercury-vapour'] }))).toContain('uv-eyes-skin');
  });

  it('marks a caution urgent when the assessment found its problem', () => {
    const assessment: Pick<Assessment, 'findings'> = {
      findings: [
        { id: 'lamp-in-reach', status: 'fail', title: '', message: '', numbers: {} },
        { id: 'eye-safety', status: 'pass', title: '', message: '', numbers: {} },
        { id: 'hot-spot', status: 'attention', title: '', message: '', numbers: { hotC: 50, targetHi: 45 } },
      ],
    };
    const r = applicableCautions({ design: design([uvTube, ceramic]), assessment });
    const urgent = Object.fromEntries(r.map((c) => [c.caution.id, c.urgent]));
    expect(urgent).toMatchObject({ burns: true, 'uv-eyes-skin': false, thermostat: true, fire: false });
  });

  it('cites the documented UV injuries', () => {
    expect(CAUTIONS['uv-eyes-skin'].source).toBe(
      'Gardiner, Baines & Pandher 2009, J. Zoo Wildl. Med. 40:757',
    );
    expect(CAUTIONS['uv-eyes-skin'].text).toMatch(/photokeratoconjunctivitis/);
    expect(CAUTIONS['uv-eyes-skin'].text).toMatch(/photodermatitis/);
  });
});
