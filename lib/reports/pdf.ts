/**
 * The PDF report of one variant (pdf-lib, standard fonts, A4): what was designed, for which enclosure,
 * the chosen field with its legend, key figures, the species assessment when there is one, the lamp
 * list and the cautions. The variant's name is both drawn and set as the document title.
 */
import 'server-only';
import { FINDING_STATUS } from '@/shared/finding-status';
import { degrees, drawImage, PDFDocument, StandardFonts, rgb } from 'pdf-lib';
import { sizeBoth, tempBoth } from '@/shared/units';
import type { KeyFigures } from '@/shared/designs/figures';
import { bandLabel, type FieldScale } from '@/shared/field-scale';
import { applicableCautions, NO_SPECIES_SAFETY_LEAD } from '@/shared/cautions';
import type { Design } from '@/simulation';
import { EXAMPLE_DATA_NOTE } from '@/shared/example-data';
import { DEFER_NOTE, ESTIMATE_NOTE } from './cautions';
import type { LampRow } from './lamps';
import type { FlateImage } from './png';
import { winAnsi } from './pdf-text';
import { INK, M, MUTED, Writer } from './pdf-writer';

export type ReportFinding = {
  id?: string;
  status: 'pass' | 'attention' | 'fail';
  title: string;
  message: string;
  numbers?: Record<string, number>;
};

export type ReportInput = {
  variantName: string;
  designName: string;
  enclosureName: string;
  enclosureSize: { width: number; height: number; depth: number };
  organisationName: string;
  exampleData?: boolean;
  version: number;
  generatedAt: Date;
  months: number;
  scale: FieldScale;
  /** The field picture, its samples already deflated (lib/reports/png.ts). */
  picture: FlateImage;
  figures: KeyFigures;
  species: { name: string; findings: ReportFinding[]; overall: ReportFinding['status'] } | null;
  /** With no species: the safety checks against general limits. */
  safety?: { findings: ReportFinding[]; overall: ReportFinding['status'] } | null;
  lamps: LampRow[];
  /** The design, for choosing which cautions apply. */
  design: Pick<Design, 'objects'>;
};

// A finding's state reads as in the app (Pass / Attention / Fail). The standard PDF font has no ✓ or ✕,
// so the report gives the word alone.
const STATUS_COLOR = {
  pass: rgb(...FINDING_STATUS.pass.rgb),
  attention: rgb(...FINDING_STATUS.attention.rgb),
  fail: rgb(...FINDING_STATUS.fail.rgb),
};
const STATUS_WORD = {
  pass: FINDING_STATUS.pass.word,
  attention: FINDING_STATUS.attention.word,
  fail: FINDING_STATUS.fail.word,
};

const fmt = (v: number, digits = 1) => Number(v.toFixed(digits)).toString();
const hexRgb = (h: string) => {
  const n = Number.parseInt(h.slice(1), 16);
  return rgb(((n >> 16) & 255) / 255, ((n >> 8) & 255) / 255, (n & 255) / 255);
};

/**
 * The picture as an image object of the document, its deflated samples stored as they are: pdf-lib's
 * embedPng would decode a PNG and deflate it again (in JavaScript) for every report.
 */
function embedImage(doc: PDFDocument, image: FlateImage) {
  return doc.context.register(
    doc.context.stream(image.rgb, {
      Type: 'XObject',
      Subtype: 'Image',
      Width: image.width,
      Height: image.height,
      ColorSpace: 'DeviceRGB',
      BitsPerComponent: 8,
      Filter: 'FlateDecode',
    }),
  );
}

export async function renderReportPdf(r: ReportInput): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(r.variantName);
  doc.setSubject(`Light and heat report: ${r.designName} — ${r.enclosureName}`);
  doc.setCreator('Baskwell');
  doc.setProducer('Baskwell');
  // Made and last changed at the same moment: the same report asked twice at one moment is the same file.
  doc.setCreationDate(r.generatedAt);
  doc.setModificationDate(r.generatedAt);
  const w = new Writer(
    doc,
    await doc.embedFont(StandardFonts.Helvetica),
    await doc.embedFont(StandardFonts.HelveticaBold),
  );

  w.text('Baskwell — light and heat report', { size: 9, color: MUTED, gap: 6 });
  w.text(r.variantName, { size: 20, bold: true, gap: 4 });
  w.text(ESTIMATE_NOTE, { size: 9, color: STATUS_COLOR.attention, gap: r.exampleData ? 4 : 8 });
  if (r.exampleData)
    w.text(EXAMPLE_DATA_NOTE, { size: 10, bold: true, color: STATUS_COLOR.attention, gap: 8 });
  w.rows([
    ['Design', r.designName],
    ['Variant', `${r.variantName} (version ${r.version})`],
    ['Enclosure', `${r.enclosureName} — ${sizeBoth(r.enclosureSize)} (width × height × depth)`],
    ['Organisation', r.organisationName || '—'],
    ['Date', r.generatedAt.toISOString().slice(0, 10)],
    ['Lamp age shown', r.months === 0 ? 'as installed' : `${r.months} months on`],
  ]);

  // Field picture with its legend.
  w.heading(`${r.scale.heading}, side view`);
  const drawW = w.width;
  const drawH = (r.picture.height / r.picture.width) * drawW;
  w.need(drawH + 40);
  w.page.pushOperators(
    ...drawImage(w.page.node.newXObject('Image', embedImage(doc, r.picture)), {
      x: M,
      y: w.y - drawH,
      width: drawW,
      height: drawH,
      rotate: degrees(0),
      xSkew: degrees(0),
      ySkew: degrees(0),
    }),
  );
  w.y -= drawH + 8;
  const swatch = Math.min(70, w.width / r.scale.colors.length);
  w.need(26);
  r.scale.colors.forEach((c, k) => {
    const x = M + k * swatch;
    w.page.drawRectangle({ x, y: w.y - 10, width: swatch - 2, height: 10, color: hexRgb(c) });
    w.page.drawText(winAnsi(w.font, bandLabel(r.scale, k)), {
      x,
      y: w.y - 20,
      size: 7,
      font: w.font,
      color: MUTED,
    });
  });
  w.y -= 28;

  w.heading('Key figures');
  const f = r.figures;
  w.rows(
    [
      ['Basking UV Index (highest on a surface)', fmt(f.baskingUviMax, 2)],
      ['Basking UVB (highest on a surface)', `${fmt(f.baskingUvbMax)} µW/cm²`],
      ['Hot spot (warmest surface)', tempBoth(f.hotSpotC)],
      ['Cool end (coolest floor)', tempBoth(f.coolEndC)],
      ['UV-free area of the cross-section', `${fmt(f.uvFreeAreaCm2, 0)} cm² (${fmt(f.uvFreeShare, 0)} %)`],
    ],
    230,
  );

  w.heading('Assessment');
  const checked = r.species ?? r.safety;
  if (!r.species) w.text(NO_SPECIES_SAFETY_LEAD, { color: MUTED, gap: 4 });
  if (r.species) {
    w.text(`Species: ${r.species.name} — overall ${STATUS_WORD[r.species.overall]}`, { bold: true, gap: 4 });
  } else if (r.safety) {
    w.text(`Safety checks — overall ${STATUS_WORD[r.safety.overall]}`, { bold: true, gap: 4 });
  }
  if (checked) {
    for (const finding of checked.findings) {
      w.text(`${STATUS_WORD[finding.status]}  ${finding.title}`, {
        bold: true,
        color: STATUS_COLOR[finding.status],
        gap: 0,
      });
      w.text(finding.message, { indent: 12, gap: 4 });
    }
  }

  w.heading('Lamps');
  if (r.lamps.length === 0)
    w.text('No lamps in this design yet: there is no UV and every surface sits at the room temperature.', {
      color: MUTED,
    });
  for (const l of r.lamps) {
    w.text(`${l.name} — ${l.technology} (${l.form})`, { bold: true, gap: 0 });
    w.text(
      `${l.position}; UVB at 30 cm ${l.uvbAt30}; ${l.power}; beam ${l.beam}; reflector ${l.reflector}; age ${l.age}`,
      { indent: 12, gap: 4 },
    );
  }

  w.heading('Cautions');
  const cautions = applicableCautions({
    design: r.design,
    assessment: checked
      ? { findings: checked.findings.map((f) => ({ ...f, id: f.id ?? '', numbers: f.numbers ?? {} })) }
      : null,
  }).sort((a, b) => Number(b.urgent) - Number(a.urgent));
  for (const { caution, urgent } of cautions) {
    w.text(`${urgent ? 'Check this: ' : ''}${caution.title}`, {
      bold: true,
      color: urgent ? STATUS_COLOR.fail : INK,
      gap: 0,
    });
    w.text(caution.text, { indent: 12, gap: 0 });
    w.text(`Source: ${caution.source}`, { indent: 12, size: 8, color: MUTED, gap: 4 });
  }
  w.text(DEFER_NOTE, { size: 9, color: MUTED, gap: 4 });
  w.text(ESTIMATE_NOTE, { bold: true, gap: 0 });

  // Page numbers and the standing note in every footer.
  const pages = doc.getPages();
  pages.forEach((p, i) => {
    p.drawText(
      winAnsi(
        w.font,
        `${r.variantName} — estimates: verify with a meter and thermometer — page ${i + 1} of ${pages.length}`,
      ),
      {
        x: M,
        y: M - 20,
        size: 7,
        font: w.font,
        color: MUTED,
      },
    );
  });
  // No object streams: the document opens in the simplest readers and its metadata is plain to inspect.
  // All objects in one go: the writer's default pauses every 50 objects for a timer tick, which on a
  // worker thread only waits.
  return doc.save({ useObjectStreams: false, objectsPerTick: Number.POSITIVE_INFINITY });
}
