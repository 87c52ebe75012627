/**
 * Thresholds of the assessment. Each says where it comes from.
 */

/** Basking surface: reachable surface within this share of the highest reachable UV Index (this engine's definition). */
export const BASKING_BAND = 0.8;

/** A basking UVI above the zone's maximum range by more than this factor fails rather than needs attention (engine's choice). */
export const OVER_MAX_FAIL_FACTOR = 1.25;

/**
 * A UV refuge is big enough when it is at least this share of the reachable surface, or when a hide
 * interior is UV-free (common practice, no published source).
 */
export const REFUGE_MIN_SHARE = 0.15;

/** Temperatures within this many °C outside the species' range need attention; further out they fail (engine's choice). */
export const TEMP_MARGIN_C = 3;

/**
 * Lamp within reach: closer than this to a reachable surface with no screen or glass between
 * (common practice, no published source: keep lamps out of reach or behind a guard).
 */
export const LAMP_REACH_CM = 15;

/** Eye-safety caution: an unshielded UV lamp this close to a reachable surface (common practice, no published source). */
export const UV_EYE_CM = 20;

/** Below this UVI nothing counts as reaching the surfaces at all (engine's choice). */
export const NO_UV_UVI = 0.05;

export const ESTIMATE_UV = 'This is an estimate: check it with a UV Index meter at the spot.';
export const ESTIMATE_TEMP =
  'This is an estimate: check it with a thermometer (an infrared thermometer for surfaces).';

/**
 * The shared basking spot must be at least this share of the adult total length: about the head and
 * body, so the whole trunk lies in the heat and the UV at once (a lizard's snout–vent length is roughly
 * 40–50 % of its total length, from memory; "a basking area at least the animal's body length" is
 * common practice, no published source).
 */
export const BASKING_BODY_SHARE = 0.4;

/** Without an adult length on the sheet, the shared basking spot must still be at least this long, cm (engine's choice). */
export const BASKING_MIN_CM = 5;

/**
 * Surfaces hotter than this fail the hot-surface check when no species sheet is chosen: contact burns
 * are reported in reptiles on surfaces above about 50 °C, and the hottest basking targets of desert
 * species reach 55 °C (from memory).
 */
export const GENERAL_HOT_SURFACE_C = 55;
