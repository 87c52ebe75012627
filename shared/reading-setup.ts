/**
 * How a meter reading was taken, and what that means for comparing it with other readings.
 *
 * A meter reads what reaches it. A reading taken through the enclosure's mesh lid reads the lamp times
 * the lid's share of UVB passing; the lamp log brings every reading to the bare lamp (and then to 30 cm)
 * exactly once, here, so the basking estimate can apply the lid exactly once again.
 */

export const READING_THROUGH = ['not-recorded', 'nothing', 'lid', 'screen', 'glass'] as const;
export type ReadingThrough = (typeof READING_THROUGH)[number];

export const READING_WARMED_UP = ['not-recorded', 'yes', 'no'] as const;
export type ReadingWarmedUp = (typeof READING_WARMED_UP)[number];

/** The choices a person picks from (not "not recorded": that is only what older readings say). */
export const THROUGH_LABEL: Record<ReadingThrough, string> = {
  'not-recorded': 'Not recorded',
  nothing: 'Nothing: the bare lamp',
  lid: 'The enclosure’s lid or mesh',
  screen: 'Another screen or mesh',
  glass: 'Glass or acrylic',
};

/** A few words for a table cell. */
export const THROUGH_SHORT: Record<ReadingThrough, string> = {
  'not-recorded': 'set-up not recorded',
  nothing: 'bare lamp',
  lid: 'through the lid',
  screen: 'through a screen',
  glass: 'through glass',
};

export const WARMED_UP_LABEL: Record<ReadingWarmedUp, string> = {
  'not-recorded': 'Not recorded',
  yes: 'Yes, on for several minutes',
  no: 'No, just switched on',
};

/**
 * Minutes a UV lamp should be on before it is measured: fluorescent tubes and mercury-vapour and metal
 * halide lamps take several minutes to reach full output (common practice, no published source).
 */
export const WARM_UP_MINUTES = 10;

export type ReadingSetup = {
  through: ReadingThrough;
  throughTransmission: number | null;
  warmedUp: ReadingWarmedUp;
};

export type BareShare =
  { ok: true; transmission: number; assumedBare: boolean } | { ok: false; reason: string };

/**
 * The share of the bare lamp's UVB that reached the meter, so `reading / transmission` is the bare lamp.
 * Not recorded is read as the bare lamp (`assumedBare`), which is what readings meant before they said
 * so. Glass without a known share, and a lamp measured before it warmed up, cannot be brought to the bare
 * lamp: they are kept and shown but not fitted.
 */
export function bareShare(setup: ReadingSetup): BareShare {
  if (setup.warmedUp === 'no') {
    return {
      ok: false,
      reason: 'taken before the lamp warmed up (reads low): not used in the fit',
    };
  }
  switch (setup.through) {
    case 'not-recorded':
      return { ok: true, transmission: 1, assumedBare: true };
    case 'nothing':
      return { ok: true, transmission: 1, assumedBare: false };
    case 'lid':
    case 'screen':
    case 'glass': {
      const t = setup.throughTransmission;
      if (t !== null && t > 0 && t <= 1) return { ok: true, transmission: t, assumedBare: false };
      return {
        ok: false,
        reason:
          setup.through === 'glass'
            ? 'through glass of unknown UVB share (ordinary glass passes almost none): not used in the fit'
            : 'through something of unknown UVB share: not used in the fit',
      };
    }
  }
}

/**
 * The share of UVB passing what lay between lamp and meter, as stored with a reading. The lid's is the
 * lamp's own setting unless the reading gives one (kept with the reading, so fitting a new lid later does
 * not rewrite old readings); nothing in between, or not recorded, has none; a screen must say its share;
 * glass may (ordinary glass passes almost no UVB, so without a share the reading is not fitted).
 */
export function throughShare(
  lampShare: number | null,
  through: ReadingThrough,
  given: number | null,
): { ok: true; share: number | null } | { ok: false; message: string } {
  switch (through) {
    case 'not-recorded':
    case 'nothing':
      return { ok: true, share: null };
    case 'lid': {
      const share = given ?? lampShare;
      return share === null
        ? {
            ok: false,
            message:
              'This lamp has no lid set between it and the basking spot: give the share of UVB the lid passes (0–1).',
          }
        : { ok: true, share };
    }
    case 'screen':
      return given === null
        ? { ok: false, message: 'Give the share of UVB the screen passes (0–1), e.g. 0.6 for a fine mesh.' }
        : { ok: true, share: given };
    case 'glass':
      return { ok: true, share: given };
  }
}
