/**
 * A job run's count as a phrase: "2 lamps due", "1 e-mail queued". Runs record their counts under
 * plural names ("e-mails queued"); for a count of one, the counted noun is made singular.
 */
const NOUNS = /\b(lamps|e-mails|readings|customers|keepers)\b/;

export function countPhrase(name: string, n: number): string {
  const label = n === 1 ? name.replace(NOUNS, (noun) => noun.slice(0, -1)) : name;
  return `${n.toLocaleString('en-GB')} ${label}`;
}
