import { describe, expect, it } from 'vitest';
import { activeNavHref } from './nav-active';

const HREFS = ['/enclosures', '/lamp-log', '/counter', '/customers', '/counter/dashboard', '/species'];

describe('activeNavHref', () => {
  it('marks the entry of the page itself and of the pages under it', () => {
    expect(activeNavHref(HREFS, '/lamp-log')).toBe('/lamp-log');
    expect(activeNavHref(HREFS, '/lamp-log/42')).toBe('/lamp-log');
    expect(activeNavHref(HREFS, '/counter/lamps/7')).toBe('/counter');
  });

  it('marks only the deeper entry when one entry lies inside another', () => {
    expect(activeNavHref(HREFS, '/counter/dashboard')).toBe('/counter/dashboard');
    // The order of the entries does not matter.
    expect(activeNavHref([...HREFS].reverse(), '/counter/dashboard')).toBe('/counter/dashboard');
  });

  it('does not take a shared beginning of a name for a folder', () => {
    expect(activeNavHref(HREFS, '/counters')).toBeNull();
    expect(activeNavHref(['/species'], '/species-new')).toBeNull();
  });

  it('marks nothing on a page outside every entry', () => {
    expect(activeNavHref(HREFS, '/account')).toBeNull();
  });
});
