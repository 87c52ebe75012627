import type { DueItem } from './due';

/**
 * The reminder e-mail of one keeper: every due lamp in one message, in plain text, with the usual
 * cautions (estimates to verify with a meter; a vet for the animal's health).
 */
export function composeReminder(
  keeper: { name: string },
  items: readonly DueItem[],
  appUrl: string,
): { subject: string; text: string } {
  const replace = items.filter((i) => i.kind === 'replace').length;
  const test = items.length - replace;
  const parts = [
    replace ? `${replace} lamp${replace > 1 ? 's' : ''} to replace` : '',
    test ? `${test} lamp${test > 1 ? 's' : ''} to test` : '',
  ].filter(Boolean);
  const subject = `Baskwell lamp log: ${parts.join(', ')}`;
  const lines = items.map((i) => {
    const what = i.kind === 'replace' ? 'Replace' : 'Test with a meter';
    return `- ${i.label} (${i.enclosureName}): ${what} by ${i.dueOn} — ${i.basis}.`;
  });
  const text = [
    `Hello ${keeper.name},`,
    '',
    'These UV lamps in your lamp log need attention:',
    '',
    ...lines,
    '',
    `Open the lamp log: ${new URL('/lamp-log', appUrl).toString()}`,
    '',
    'Dates are estimates from the lamp’s readings or its type’s usual life. Verify with a UV meter at the',
    'basking spot before deciding, switch lamps off before handling them (hot glass, UV on eyes and skin),',
    'and ask a vet about your animal’s health.',
    '',
    'You get one e-mail for each due date; nothing is sent again for the same date.',
  ].join('\n');
  return { subject, text };
}
