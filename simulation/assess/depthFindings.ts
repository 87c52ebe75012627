/**
 * The species check reads one plane of the enclosure: the side view's. A lamp hanging well in front of or
 * behind that plane lights and warms the surfaces right under it more than the plane shows, so the check
 * says so, and where to look instead.
 */
import type { Design } from '../model/schema';
import { lampZ, sectionZ } from '../model/resolve';
import type { Finding } from './types';
import { f0 } from './format';

/**
 * A lamp this far from the side view's plane is checked in another plane (this engine's choice: 5 cm off
 * a plane 30 cm below a bulb already lowers the value there by about 4 %, and more for lower lamps).
 */
export const OFF_PLANE_CM = 5;

export function depthFindings(design: Design): Finding[] {
  const section = sectionZ(design.enclosure);
  const off = design.objects
    .filter((o) => o.type === 'lamp')
    .map((o) => ({ id: o.id, dz: lampZ(o, design.enclosure) - section }))
    .filter((l) => Math.abs(l.dz) >= OFF_PLANE_CM);
  if (off.length === 0) return [];
  const where = off
    .map((l) => `${l.id} hangs ${f0(Math.abs(l.dz))} cm ${l.dz > 0 ? 'behind' : 'in front of'} it`)
    .join(', ');
  return [
    {
      id: 'depth-plane',
      status: 'attention',
      title: 'Lamps off the checked plane',
      message: `This check reads the side view ${f0(section)} cm from the front; ${where}. The surfaces right under ${off.length === 1 ? 'that lamp get' : 'those lamps get'} more UV and heat than this plane shows. Move the side view to each lamp's depth and check again before trusting the hot spot and the basking UV. Estimates: check them with a UV Index meter and a thermometer.`,
      numbers: {
        sectionCm: section,
        lamps: off.length,
        furthestCm: Math.max(...off.map((l) => Math.abs(l.dz))),
      },
      where: { kind: 'object', objectIds: off.map((l) => l.id) },
    },
  ];
}
