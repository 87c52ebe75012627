/**
 * The counter's test slip as one A4 page (pdf-lib, standard fonts), for the shop to print or hand on:
 * the same content as the e-mail (lib/counter/slip-content.ts) — the lamp, the reading, the verdict, the
 * next test date, the shop and the cautions — and nothing the test did not support.
 */
import { PDFDocument, StandardFonts, rgb } from 'pdf-lib';
import type { SlipContent } from '@/lib/counter/slip-content';
import { EXAMPLE_DATA_NOTE } from '@/shared/example-data';
import { FINDING_STATUS } from '@/shared/finding-status';
import { DEFER_NOTE } from './cautions';
import { M, MUTED, Writer } from './pdf-writer';
import { winAnsi } from './pdf-text';
import { formatDay } from '@/shared/days';

// The verdict in the app's colours for a pass, an attention and a fail.
const VERDICT_COLOR: Record<SlipContent['verdictKind'], ReturnType<typeof rgb>> = {
  keep: rgb(...FINDING_STATUS.pass.rgb),
  'test-again': rgb(...FINDING_STATUS.attention.rgb),
  replace: rgb(...FINDING_STATUS.fail.rgb),
  'no-verdict': rgb(...FINDING_STATUS.attention.rgb),
};

export async function renderSlipPdf(c: SlipContent, generatedAt: Date): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Lamp test at ${c.shop}, ${formatDay(c.testedOn)}`);
  doc.setSubject('Lamp test slip');
  doc.setCreator('Baskwell');
  doc.setProducer('Baskwell');
  doc.setCreationDate(generatedAt);
  const w = new Writer(
    doc,
    await doc.embedFont(StandardFonts.Helvetica),
    await doc.embedFont(StandardFonts.HelveticaBold),
  );

  w.text(c.shop, { size: 16, bold: true, gap: 2 });
  if (c.contact) w.text(c.contact, { size: 10, color: MUTED, gap: 2 });
  w.text(`Lamp test of ${formatDay(c.testedOn)}${c.customerName ? ` for ${c.customerName}` : ''}`, {
    size: 12,
    gap: c.exampleData ? 4 : 10,
  });
  if (c.exampleData)
    w.text(EXAMPLE_DATA_NOTE, { size: 10, bold: true, color: rgb(...FINDING_STATUS.attention.rgb), gap: 10 });
  w.rows(c.rows, 150);

  w.heading('Verdict');
  w.text(c.headline, {
    size: 12,
    bold: true,
    color: VERDICT_COLOR[c.verdictKind],
    gap: 4,
  });
  if (c.nextTestOn) w.text(`Next test: by ${c.nextTestOn}.`, { gap: 4 });

  w.heading('Please note');
  for (const caution of c.cautions) w.text(`- ${caution}`, { indent: 6, gap: 3 });
  w.text(DEFER_NOTE, { size: 9, color: MUTED, gap: 0 });

  w.page.drawText(
    winAnsi(w.font, `${c.shop} — lamp test slip — every figure an estimate to verify with a meter`),
    { x: M, y: M - 20, size: 7, font: w.font, color: MUTED },
  );
  return doc.save({ useObjectStreams: false });
}
