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

/** Greedy word wrap to `maxWidth` points. */
export function wrap(font: PDFFont, text: string, size: number, maxWidth: number): string[] {
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
