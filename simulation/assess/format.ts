/** Number formatting for plain-language findings. */
export const f1 = (v: number) => (Math.round(v * 10) / 10).toFixed(1);
export const f0 = (v: number) => String(Math.round(v));
export const range1 = ([a, b]: [number, number]) => `${f1(a)}–${f1(b)}`;
