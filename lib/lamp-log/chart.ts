import { defaultDecayFor } from './decay';
import { sampleCurve } from './fit';
import { distanceFactor, REFERENCE_CM } from './geometry';
import { lampOutlook, type LampFacts, type Outlook, type ReadingFacts } from './outlook';
import type { SpeciesNeed } from './need';

export type LampChartInput = {
  facts: LampFacts;
  readings: ReadingFacts[];
  need: SpeciesNeed | null;
  today: string;
};

export type LampChartResult = {
  outlook: Outlook;
  /** The fitted curve (and its band) sampled for the chart, from first use to past the last reading. */
  curve: ReturnType<typeof sampleCurve>;
  /** The species' need at the basking spot, expressed at 30 cm like the points; null without one. */
  needAt30: number | null;
};

/**
 * A lamp's outlook and what its page's chart draws. Pure and plain data in and out: the server runs it on
 * an engine worker thread (`lampChart` in lib/engine-pool/tasks.ts), since a fit's cost grows with the
 * lamp's readings and must not hold up other requests.
 */
export function lampChart({ facts, readings, need, today }: LampChartInput): LampChartResult {
  const o = lampOutlook(facts, readings, need, today);
  const decay = defaultDecayFor(facts.type, facts.hoursPerDay);
  const lastDay = Math.max(o.ageDays, ...o.points.map((p) => p.days), 30);
  const horizon = Math.max(lastDay * 1.5, lastDay + 120);
  const curve = sampleCurve(o.fit, decay, 0, horizon, 80);
  const needAt30 =
    o.basking && o.basking.distanceCm > 0
      ? o.basking.threshold /
        (distanceFactor(facts.type, REFERENCE_CM, o.basking.distanceCm) * o.basking.transmission)
      : null;
  return { outlook: o, curve, needAt30 };
}
