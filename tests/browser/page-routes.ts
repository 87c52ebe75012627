// The page routes of (a part of) the app, read from its page files the way Next.js maps them: route
// groups `(name)` dropped, dynamic segments kept as `[name]`, the folder's own page as `/`.
import { readdirSync } from 'node:fs';
import path from 'node:path';

export function pageRoutes(appDir: string): string[] {
  return readdirSync(appDir, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith('page.tsx'))
    .map(
      (f) =>
        `/${f
          .split(path.sep)
          .slice(0, -1)
          .filter((seg) => !/^\(.*\)$/.test(seg))
          .join('/')}`.replace(/\/$/, '') || '/',
    )
    .sort();
}
