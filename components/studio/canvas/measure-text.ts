import Konva from 'konva';

/** How a canvas label is set: what changes its measured size. */
export interface TextStyle {
  fontSize: number;
  lineHeight?: number;
  fontStyle?: 'normal' | 'bold';
  padding?: number;
}

const sizes = new Map<string, { width: number; height: number }>();

/** A label's size as Konva will draw it, in whole pixels (measured once per text and style). */
export function measureText(text: string, style: TextStyle): { width: number; height: number } {
  const { fontSize, lineHeight = 1, fontStyle = 'normal', padding = 0 } = style;
  const key = `${fontSize}|${lineHeight}|${fontStyle}|${padding}|${text}`;
  let s = sizes.get(key);
  if (!s) {
    const t = new Konva.Text({ text, fontSize, lineHeight, fontStyle, padding });
    s = { width: Math.ceil(t.width()), height: Math.ceil(t.height()) };
    t.destroy();
    sizes.set(key, s);
  }
  return s;
}
