/**
 * Tube as a diffuse line source (IES Lighting Handbook, aspect-factor method for linear sources; Howell,
 * A Catalog of Radiation Heat Transfer Configuration Factors).
 *
 * Each element ds of the tube emits with intensity i·cosψ·ds, ψ the angle from the plane normal to the
 * axis. A small upward-facing horizontal receiver in the plane containing the axis, a vertical distance h
 * below the tube and at axial offset u from the element, sees r² = h² + u², cosψ = h/r and incidence
 * cosine h/r, so dE = i·h²/(h²+u²)² du. With u = h·tanθ:
 *
 *   ∫ h²/(h²+u²)² du = (1/(2h)) · [θ + sinθ cosθ],   θ = atan(u/h)
 *
 * so E = (i / 2h) · [G(u₂) − G(u₁)] with G(u) = atan(u/h) + u·h/(h² + u²) over any visible piece
 * [u₁, u₂] of the tube. Straight below the centre of a tube of length L at distance d this is
 * (i/d)(α + sinα cosα), α = atan(L / 2d).
 */

/** G(u) for vertical distance h > 0: the antiderivative (×2h) of the irradiance along the tube. */
export function tubeG(u: number, h: number): number {
  return Math.atan(u / h) + (u * h) / (h * h + u * u);
}

/** Irradiance factor (per unit i) of the tube piece from axial offset u1 to u2 (u = s − x_receiver). */
export function tubePiece(u1: number, u2: number, h: number): number {
  if (!(h > 0) || !(u2 > u1)) return 0;
  return (tubeG(u2, h) - tubeG(u1, h)) / (2 * h);
}

/**
 * The same piece seen from a receiver that is not in the vertical plane of the tube: the tube runs parallel
 * to the section, a height h above the receiver and dz in front of or behind it. Each element is then
 * r² = d² + u² away with d = √(h² + dz²) the perpendicular distance to the axis; the element's cosine is
 * d/r and the upward-facing receiver's h/r, so dE = i·h·d/(d² + u²)² du and
 *
 *   E = (h/d) · (i / 2d) · [G(u₂; d) − G(u₁; d)]
 *
 * the line-source form at the perpendicular distance times the cosine h/d between the receiver's normal
 * and the perpendicular to the tube (the aspect-factor form, IES Lighting Handbook). dz = 0 is tubePiece.
 */
export function tubePieceOffset(u1: number, u2: number, h: number, dz: number): number {
  if (!(h > 0) || !(u2 > u1)) return 0;
  if (dz === 0) return tubePiece(u1, u2, h);
  const d2 = h * h + dz * dz;
  const d = Math.sqrt(d2);
  return (h * (tubeG(u2, d) - tubeG(u1, d))) / (2 * d2);
}

/** Irradiance factor (per unit i) straight below the centre of a tube of length L at distance d. */
export function tubeBelowCentre(length: number, d: number): number {
  const a = Math.atan(length / (2 * d));
  return (a + Math.sin(a) * Math.cos(a)) / d;
}

/** Line intensity i such that the irradiance 30 cm below the centre is e30. */
export function tubeIntensityFromE30(e30: number, length: number): number {
  return e30 / tubeBelowCentre(length, 30);
}

/**
 * Line intensity i (W/sr per cm of tube) of a tube radiating `watts` in total, all around: the flux per unit
 * length of a cos-distributed line source is ∫ i cosψ dΩ = i · 2π · ∫cos²ψ dψ = π² · i.
 */
export function tubeIntensityFromPower(watts: number, length: number): number {
  return watts / (Math.PI * Math.PI * length);
}
