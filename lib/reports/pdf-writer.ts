import { rgb, type PDFDocument, type PDFFont, type PDFPage } from 'pdf-lib';
import { winAnsi, wrap } from './pdf-text';

/** A4 in points, the margin and the two inks. */
export const A4: [number, number] = [595.28, 841.89];
export const M = 48;
export const INK = rgb(0.11, 0.12, 0.1);
export const MUTED = rgb(0.37, 0.4, 0.34);
/**
 * Writes text down A4 pages of a pdf-lib document in the standard fonts: wrapped paragraphs, headings and
 * two-column label/value rows, starting a new page when one is full. The variant report and the counter's
 * test slip share it, so both documents read alike.
 */
export class Writer {
  page: PDFPage;
  y: number;
  constructor(
    readonly doc: PDFDocument,
    readonly font: PDFFont,
    readonly bold: PDFFont,
  ) {
    this.page = doc.addPage(A4);
    this.y = A4[1] - M;
  }
  get width() {
    return A4[0] - 2 * M;
  }
  need(h: number) {
    if (this.y - h < M + 20) {
      this.page = this.doc.addPage(A4);
      this.y = A4[1] - M;
    }
  }
  text(
    t: string,
    o: { size?: number; bold?: boolean; color?: ReturnType<typeof rgb>; indent?: number; gap?: number } = {},
  ) {
    const size = o.size ?? 10;
    const font = o.bold ? this.bold : this.font;
    const indent = o.indent ?? 0;
    for (const line of wrap(font, t, size, this.width - indent)) {
      this.need(size * 1.35);
      this.page.drawText(line, { x: M + indent, y: this.y - size, size, font, color: o.color ?? INK });
      this.y -= size * 1.35;
    }
    this.y -= o.gap ?? 2;
  }
  heading(t: string) {
    this.y -= 8;
    this.need(40);
    this.text(t, { size: 13, bold: true, gap: 4 });
  }
  /** Label/value rows in two columns. */
  rows(rows: [string, string][], labelWidth = 190) {
    for (const [label, value] of rows) {
      this.need(14);
      this.page.drawText(winAnsi(this.font, label), {
        x: M,
        y: this.y - 10,
        size: 10,
        font: this.font,
        color: MUTED,
      });
      const lines = wrap(this.font, value, 10, this.width - labelWidth);
      for (const line of lines) {
        this.need(14);
        this.page.drawText(line, {
          x: M + labelWidth,
          y: this.y - 10,
          size: 10,
          font: this.font,
          color: INK,
        });
        this.y -= 13.5;
      }
    }
    this.y -= 2;
  }
}
