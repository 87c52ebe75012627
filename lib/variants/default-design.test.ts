import { describe, expect, it } from 'vitest';
import { parseDesign } from '@/simulation';
import { defaultDesignFor } from './default-design';

describe('defaultDesignFor', () => {
  it('is a valid design sized to the enclosure with a mesh lid on top', () => {
    const d = defaultDesignFor({ widthCm: 120, heightCm: 60, depthCm: 45 });
    const r = parseDesign(d);
    expect(r.ok).toBe(true);
    expect(d.enclosure).toEqual({ width: 120, height: 60, depth: 45 });
    expect(d.objects).toEqual([
      { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: 60, x2: 120, y2: 60 },
    ]);
  });

  it('leaves performance figures to the engine defaults (no lamps, no transmission, no room temperature)', () => {
    const d = defaultDesignFor({ widthCm: 90.004, heightCm: 45.5, depthCm: 45 });
    expect(d.objects.some((o) => o.type === 'lamp')).toBe(false);
    expect(d.objects[0]).not.toHaveProperty('uvbTransmission');
    expect(d.enclosure).not.toHaveProperty('roomTempC');
    expect(d.enclosure.width).toBe(90);
  });
});
