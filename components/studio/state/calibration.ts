// A lamp's "calibrated" mark: its output figures were fitted to meter readings of the real lamp (the
// design file's optional `calibration` note, written by the lamp log). Pure, shared by the inspector,
// the canvas label and the screen-reader summary.
import type { LampObject } from './types';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/**
 * "30 Nov 2026" from the note's ISO date (the calendar day as written, never shifted by the viewer's
 * time zone); the raw text if it is not a date.
 */
export function calibrationDate(at: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(at);
  const month = m ? MONTHS[Number(m[2]) - 1] : undefined;
  if (!m || !month) return at;
  return `${Number(m[3])} ${month} ${m[1]}`;
}

/** "calibrated 30 Nov 2026", or null for a lamp with the catalogue's figures. */
export function calibrationLabel(lamp: LampObject): string | null {
  return lamp.calibration ? `calibrated ${calibrationDate(lamp.calibration.at)}` : null;
}

/** The lamp's figures that a calibration sets; changing one by hand makes the mark untrue. */
const CALIBRATED_KEYS = ['tech', 'uvbAt30', 'uviPerUvb', 'decay'] as const;

/**
 * The edited lamp, without its calibration mark when the edit replaced a calibrated figure (the output
 * is then the user's, not the meter's). Moving the lamp, its age or its reflector keep the mark.
 */
export function keepCalibrationTrue(before: LampObject, after: LampObject): LampObject {
  if (!after.calibration) return after;
  const changed = CALIBRATED_KEYS.some((k) => JSON.stringify(before[k]) !== JSON.stringify(after[k]));
  if (!changed) return after;
  const { calibration: _dropped, ...rest } = after;
  return rest;
}
