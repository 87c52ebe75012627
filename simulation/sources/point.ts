/**
 * Point source (a bulb) seen by a small upward-facing horizontal receiver.
 * E = I·cosθ / r² with cosθ = h/r: E = I·h / (h² + x² + z²)^{3/2}
 * (inverse-square and cosine laws; any radiometry text, e.g. IES Lighting Handbook).
 */

/**
 * Irradiance from intensity `intensity` at vertical distance h (> 0, receiver below), offset dx across the
 * section and dz in depth (in front of or behind the section plane): r² = h² + dx² + dz², cosθ = h/r.
 */
export function pointIrradiance(intensity: number, h: number, dx: number, dz = 0): number {
  if (!(h > 0)) return 0;
  const r2 = h * h + dx * dx + dz * dz;
  return (intensity * h) / (r2 * Math.sqrt(r2));
}

/** Intensity (per steradian) of a bulb whose irradiance straight below at 30 cm is e30. */
export function intensityFromE30(e30: number): number {
  return e30 * 30 * 30;
}

/** Solid angle of a cone of full angle beamDeg (360: the whole sphere), steradians. */
export function coneSolidAngle(beamDeg: number): number {
  const half = (Math.min(360, Math.max(0, beamDeg)) * Math.PI) / 360;
  return 2 * Math.PI * (1 - Math.cos(half));
}

/**
 * Half-width factor of a bulb's beam in the section plane: a point at depth h below the lamp is inside the
 * beam when |dx| ≤ h · beamTan. Infinity for beams of 180° or more (the whole lower half-space).
 */
export function beamTan(beamDeg: number): number {
  if (beamDeg >= 180) return Infinity;
  return Math.tan((beamDeg * Math.PI) / 360);
}
