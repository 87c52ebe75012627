import { describe, expect, it } from 'vitest';
import { tubeBelowCentre, tubeIntensityFromE30, tubeIntensityFromPower, tubePiece } from './tube';

describe('tube as a diffuse line source', () => {
  // IES Lighting Handbook, aspect factors for diffuse linear sources (cos distribution, horizontal receiver):
  // 60 cm tube, below the centre, relative to 10 cm.
  it('matches the handbook aspect-factor ratios below the centre', () => {
    const at10 = tubeBelowCentre(60, 10);
    expect(tubeBelowCentre(60, 20) / at10).toBeCloseTo(0.4662, 4);
    expect(tubeBelowCentre(60, 30) / at10).toBeCloseTo(0.2766, 4);
    expect(tubeBelowCentre(60, 60) / at10).toBeCloseTo(0.0929, 4);
  });

  it('gives the handbook end-to-centre ratio 0.506 at 10 cm', () => {
    // IES Lighting Handbook aspect factors for diffuse linear sources: below one end vs below the centre.
    const centre = tubePiece(-30, 30, 10);
    const end = tubePiece(0, 60, 10);
    expect(end / centre).toBeCloseTo(0.506, 3);
  });

  it('the piecewise closed form equals the centre formula and adds over pieces', () => {
    for (const d of [5, 17, 30, 80]) {
      expect(tubePiece(-27.5, 27.5, d)).toBeCloseTo(tubeBelowCentre(55, d), 12);
      expect(tubePiece(-27.5, 3, d) + tubePiece(3, 27.5, d)).toBeCloseTo(tubePiece(-27.5, 27.5, d), 12);
    }
  });

  it('agrees with a numerical integration of cos-distributed elements', () => {
    // dE = i h² / (h² + u²)² du (inverse-square and cosine laws applied to each element).
    const h = 23;
    let sum = 0;
    const n = 20000;
    for (let k = 0; k < n; k++) {
      const u = -10 + (50 * (k + 0.5)) / n;
      sum += ((h * h) / (h * h + u * u) ** 2) * (50 / n);
    }
    expect(tubePiece(-10, 40, h)).toBeCloseTo(sum, 9);
  });

  it('falls as ~1/d near the tube and ~1/d² far away', () => {
    const near = tubeBelowCentre(1000, 1) / tubeBelowCentre(1000, 2);
    expect(near).toBeCloseTo(2, 2);
    const far = tubeBelowCentre(10, 1000) / tubeBelowCentre(10, 2000);
    expect(far).toBeCloseTo(4, 3);
  });

  it('is normalised to uvbAt30 below the centre', () => {
    const i = tubeIntensityFromE30(60, 55);
    expect(i * tubeBelowCentre(55, 30)).toBeCloseTo(60, 10);
  });

  it('radiates the stated power in total (π² i per unit length)', () => {
    // Numerically integrate i cosψ over the sphere: dΩ = cosψ dψ dφ.
    const i = tubeIntensityFromPower(24, 55);
    let flux = 0;
    const n = 4000;
    for (let k = 0; k < n; k++) {
      const psi = -Math.PI / 2 + (Math.PI * (k + 0.5)) / n;
      flux += i * Math.cos(psi) * Math.cos(psi) * (Math.PI / n) * 2 * Math.PI;
    }
    expect(flux * 55).toBeCloseTo(24, 5);
  });
});
