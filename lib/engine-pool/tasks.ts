/**
 * What the engine's worker threads can be asked to do: one pure function a name, taking and returning
 * plain data (structured-clone copies cross the thread boundary: no functions or class instances; a
 * Buffer arrives as a Uint8Array). Imported only by `worker.ts`; the server calls these through
 * `runEngineTask(name, input)` from `lib/engine-pool`, so its event loop never runs the engine itself.
 *
 * To add a task: write it here (or import it) with one input object, then call `runEngineTask('name', …)`.
 * Nothing here may touch the database, the mail or the session: a worker has only its input.
 */
import { propose, type Proposal, type ProposalInput } from '@/lib/guided-start/propose';
import { calibrate, type Calibration } from '@/lib/lamp-log/calibrate';
import { lampChart, type LampChartInput, type LampChartResult } from '@/lib/lamp-log/chart';
import type { LampFacts, ReadingFacts } from '@/lib/lamp-log/outlook';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import type { SlipContent } from '@/lib/counter/slip-content';
import { populationCurve, type PopulationCurve, type PopulationInput } from '@/lib/population/fit';
import { fieldPng, reportPdf, type ReportOptions, type ReportSubject } from '@/lib/reports/build';
import { renderSlipPdf } from '@/lib/reports/slip-pdf';
import { computedFor, type FieldView } from '@/lib/variants/computed';
import { cachedStudioFirstField } from '@/lib/variants/studio-first-field';
import type { StudioFirstField } from '@/shared/designs/studio-field';
import type { KeyFigures } from '@/shared/designs/figures';
import type { Assessment, Design, FieldName, LampObject, SpeciesSheet } from '@/simulation';

/** What the share page prints around its picture: the field's scale (for the key), figures, species check. */
export type SharedView = { scale: FieldView['scale']; figures: KeyFigures; assessment: Assessment };
/** What a field picture draws: the scale, the contour bands and the figures its markers come from. */
export type FieldPicture = FieldView & { figures: KeyFigures };

export const engineTasks = {
  /** One field of a design as a PNG picture (the export and the share page's download). */
  fieldPng(input: { subject: ReportSubject; field: FieldName; months: number }): Uint8Array {
    return fieldPng(input.subject, input);
  },

  /** The PDF report of a design: field picture, key figures, species check, lamps, cautions. */
  reportPdf(input: { subject: ReportSubject; options: ReportOptions; now: Date }): Promise<Uint8Array> {
    return reportPdf(input.subject, input.options, input.now);
  },

  /** The counter's one-page test slip. */
  counterSlipPdf(input: { content: SlipContent; now: Date }): Promise<Uint8Array> {
    return renderSlipPdf(input.content, input.now);
  },

  /**
   * The public share page's text: one field's scale, the key figures, the species check. The bands stay
   * on the thread: the page shows the picture from its own cacheable address (`fieldPicture`).
   */
  sharedView(input: { design: Design; field: FieldName; sheet: SpeciesSheet | null }): SharedView {
    const computed = computedFor(input.design);
    return {
      scale: computed.view(input.field).scale,
      figures: computed.sim.figures,
      // With no species attached the safety checks still run, with general limits.
      assessment: computed.assessment(input.sheet),
    };
  },

  /** One field's scale and contour bands, with the figures its markers need: a share page's picture. */
  fieldPicture(input: { design: Design; field: FieldName }): FieldPicture {
    const computed = computedFor(input.design);
    return { ...computed.view(input.field), figures: computed.sim.figures };
  },

  /** The field a studio draws when it opens, sent with the page (lib/variants/studio-first-field). */
  studioFirstField(input: { design: Design; field: FieldName }): StudioFirstField | null {
    return cachedStudioFirstField(input.design, input.field);
  },

  /** The guided start's search for a first layout (many engine runs). */
  propose(input: { input: ProposalInput; lampTypes: LampTypeDto[] }): Proposal | null {
    return propose(input.input, input.lampTypes);
  },

  /** A logged lamp's outlook and its page's chart: the decay fit over all its readings. */
  lampChart(input: LampChartInput): LampChartResult {
    return lampChart(input);
  },

  /** A lamp type's decay curve learned from all the organisation's readings of it (lib/population). */
  populationCurve(input: PopulationInput): PopulationCurve {
    return populationCurve(input);
  },

  /** A logged lamp's readings as the figures of each design lamp it is (one fit per design lamp). */
  calibrations(input: {
    lamp: LampFacts;
    readings: ReadingFacts[];
    objects: LampObject[];
    today: string;
  }): Calibration[] {
    return input.objects.map((object) => calibrate(input.lamp, input.readings, object, input.today));
  },
};

export type EngineTasks = typeof engineTasks;
