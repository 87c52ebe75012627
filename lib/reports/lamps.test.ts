import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/simulation';
import { lampRows } from './lamps';

describe('report lamp rows', () => {
  it('say how far from the front each lamp hangs (half the depth unless set)', () => {
    const d = exampleDesign();
    const tube = d.objects[0]!;
    if (tube.type === 'lamp') tube.z = 12.5;
    const rows = lampRows(d);
    expect(rows.map((r) => r.position)).toEqual([
      'centre x 40 cm, y 62 cm, 55 cm long, 12.5 cm from the front',
      'x 90 cm, y 62 cm, 30 cm from the front',
    ]);
  });
});
