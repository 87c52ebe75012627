import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { Table, type TableColumn } from './Table';

type Row = { id: number; name: string; size: number };
const rows: Row[] = [
  { id: 7, name: 'Desert', size: 120 },
  { id: 3, name: 'Forest', size: 90 },
];
const columns = (withSize: boolean): (TableColumn<Row> | false)[] => [
  { id: 'name', header: 'Name', className: 'name-cell', cell: ({ row }) => row.original.name },
  withSize && {
    id: 'size',
    header: 'Size',
    title: 'Width in cm',
    headerClassName: 'size-head',
    cell: ({ row }) => `${row.original.size} cm`,
  },
];

/** The props every table here is given; each test adds what it checks. */
const base = { data: rows, caption: 'Enclosures', rowKey: (r: Row) => r.id };

const render = (props: Parameters<typeof Table<Row>>[0]) =>
  renderToStaticMarkup(createElement(Table<Row>, props));
const cellsOf = (html: string, tag: 'th' | 'td') =>
  [...html.matchAll(new RegExp(`<${tag} [^>]*>(.*?)</${tag}>`, 'g'))].map((m) => m[1]);

describe('Table', () => {
  it('lays out the rows in the order given, a cell a column, with its caption and classes', () => {
    const html = render({ ...base, columns: columns(true) });
    expect(html).toContain('<caption class="sr-only">Enclosures</caption>');
    expect(cellsOf(html, 'th')).toEqual(['Name', 'Size']);
    expect(cellsOf(html, 'td')).toEqual(['Desert', '120 cm', 'Forest', '90 cm']);
    expect(html).toContain('<td class="name-cell">Desert</td>');
    // Without classes of its own a cell gets the usual padding.
    expect(html).toContain('<td class="px-4 py-3">120 cm</td>');
    expect(html).toContain('<th scope="col" class="size-head" title="Width in cm">Size</th>');
    expect(html).toContain('<th scope="col" class="px-4 py-2 font-semibold">Name</th>');
  });

  it('draws a row-header column as the th that names its row, and marks every row for tests', () => {
    const html = render({
      ...base,
      columns: [{ ...(columns(false)[0] as TableColumn<Row>), rowHeader: true }, columns(true)[1]!],
      rowTestId: (r) => (r.size > 100 ? 'large-enclosure' : undefined),
      rowClassName: '',
    });
    expect(html).toContain('<th scope="row" class="name-cell">Desert</th>');
    expect(cellsOf(html, 'td')).toEqual(['120 cm', '90 cm']);
    expect(html.match(/<tr[^>]*>/g)).toEqual(['<tr>', '<tr data-testid="large-enclosure">', '<tr>']);
  });

  it('sits inline in a card: no frame border, no row highlight, the full width', () => {
    const html = render({
      ...base,
      columns: columns(false),
      inline: true,
    });
    expect(html).toMatch(/^<div class="overflow-x-auto"><table class="w-full /);
    expect(html.match(/<tr[^>]*>/g)).toEqual(['<tr>', '<tr>', '<tr>']);
  });

  it('leaves out a column given as false', () => {
    const html = render({ ...base, columns: columns(false) });
    expect(cellsOf(html, 'th')).toEqual(['Name']);
    expect(cellsOf(html, 'td')).toEqual(['Desert', 'Forest']);
  });

  it('draws server-sorted headers as sort buttons that say which way the list is sorted', () => {
    const html = render({
      ...base,
      columns: columns(true),
      sort: { sort: { column: 'size', descending: true }, onSort: () => {} },
    });
    expect(html).toMatch(/<th scope="col" aria-sort="none"[^>]*><button type="button"[^>]*>Name/);
    expect(html).toMatch(/<th scope="col" aria-sort="descending"[^>]*><button type="button"[^>]*>Size/);
  });

  it('dims the rows of a view still loading and puts what it is given below the table, inside the frame', () => {
    const html = render({
      ...base,
      data: [],
      columns: columns(true),
      stale: true,
      busy: true,
      children: createElement('p', null, 'Nothing matches'),
    });
    expect(html).toMatch(/<table class="[^"]*opacity-60[^"]*" aria-busy="true"/);
    expect(cellsOf(html, 'td')).toEqual([]);
    expect(html).toMatch(/<\/table><p>Nothing matches<\/p><\/div>$/);
  });

  it('stacked for phones: each cell names its heading, a wide cell is marked, and the table keeps its roles', () => {
    const stacked = render({
      ...base,
      stack: true,
      columns: [
        { id: 'name', header: 'Name', rowHeader: true, cell: ({ row }) => row.original.name },
        { id: 'size', header: () => 'Size (cm)', label: 'Size', cell: ({ row }) => row.original.size },
        { id: 'note', header: 'Note', wide: true, cell: () => 'fine' },
      ],
    });
    expect(stacked).toMatch(/<table role="table" class="[^"]*\btable-stack\b/);
    expect(stacked).toContain('<th scope="row" role="rowheader" class="px-4 py-3">Desert</th>');
    expect(stacked).toContain('<td role="cell" class="px-4 py-3" data-label="Size">120</td>');
    expect(stacked).toContain('<td role="cell" class="px-4 py-3" data-label="Note" data-wide="">fine</td>');
    expect(stacked.match(/role="row"/g)).toHaveLength(3);
    expect(stacked.match(/role="columnheader"/g)).toHaveLength(3);
    // Not asked for: none of it, so other tables' markup is unchanged.
    const plain = render({ ...base, columns: columns(true) });
    expect(plain).not.toMatch(/table-stack|role=|data-label|data-wide/);
  });
});
