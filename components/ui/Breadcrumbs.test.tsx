import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { Breadcrumbs } from './Breadcrumbs';

const render = (props: Parameters<typeof Breadcrumbs>[0]) =>
  renderToStaticMarkup(createElement(Breadcrumbs, props));

describe('Breadcrumbs', () => {
  it('links each page above, in order, and names the current page without a link', () => {
    const html = render({
      trail: [
        { href: '/enclosures', label: 'Enclosures' },
        { href: '/enclosures/7', label: 'Desert <tank>' },
      ],
      current: 'Lamps',
    });
    expect(html).toMatch(/^<nav aria-label="Breadcrumb"/);
    const links = [...html.matchAll(/<a[^>]*href="([^"]+)"[^>]*>(.*?)<\/a>/g)].map((m) => [m[1], m[2]]);
    expect(links.map(([href]) => href)).toEqual(['/enclosures', '/enclosures/7']);
    expect(links[1]?.[1]).toContain('Desert &lt;tank&gt;');
    expect(html).toContain('<span aria-current="page">Lamps</span>');
    // Two separators between three places, hidden from screen readers.
    expect(html.match(/aria-hidden="true">\s*\/\s*<\/span>/g)).toHaveLength(2);
  });

  it('is a plain back link when only the page above is given', () => {
    const html = render({ trail: [{ href: '/species', label: 'All species' }] });
    expect(html).not.toContain('<nav');
    expect(html).not.toContain('aria-current');
    expect(html).toMatch(/<a[^>]*href="\/species"[^>]*>← All species/);
  });
});
