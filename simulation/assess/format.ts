/** Number formatting for plain-language findings. */
export const f1 = (v: number) => (Math.round(v * 10) / 10).toFixed(1);
export const f0 = (v: number) => String(Math.round(v));
/**
 * A surface temperature in a sentence. The radiant model keeps climbing close to a lamp (a mesh a few
 * centimetres under a halogen reads hundreds of degrees) where no single figure is worth stating: over
 * 100 °C it says so. The exact estimate stays in the finding's numbers.
 */
export const surfaceC = (c: number) => (c > 100 ? 'over 100' : `about ${f1(c)}`);
export const range1 = ([a, b]: [number, number]) => `${f1(a)}–${f1(b)}`;
