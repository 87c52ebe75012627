import { describe, expect, it } from 'vitest';
import { bareShare, throughShare } from './reading-setup';

describe('bareShare', () => {
  it('takes out what was between lamp and meter, and reads "not recorded" as the bare lamp', () => {
    const warm = 'yes' as const;
    expect(bareShare({ through: 'nothing', throughTransmission: null, warmedUp: warm })).toEqual({
      ok: true,
      transmission: 1,
      assumedBare: false,
    });
    expect(bareShare({ through: 'lid', throughTransmission: 0.6, warmedUp: warm })).toEqual({
      ok: true,
      transmission: 0.6,
      assumedBare: false,
    });
    expect(
      bareShare({ through: 'not-recorded', throughTransmission: null, warmedUp: 'not-recorded' }),
    ).toEqual({ ok: true, transmission: 1, assumedBare: true });
  });

  it('refuses glass of unknown share and a lamp measured cold', () => {
    expect(bareShare({ through: 'glass', throughTransmission: null, warmedUp: 'yes' }).ok).toBe(false);
    expect(bareShare({ through: 'glass', throughTransmission: 0.3, warmedUp: 'yes' })).toMatchObject({
      ok: true,
      transmission: 0.3,
    });
    expect(bareShare({ through: 'nothing', throughTransmission: null, warmedUp: 'no' }).ok).toBe(false);
  });
});

describe('throughShare', () => {
  it('takes the lid’s share from the lamp unless the reading gives one, and asks a screen for its share', () => {
    expect(throughShare(0.6, 'lid', null)).toEqual({ ok: true, share: 0.6 });
    expect(throughShare(0.6, 'lid', 0.5)).toEqual({ ok: true, share: 0.5 });
    expect(throughShare(null, 'lid', null).ok).toBe(false);
    expect(throughShare(0.6, 'screen', null).ok).toBe(false);
    expect(throughShare(0.6, 'nothing', 0.4)).toEqual({ ok: true, share: null });
    expect(throughShare(null, 'glass', null)).toEqual({ ok: true, share: null });
  });
});
