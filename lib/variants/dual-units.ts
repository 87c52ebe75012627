/**
 * Figures for readers whose units we do not know (a share link's visitor, a printed report): metric
 * first, as the design stores it, then the imperial equivalent in brackets.
 */
import { CM_PER_IN, formatNumber } from '@/components/studio/geometry/units';

/** "35.2 °C (95.4 °F)". */
export function tempBoth(c: number): string {
  return `${formatNumber(c, 1)} °C (${formatNumber((c * 9) / 5 + 32, 1)} °F)`;
}

/** "120 × 60 × 60 cm (47.2 × 23.6 × 23.6 in)". */
export function sizeBoth(size: { width: number; height: number; depth: number }): string {
  const dims = [size.width, size.height, size.depth];
  const cm = dims.map((v) => formatNumber(v, 1)).join(' × ');
  const inches = dims.map((v) => formatNumber(v / CM_PER_IN, 1)).join(' × ');
  return `${cm} cm (${inches} in)`;
}
