/**
 * Where a bar chart's labels go under its bars: on one line each when every one fits its bar's slot, on
 * up to three lines each when wrapping at spaces makes them all fit, and slanted otherwise (many bars, or
 * a word wider than its slot). Slanted labels longer than the room below the chart are shortened with an
 * ellipsis; the table beside every chart carries the full names.
 *
 * Widths are estimated from the characters (no DOM on the server): a little wide of the interface font's
 * real widths, so a label judged to fit does fit.
 */
export type BarLabelLayout =
  | { mode: 'flat'; lines: string[][]; bottom: number }
  | { mode: 'wrapped'; lines: string[][]; bottom: number }
  | { mode: 'slanted'; lines: string[][]; bottom: number };

const NARROW = new Set([..." .,:;!|iljtfrI()[]'’-"]);
const WIDE = new Set([...'mwMW%@']);

/** Estimated width of `text` in px at `fontSize` px of the interface font. */
export function textWidth(text: string, fontSize: number): number {
  let em = 0;
  for (const ch of text) {
    if (NARROW.has(ch)) em += 0.3;
    else if (WIDE.has(ch)) em += 0.85;
    else if (ch >= 'A' && ch <= 'Z') em += 0.68;
    else if (ch >= '0' && ch <= '9') em += 0.6;
    else em += 0.56;
  }
  return em * fontSize;
}

/** Words of `text` on lines no wider than `width`, or null when a word alone is wider. */
export function wrapWords(text: string, width: number, fontSize: number): string[] | null {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (textWidth(word, fontSize) > width) return null;
    const joined = line ? `${line} ${word}` : word;
    if (textWidth(joined, fontSize) <= width) line = joined;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

export const LINE_HEIGHT = 1.2;
const MAX_LINES = 3;
/** Sine of the slant (40°): how far down a slanted label reaches for its length. */
const SLANT = Math.sin((40 * Math.PI) / 180);

/**
 * Lays out `labels` under bars whose slots are `slot` px wide. `maxSlanted` bounds a slanted label's
 * length, so the room below the chart stays bounded.
 */
export function layoutBarLabels(
  labels: readonly string[],
  slot: number,
  fontSize: number,
  { forceSlant = false, maxSlanted = 150 }: { forceSlant?: boolean; maxSlanted?: number } = {},
): BarLabelLayout {
  const room = slot - 4;
  const lineStep = fontSize * LINE_HEIGHT;
  if (!forceSlant) {
    if (labels.every((l) => textWidth(l, fontSize) <= room))
      return { mode: 'flat', lines: labels.map((l) => [l]), bottom: fontSize + 32 };
    const wrapped = labels.map((l) => wrapWords(l, room, fontSize));
    if (wrapped.every((w): w is string[] => w !== null && w.length <= MAX_LINES)) {
      const most = Math.max(...wrapped.map((w) => w.length));
      return { mode: 'wrapped', lines: wrapped, bottom: fontSize + 32 + (most - 1) * lineStep };
    }
  }
  const lines = labels.map((l) => [shorten(l, maxSlanted, fontSize)]);
  const longest = Math.max(0, ...lines.map(([l]) => textWidth(l!, fontSize)));
  return { mode: 'slanted', lines, bottom: Math.ceil(longest * SLANT + fontSize + 20) };
}

/** `text` cut at a word or character with an ellipsis so that it is no wider than `width`. */
export function shorten(text: string, width: number, fontSize: number): string {
  if (textWidth(text, fontSize) <= width) return text;
  let cut = text;
  while (cut.length > 1 && textWidth(`${cut}…`, fontSize) > width) cut = cut.slice(0, -1);
  return `${cut.trimEnd()}…`;
}
