/**
 * Server side of the exports: one variant's design turned into a PNG of a field or a PDF report.
 * Used by the signed-in export route and by the public share page's download, so both give the same
 * document for the same variant.
 */
import type { Design, FieldName } from '@/simulation';
import { fileStem } from '@/lib/files/file-name';
import { computedFor, type Computed } from '@/lib/variants/computed';
import type { SpeciesOption } from '@/lib/variants/species';
import { lampRows } from './lamps';
import { renderReportPdf } from './pdf';
import { encodePng, flateRgb } from './png';
import { renderFieldRaster, type Raster } from './raster';

export type ReportSubject = {
  variantName: string;
  version: number;
  designName: string;
  enclosureName: string;
  organisationName: string;
  /** The organisation's data is invented (the demo): the report says so at the top. */
  exampleData?: boolean;
  design: Design;
};

export type ReportOptions = { field: FieldName; months: number; species: SpeciesOption | null };

/*
 * A field's picture depends only on the design's content, the lamp age and the field, so it is drawn and
 * encoded once and kept with the engine's run of that design (lib/variants/computed, keyed by a hash of
 * the design): a second download of the same version encodes nothing. The PDF keeps its own encoding of
 * the same pixels (deflated RGB samples), so a report never decodes a PNG to embed it.
 */
function raster(design: Design, computed: Computed, field: FieldName): Raster {
  return renderFieldRaster(design, computed.sim.grid, computed.view(field).scale);
}

export function fieldPng(subject: ReportSubject, opts: Pick<ReportOptions, 'field' | 'months'>): Buffer {
  const computed = computedFor(subject.design, opts.months);
  return computed.derived(`png:${opts.field}`, () => encodePng(raster(subject.design, computed, opts.field)));
}

export async function reportPdf(
  subject: ReportSubject,
  opts: ReportOptions,
  now = new Date(),
): Promise<Uint8Array> {
  // The share page and the exports of one design share a single engine run (lib/variants/computed).
  const computed = computedFor(subject.design, opts.months);
  const { sim } = computed;
  const { scale } = computed.view(opts.field);
  const picture = computed.derived(`pdf-image:${opts.field}`, () =>
    flateRgb(raster(subject.design, computed, opts.field)),
  );
  // Without a species the safety checks still run, with general limits.
  const assessment = computed.assessment(opts.species?.sheet ?? null);
  return renderReportPdf({
    variantName: subject.variantName,
    designName: subject.designName,
    enclosureName: subject.enclosureName,
    enclosureSize: subject.design.enclosure,
    organisationName: subject.organisationName,
    exampleData: subject.exampleData ?? false,
    version: subject.version,
    generatedAt: now,
    months: opts.months,
    scale,
    picture,
    figures: sim.figures,
    species: opts.species
      ? { name: opts.species.name, findings: assessment.findings, overall: assessment.overall }
      : null,
    safety: opts.species ? null : { findings: assessment.findings, overall: assessment.overall },
    lamps: lampRows(subject.design),
    design: subject.design,
  });
}

/** A file name from a variant's name: letters, digits and dashes only. */
export function fileBase(name: string): string {
  return fileStem(name, 'variant');
}

export function download(body: BodyInit, type: string, filename: string): Response {
  return new Response(body, {
    headers: {
      'Content-Type': type,
      'Content-Disposition': `attachment; filename="${filename}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
