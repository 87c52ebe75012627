import type { PDFFont } from 'pdf-lib';

/**
 * The standard PDF fonts only know the WinAnsi characters. Common typography outside it is spelled
 * out, anything else becomes "?", so a name in any script never breaks the report.
 */
const REPLACEMENTS: Record<string, string> = {
  '≥': '>=',
  '≤': '<=',
  '−': '-',
  '→': '->',
  '×': 'x',
  '…': '...',
  '\u00a0': ' ',
};

// A font's characters, gathered once: a report asks for every line it writes.
const characterSets = new WeakMap<PDFFont, Set<number>>();

export function winAnsi(font: PDFFont, text: string): string {
  let supported = characterSets.get(font);
  if (!supported) characterSets.set(font, (supported = new Set(font.getCharacterSet())));
  let out = '';
  for (const ch of text.replace(/\r?\n/g, ' ')) {
    const cp = ch.codePointAt(0)!;
    if (supported.has(cp)) out += ch;
    else out += REPLACEMENTS[ch] ?? (ch === '\t' ? ' ' : '?');
  }
  return out;
}

// Wrapped lines by font, size, width and text: most of a report's text (cautions, notes, headings) is
// the same in every report, and measuring it word by word is most of the time a warm report takes.
const wrapped = new Map<string, string[]>();
const WRAPPED_MAX = 2000;

/** Greedy word wrap to `maxWidth` points. */
export function wrap(font: PDFFont, text: string, size: number, maxWidth: number): string[] {
  const key = `${font.name}\u0000${size}\u0000${maxWidth}\u0000${text}`;
  const known = wrapped.get(key);
  if (known) return known;
  const lines = wrapLines(font, text, size, maxWidth);
  if (wrapped.size >= WRAPPED_MAX) wrapped.clear();
  wrapped.set(key, lines);
  return lines;
}

function wrapLines(font: PDFFont, text: string, size: number, maxWidth: number): string[] {
  const words = winAnsi(font, text).split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    const next = line ? `${line} ${word}` : word;
    if (font.widthOfTextAtSize(next, size) <= maxWidth || !line) line = next;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  return lines;
}
