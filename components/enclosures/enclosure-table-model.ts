/**
 * Search and sort rules of the enclosures table, kept pure so unit tests pin them down and the
 * table component only wires them into the table library.
 */
import type { EnclosureView } from './types';

export type EnclosureSortColumn = 'name' | 'animal' | 'keeper' | 'size' | 'updated';
export type EnclosureSort = { column: EnclosureSortColumn; descending: boolean };

/** A shop opens the list to find what changed last, so newest-first is the default. */
export const DEFAULT_ENCLOSURE_SORT: EnclosureSort = { column: 'updated', descending: true };

const fold = (s: string) =>
  s
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase();

/** Every word of the query must appear in the name, animal, species or keeper (any order, accents ignored). */
export function matchesEnclosureSearch(e: EnclosureView, query: string): boolean {
  const words = fold(query).split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const haystack = fold([e.name, e.animalName, e.speciesName, e.keeperName].filter(Boolean).join(' '));
  return words.every((w) => haystack.includes(w));
}

const collator = new Intl.Collator(undefined, { sensitivity: 'base', numeric: true });

/** Text shown in the Animal column, which is also what it sorts by. */
export const animalLabel = (e: EnclosureView) => [e.animalName, e.speciesName].filter(Boolean).join(' · ');

/** Floor area decides which enclosure is "bigger"; height breaks ties. */
const footprint = (e: EnclosureView) => e.widthCm * e.depthCm;

/** Ascending comparison for one column; empty text always sorts after filled text. */
export function compareEnclosures(a: EnclosureView, b: EnclosureView, column: EnclosureSortColumn): number {
  switch (column) {
    case 'name':
      return collator.compare(a.name, b.name);
    case 'animal':
      return compareText(animalLabel(a), animalLabel(b));
    case 'keeper':
      return compareText(a.keeperName ?? '', b.keeperName ?? '');
    case 'size':
      return footprint(a) - footprint(b) || a.heightCm - b.heightCm;
    case 'updated':
      return Date.parse(a.updatedAt) - Date.parse(b.updatedAt);
  }
}

function compareText(a: string, b: string): number {
  if (!a || !b) return (a ? 0 : 1) - (b ? 0 : 1);
  return collator.compare(a, b);
}

/** The rows to show: searched, then sorted (ties by name, then id, so the order is stable). */
export function visibleEnclosures(
  all: readonly EnclosureView[],
  query: string,
  sort: EnclosureSort = DEFAULT_ENCLOSURE_SORT,
): EnclosureView[] {
  const sign = sort.descending ? -1 : 1;
  return all
    .filter((e) => matchesEnclosureSearch(e, query))
    .sort(
      (a, b) =>
        sign * compareEnclosures(a, b, sort.column) || collator.compare(a.name, b.name) || a.id - b.id,
    );
}

/** aria-sort value for a column header. */
export function ariaSortFor(
  column: EnclosureSortColumn,
  sort: EnclosureSort,
): 'ascending' | 'descending' | 'none' {
  if (sort.column !== column) return 'none';
  return sort.descending ? 'descending' : 'ascending';
}

/** Clicking a header: same column flips direction; a new column starts newest/largest first for dates and sizes, A–Z for text. */
export function nextSort(current: EnclosureSort, column: EnclosureSortColumn): EnclosureSort {
  if (current.column === column) return { column, descending: !current.descending };
  return { column, descending: column === 'updated' || column === 'size' };
}
