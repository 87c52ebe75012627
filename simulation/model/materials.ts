/**
 * Barrier materials: defaults and helpers.
 */

/**
 * Open-area fraction of a square-weave woven wire cloth: (w / (w + d))², w the aperture and d the wire
 * diameter (ISO 9044, industrial woven wire cloth). A mesh passes about this share of the radiation that
 * falls on it straight on.
 */
export function meshOpenArea(apertureMm: number, wireMm: number): number {
  if (!(apertureMm >= 0) || !(wireMm >= 0) || apertureMm + wireMm <= 0) return 0;
  const r = apertureMm / (apertureMm + wireMm);
  return r * r;
}

/** Default UVB transmission of a mesh screen: a 1.0 mm aperture, 0.25 mm wire cloth (ISO 9044 open area, 0.64). */
export const DEFAULT_SCREEN_UVB_TRANSMISSION = meshOpenArea(1.0, 0.25);

/**
 * Window glass passes no UVB (Duarte et al. 2009, Photodermatol Photoimmunol Photomed 25:181, a study of
 * glass panes). That study says nothing of acrylic, and acrylic varies: some UV-transmitting acrylics pass
 * much of the UVB, so an acrylic pane needs its own measured figure.
 */
export const DEFAULT_GLASS_UVB_TRANSMISSION = 0;

/** Dense planting passes roughly a third of the light (common practice, no published source). */
export const DEFAULT_FOLIAGE_UVB_TRANSMISSION = 0.3;
