import type { VerdictKind } from './assess';
import type { CounterLampView } from './queries';
import { formatDay, readableDays } from '@/shared/days';

/**
 * What a test slip says, once, for both its forms (the e-mail and the one-page PDF): the lamp, the
 * reading, the verdict, the next test date, the shop and the cautions. Only what the test supports: the
 * output share only when the catalogue gives the type's new output, the basking spot only when the
 * customer gave a species and a basking distance. Pure, so the PDF can be drawn on an engine thread.
 */
export type SlipContent = {
  shop: string;
  /** How to reach the shop, when it said. */
  contact: string | null;
  customerName: string | null;
  /** The day of the reading the slip reports (YYYY-MM-DD: file names use it; words use `formatDay`). */
  testedOn: string;
  rows: [string, string][];
  verdictKind: VerdictKind;
  /** The verdict's first words, for an e-mail's subject. */
  verdictWord: string;
  headline: string;
  nextTestOn: string | null;
  cautions: string[];
  exampleData: boolean;
};

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);
const value = (v: number, unit: string) => (unit === 'uvb' ? `${round(v)} µW/cm²` : `UV Index ${round(v)}`);
const inches = (cm: number) => Math.round((cm / 2.54) * 10) / 10;

export function slipContent(input: {
  shop: string;
  contact?: string | null;
  customerName: string | null;
  lamp: CounterLampView;
  exampleData?: boolean;
}): SlipContent {
  const { lamp } = input;
  const last = lamp.readings[lamp.readings.length - 1]!;
  const v = lamp.answer!.verdict;
  const rows: [string, string][] = [
    [
      'Lamp',
      `${lamp.label ? `${lamp.label} (${lamp.lampTypeName})` : lamp.lampTypeName}, in use since ${lamp.firstUsedEstimated ? 'about ' : ''}${formatDay(lamp.firstUsedOn)}`,
    ],
    [
      'Reading',
      `${value(last.value, last.unit)} at ${round(last.distanceCm)} cm (${inches(last.distanceCm)} in) below the lamp`,
    ],
  ];
  if (v.output)
    rows.push(['Output left', `about ${Math.round(v.output.share * 100)} % of a new lamp of this type`]);
  if (v.basking)
    rows.push([
      'Basking spot at home',
      `about ${value(v.basking.valueNow, v.basking.unit)}; the need is ${v.basking.needLabel}`,
    ]);
  // Said on the slip too: the customer fits the new lamp at home, away from the counter.
  if (v.replacement) rows.push(['New lamp at the same spot', v.replacement.replace(/\.$/, '')]);
  return {
    shop: input.shop,
    contact: input.contact ?? null,
    customerName: input.customerName,
    testedOn: last.takenAt.slice(0, 10),
    rows: rows.map(([label, text]) => [label, readableDays(text)]),
    verdictKind: v.kind,
    verdictWord: v.headline.split(':')[0]!,
    headline: readableDays(v.headline),
    nextTestOn: v.testAgainOn ? formatDay(v.testAgainOn) : null,
    cautions: v.cautions,
    exampleData: input.exampleData ?? false,
  };
}

/** The slip as the text of an e-mail, ending with the link that stops the e-mails. */
export function slipText(c: SlipContent, unsubscribeUrl: string): { subject: string; text: string } {
  const lines = [
    `Hello ${c.customerName ?? 'there'},`,
    '',
    `${c.shop} tested your lamp on ${formatDay(c.testedOn)}.`,
    '',
    ...c.rows.map(([label, text]) => `${label}: ${text}.`),
    '',
    `Verdict: ${c.headline}`,
    ...(c.nextTestOn ? [`Next test: by ${c.nextTestOn}.`] : []),
    '',
    'Please note:',
    ...c.cautions.map((x) => `- ${x}`),
    '',
    c.shop,
    ...(c.contact ? [c.contact] : []),
    '',
    `To stop e-mails about your lamp tests from ${c.shop}, open this link (no sign-in needed): ${unsubscribeUrl}`,
  ];
  return { subject: `Your lamp test at ${c.shop}: ${c.verdictWord}`, text: lines.join('\n') };
}
