import { describe, expect, it } from 'vitest';
import { LAMP_TECHS } from '@/simulation';
import { LAMP_LOOK, lampKind } from './lamp-look';

describe('lampKind', () => {
  it('follows the technology when a lamp has no figure of its own, as the engine does', () => {
    for (const [tech, t] of Object.entries(LAMP_TECHS)) {
      const kind = lampKind({ tech: tech as keyof typeof LAMP_TECHS });
      expect(kind === 'uv', tech).toBe(t.uvbAt30 > 0);
    }
  });
  it('takes a lamp with its UV output set to 0 as heat, and a ceramic emitter as a dark emitter', () => {
    expect(lampKind({ tech: 'halogen', uvbAt30: 0 })).toBe('heat');
    expect(lampKind({ tech: 'mercury-vapour', uvbAt30: 0 })).toBe('heat');
    expect(lampKind({ tech: 'ceramic' })).toBe('ceramic');
    expect(lampKind({ tech: 't5', uvbAt30: 40 })).toBe('uv');
  });
  it('gives each kind its own colours', () => {
    const fills = Object.values(LAMP_LOOK).map((l) => l.fill);
    expect(new Set(fills).size).toBe(fills.length);
  });
});
