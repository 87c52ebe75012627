/**
 * UV Index and the erythema action spectrum.
 * UVI = 40 m²/W × erythemally weighted irradiance (WHO, Global Solar UV Index: A Practical Guide, 2002),
 * so 0.025 W/m² of erythemally weighted irradiance is UVI 1. The weighting is the ISO/CIE 17166 erythema
 * reference action spectrum.
 */

export const UVI_PER_ERYTHEMAL_W_M2 = 40;

export function uviFromErythemal(wPerM2: number): number {
  return UVI_PER_ERYTHEMAL_W_M2 * wPerM2;
}

/** ISO/CIE 17166 erythema reference action spectrum (relative, 1 at and below 298 nm, 0 beyond 400 nm). */
export function erythemaWeight(nm: number): number {
  if (nm <= 298) return 1;
  if (nm <= 328) return Math.pow(10, 0.094 * (298 - nm));
  if (nm <= 400) return Math.pow(10, 0.015 * (140 - nm));
  return 0;
}

/**
 * UV Index per µW/cm² of broadband UVB for a lamp's spectrum, given as [nm, spectral irradiance] samples
 * (any consistent unit; trapezoid rule). `band` is the sensitivity band of the broadband meter the
 * µW/cm² figure refers to (280–315 nm, CIE UVB, unless stated).
 */
export function uviPerUvbFromSpectrum(
  samples: [number, number][],
  band: [number, number] = [280, 315],
): number {
  let erythemal = 0;
  let uvb = 0;
  for (let k = 1; k < samples.length; k++) {
    const [l0, e0] = samples[k - 1]!;
    const [l1, e1] = samples[k]!;
    const dl = l1 - l0;
    if (!(dl > 0)) continue;
    erythemal += ((e0 * erythemaWeight(l0) + e1 * erythemaWeight(l1)) / 2) * dl;
    // Share of this interval inside the meter's band, with linear interpolation at the band edges.
    const a = Math.max(l0, band[0]);
    const b = Math.min(l1, band[1]);
    if (b > a) {
      const ea = e0 + ((e1 - e0) * (a - l0)) / dl;
      const eb = e0 + ((e1 - e0) * (b - l0)) / dl;
      uvb += ((ea + eb) / 2) * (b - a);
    }
  }
  if (!(uvb > 0)) return 0;
  // UVI = 40 · E_er[W/m²]; 1 µW/cm² = 0.01 W/m².
  return (UVI_PER_ERYTHEMAL_W_M2 * erythemal) / (uvb * 100);
}

/**
 * UV Index per µW/cm² of broadband UVB (280–315 nm) in high midday sunlight: about 0.04 (from memory:
 * about UVI 10 with 2.5 W/m², 250 µW/cm², of UVB). The erythema weighting rises steeply below 300 nm,
 * so a lamp whose ratio is well above this gives much of its UVB at short wavelengths sunlight lacks.
 */
export const SUNLIGHT_UVI_PER_UVB = 0.04;

/**
 * A lamp whose ratio is this many times sunlight's or more is treated as giving short-wave, non-solar
 * UVB (from memory: lamps known for eye and skin injuries in reptiles had ratios several times a
 * fluorescent tube's; twice is taken as the point to warn).
 */
export const SHORT_WAVE_RATIO_FACTOR = 2;

export function isShortWaveRatio(uviPerUvb: number): boolean {
  return uviPerUvb >= SUNLIGHT_UVI_PER_UVB * SHORT_WAVE_RATIO_FACTOR;
}
