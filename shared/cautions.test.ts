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

describe('the short-wave UVB caution', () => {
  // Sunlight gives about 0.04 UV Index per µW/cm² and twice that is the point to warn (from memory,
  // simulation/sources/uv.ts).
  it('is given for a lamp type whose spectrum is far from sunlight’s, right after the UV caution', () => {
    const r = applicableCautions({
      techs: ['mercury-vapour'],
      spectra: [{ name: 'Old vapour lamp', uviPerUvb: 0.12, uvbAt30: 100 }],
    });
    expect(ids(r).slice(0, 2)).toEqual(['uv-eyes-skin', 'short-wave-uvb']);
    const c = r[1]!.caution;
    expect(c.text).toMatch(/^Old vapour lamp gives about 0\.12 UV Index per µW\/cm², over twice sunlight’s/);
    expect(c.text).toMatch(/never by a µW\/cm² target/);
    expect(c.source).toMatch(/from memory/);
  });

  it('is not given near sunlight’s ratio, nor for a lamp without UVB', () => {
    const near = applicableCautions({
      techs: ['t5'],
      spectra: [{ name: 'Tube', uviPerUvb: 0.04, uvbAt30: 40 }],
    });
    expect(ids(near)).not.toContain('short-wave-uvb');
    const heat = applicableCautions({
      techs: ['halogen'],
      spectra: [{ name: 'Flood', uviPerUvb: 0.5, uvbAt30: 0 }],
    });
    expect(ids(heat)).not.toContain('short-wave-uvb');
  });

  it('reads a design’s lamps, by name, and is urgent when the check found it', () => {
    const hot = { ...uvTube, id: 'uv2', name: 'Left tube', uviPerUvb: 0.1 } as const;
    const assessment: Pick<Assessment, 'findings'> = {
      findings: [{ id: 'short-wave-uvb', status: 'attention', title: '', message: '', numbers: {} }],
    };
    const r = applicableCautions({ design: design([uvTube, hot]), assessment });
    const sw = r.find((c) => c.caution.id === 'short-wave-uvb')!;
    expect(sw.urgent).toBe(true);
    expect(sw.caution.text).toMatch(/^Left tube gives about 0\.1 UV Index/);
    expect(sw.caution.text).not.toMatch(/\buv\b gives/);
    expect(ids(applicableCautions({ design: design([uvTube]) }))).not.toContain('short-wave-uvb');
  });
});
