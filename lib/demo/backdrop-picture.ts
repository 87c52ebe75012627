import { PNG } from 'pngjs';

/**
 * The demo's "photo" of the desert vivarium, drawn here in code: a front view of a wooden vivarium with
 * a sandy floor, a hide on the left, a basking rock on the right and a tube fitting under the top. It is
 * no photograph of anyone's enclosure — an invented picture to show the studio's photo backdrop with.
 * 4 pixels a centimetre over the 120 × 60 cm inside, plus the frame.
 */
export const BACKDROP_PX_PER_CM = 4;
export const BACKDROP_INSIDE_CM = { width: 120, height: 60 } as const;
const FRAME_CM = 3;

type Rgb = readonly [number, number, number];

export function drawDesertVivarium(): Buffer {
  const s = BACKDROP_PX_PER_CM;
  const W = (BACKDROP_INSIDE_CM.width + 2 * FRAME_CM) * s;
  const H = (BACKDROP_INSIDE_CM.height + 2 * FRAME_CM) * s;
  const png = new PNG({ width: W, height: H });
  const set = (x: number, y: number, c: Rgb) => {
    if (x < 0 || y < 0 || x >= W || y >= H) return;
    const i = (y * W + x) * 4;
    png.data[i] = c[0];
    png.data[i + 1] = c[1];
    png.data[i + 2] = c[2];
    png.data[i + 3] = 255;
  };
  // Centimetres of the inside (x right, y up from the floor) to pixels (y down).
  const px = (xCm: number) => Math.round((xCm + FRAME_CM) * s);
  const py = (yCm: number) => Math.round((BACKDROP_INSIDE_CM.height + FRAME_CM - yCm) * s);
  const rect = (x0: number, y0: number, x1: number, y1: number, colour: (x: number, y: number) => Rgb) => {
    for (let y = py(y1); y < py(y0); y++) for (let x = px(x0); x < px(x1); x++) set(x, y, colour(x, y));
  };
  // A little deterministic grain so flat areas read as material, not as a diagram.
  const grain = (x: number, y: number, amp: number) =>
    (((((x * 73856093) ^ (y * 19349663)) >>> 0) % 1000) / 1000) * amp - amp / 2;
  const shade = (c: Rgb, d: number): Rgb => [
    Math.max(0, Math.min(255, Math.round(c[0] + d))),
    Math.max(0, Math.min(255, Math.round(c[1] + d))),
    Math.max(0, Math.min(255, Math.round(c[2] + d))),
  ];

  // Wooden frame (the whole picture), then the back wall inside it.
  for (let y = 0; y < H; y++)
    for (let x = 0; x < W; x++) set(x, y, shade([122, 84, 52], grain(x, y >> 2, 18)));
  rect(0, 0, 120, 60, (x, y) => shade([214, 196, 160], (y / H) * -25 + grain(x, y, 8)));
  // The tube fitting under the top, left of centre, and its reflector.
  rect(8, 55, 64, 58, () => [170, 170, 176]);
  rect(10, 55.5, 62, 56.8, () => [236, 240, 255]);
  // A lamp guard on the right with the heat lamp's bulb in it.
  for (let y = py(58); y < py(50); y++)
    for (let x = px(86); x < px(98); x++) {
      const cx = px(92);
      const r = Math.hypot(x - cx, y - py(54));
      if (r < 4.5 * s)
        set(x, y, r < 2.2 * s ? [255, 214, 140] : (x + y) % 6 < 2 ? [90, 90, 90] : [214, 196, 160]);
    }
  // Sand floor, rising a little towards the back.
  rect(0, 0, 120, 6, (x, y) => shade([222, 184, 120], grain(x, y, 22)));
  // Hide on the left: a dark half-log.
  for (let y = py(13); y < py(5); y++)
    for (let x = px(3); x < px(27); x++) {
      const u = (x - px(15)) / (12 * s);
      const v = (py(5) - y) / (8 * s);
      if (u * u + v * v <= 1)
        set(x, y, u * u + v * v > 0.55 ? shade([88, 60, 38], grain(x, y, 14)) : [40, 30, 22]);
    }
  // Basking rock on the right: a flat-topped stone.
  for (let y = py(22); y < py(5); y++)
    for (let x = px(70); x < px(106); x++) {
      const u = (x - px(88)) / (18 * s);
      const v = (py(5) - y) / (17 * s);
      if (Math.abs(u) ** 2.4 + v ** 2.4 <= 1) set(x, y, shade([150, 138, 124], grain(x, y, 26) - v * 20));
    }
  // A dry branch leaning from the hide to the rock.
  for (let t = 0; t <= 1; t += 0.002) {
    const x = px(24 + t * 48);
    const y = py(10 + t * 18);
    for (let dy = -3; dy <= 3; dy++) for (let dx = -1; dx <= 1; dx++) set(x + dx, y + dy, [104, 78, 50]);
  }
  return PNG.sync.write(png);
}
