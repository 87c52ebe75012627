import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// Every page behind sign-in must be reachable: named in the app navigation or linked from some page or
// component. A static check over the source (a link written somewhere), not a crawl: the browser journeys
// follow the links themselves.

const ROOT = path.resolve(__dirname, '..');
const APP_GROUP = path.join(ROOT, 'app', '(app)');

function walk(dir: string, keep: (file: string) => boolean): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return walk(full, keep);
    return keep(full) ? [full] : [];
  });
}

/** `/enclosures/[id]/lamps` for app/(app)/enclosures/[id]/lamps/page.tsx. */
function routeOf(pageFile: string): string {
  const rel = path.relative(APP_GROUP, path.dirname(pageFile)).split(path.sep).filter(Boolean);
  return `/${rel.filter((s) => !/^\(.*\)$/.test(s)).join('/')}`;
}

/** Paths written as string or template literals, with `${…}` parts standing for one segment each. */
function linkedPaths(source: string): string[] {
  const found: string[] = [];
  for (const m of source.matchAll(/(['"`])(\/[a-z][^'"`\s]*)\1/g)) found.push(m[2]!);
  for (const m of source.matchAll(/`(\/[a-z][^`]*)`/g)) found.push(m[1]!);
  return found.map((p) =>
    p
      .replace(/\$\{[^}]*\}/g, ':param')
      .split(/[?#]/)[0]!
      .replace(/\/$/, ''),
  );
}

function matches(route: string, linked: string): boolean {
  const r = route.split('/');
  const l = linked.split('/');
  if (r.length !== l.length) return false;
  return r.every((seg, i) => (seg.startsWith('[') ? l[i] === ':param' || /^\w+$/.test(l[i]!) : seg === l[i]));
}

const pages = walk(APP_GROUP, (f) => path.basename(f) === 'page.tsx');
const sources = ['app', 'components', 'lib']
  .flatMap((d) => walk(path.join(ROOT, d), (f) => /\.(ts|tsx)$/.test(f) && !/\.test\.tsx?$/.test(f)))
  .map((f) => ({ file: f, paths: linkedPaths(readFileSync(f, 'utf8')) }));

describe('navigation', () => {
  it('finds the pages behind sign-in', () => {
    expect(pages.map(routeOf)).toEqual(
      expect.arrayContaining([
        '/enclosures',
        '/enclosures/new',
        '/enclosures/[id]',
        '/enclosures/[id]/lamps',
      ]),
    );
  });

  it.each(pages.map(routeOf).sort())('links %s from the navigation or another page', (route) => {
    // A page linking only to itself does not make it reachable.
    const own = pages.find((p) => routeOf(p) === route)!;
    const from = sources.filter((s) => s.file !== own && s.paths.some((p) => matches(route, p)));
    expect(from.map((s) => path.relative(ROOT, s.file))).not.toEqual([]);
  });

  it('links the enclosure page to its lamps and the enclosure list to the guided start', () => {
    const read = (rel: string) => linkedPaths(readFileSync(path.join(APP_GROUP, rel), 'utf8'));
    expect(read('enclosures/[id]/page.tsx')).toContain('/enclosures/:param/lamps');
    expect(read('enclosures/(list)/page.tsx')).toContain('/enclosures/new');
  });
});
