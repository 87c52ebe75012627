import type { DueItem } from './due';

/**
 * The reminder e-mail of one keeper, in plain text with the usual cautions (estimates to verify with a
 * meter; a vet for the animal's health). However many lamps are due, the message stays short: the
 * most urgent ones by name, counts for the rest, and a link to the lamp log filtered to the lamps that
 * need attention. Every text taken from the database is clipped, so the body has a fixed upper bound
 * (MAX_BODY_CHARS, checked by the tests at 10,000 lamps).
 */
export const LISTED_LAMPS = 15;
const NAME_CHARS = 80;
const BASIS_CHARS = 200;
/** An upper bound of the body's length in characters, whatever the number of lamps. */
export const MAX_BODY_CHARS = 12_000;

export const DUE_LAMP_LOG_PATH = '/lamp-log?due=1';

const clip = (text: string, max: number) => {
  const oneLine = text.replace(/\s+/g, ' ').trim();
  return oneLine.length <= max ? oneLine : `${oneLine.slice(0, max - 1)}…`;
};
const plural = (n: number, one: string, many = `${one}s`) =>
  `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;

/** Most urgent first: the earliest date, a replacement before a test on the same date, then by name. */
export function byUrgency(a: DueItem, b: DueItem): number {
  return (
    a.dueOn.localeCompare(b.dueOn) ||
    (a.kind === b.kind ? 0 : a.kind === 'replace' ? -1 : 1) ||
    a.label.localeCompare(b.label) ||
    a.lampId - b.lampId
  );
}

export function composeReminder(
  keeper: { name: string },
  items: readonly DueItem[],
  appUrl: string,
  organisationName?: string,
): { subject: string; text: string } {
  const replace = items.filter((i) => i.kind === 'replace').length;
  const test = items.length - replace;
  const parts = [
    replace ? `${plural(replace, 'lamp')} to replace` : '',
    test ? `${plural(test, 'lamp')} to test` : '',
  ];
  const subject = `Baskwell lamp log: ${parts.filter(Boolean).join(', ')}`;
  const sorted = [...items].sort(byUrgency);
  const listed = sorted.slice(0, LISTED_LAMPS);
  const rest = sorted.slice(LISTED_LAMPS);
  const lines = listed.map((i) => {
    const what = i.kind === 'replace' ? 'Replace' : 'Test with a meter';
    return `- ${clip(i.label, NAME_CHARS)} (${clip(i.enclosureName, NAME_CHARS)}): ${what} by ${i.dueOn} — ${clip(i.basis, BASIS_CHARS).replace(/\.+$/, '')}.`;
  });
  if (rest.length > 0) {
    const restReplace = rest.filter((i) => i.kind === 'replace').length;
    const restTest = rest.length - restReplace;
    const restParts = [
      restReplace ? `${restReplace.toLocaleString('en-GB')} to replace` : '',
      restTest ? `${restTest.toLocaleString('en-GB')} to test` : '',
    ];
    lines.push(
      `- and ${plural(rest.length, 'more lamp')} (${restParts.filter(Boolean).join(', ')}), due from ${rest[0]!.dueOn} to ${rest[rest.length - 1]!.dueOn}.`,
    );
  }
  const where = organisationName
    ? ` in ${clip(organisationName, NAME_CHARS)}'s lamp log`
    : ' in your lamp log';
  const text = [
    `Hello ${clip(keeper.name, NAME_CHARS)},`,
    '',
    items.length > listed.length
      ? `${plural(items.length, 'UV lamp')}${where} need attention. The most urgent:`
      : `These UV lamps${where} need attention:`,
    '',
    ...lines,
    '',
    `See every lamp that needs attention: ${new URL(DUE_LAMP_LOG_PATH, appUrl).toString()}`,
    '',
    'Dates are estimates from the lamp’s readings or its type’s usual life. Verify with a UV meter at the',
    'basking spot before deciding, switch lamps off before handling them (hot glass, UV on eyes and skin),',
    'and ask a vet about your animal’s health.',
    '',
    'You get one e-mail for each due date; nothing is sent again for the same date.',
  ].join('\n');
  return { subject, text };
}
