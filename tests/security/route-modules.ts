// Every route handler of the app, found from the files (app/api/**/route.ts and the share report), for
// the suites that must cover all of them. next-auth's own route is left out: it has its own CSRF token
// and holds no organisation data.
import path from 'node:path';
import { HTTP_METHODS, ROOT, filesUnder } from './access-graph';

export const NEXT_AUTH_ROUTE = 'app/api/auth/[...nextauth]/route.ts';

export type RouteHandler = (
  req: Request,
  ctx: { params: Promise<Record<string, string>> },
) => Promise<Response>;

export type RouteEntry = {
  file: string;
  method: string;
  /** The URL path with [name] segments left in place. */
  pattern: string;
  /** The dynamic segments, in order. */
  paramNames: string[];
  handler: RouteHandler;
};

export function routeFiles(): string[] {
  return [
    ...filesUnder('app/api', (n) => n === 'route.ts'),
    ...filesUnder('app/s', (n) => n === 'route.ts'),
  ].filter((f) => f !== NEXT_AUTH_ROUTE);
}

/** URL path of a route file: app/api/variants/[id]/route.ts → /api/variants/[id]. */
export const patternOf = (file: string) =>
  `/${file.replace(/^app\//, '').replace(/\/route\.ts$/, '')}`.replace(/\/\([^)]+\)/g, '');

export async function loadRoutes(): Promise<RouteEntry[]> {
  const entries: RouteEntry[] = [];
  for (const file of routeFiles()) {
    const mod = (await import(/* @vite-ignore */ path.join(ROOT, file))) as Record<string, unknown>;
    const pattern = patternOf(file);
    const paramNames = [...pattern.matchAll(/\[([^\]]+)\]/g)].map((m) => m[1]!);
    for (const method of HTTP_METHODS) {
      const handler = mod[method];
      if (typeof handler === 'function') {
        entries.push({ file, method, pattern, paramNames, handler: handler as RouteHandler });
      }
    }
  }
  return entries;
}

/** The path with its segments filled in. */
export const fill = (pattern: string, params: Record<string, string>) =>
  pattern.replace(/\[([^\]]+)\]/g, (_, name: string) => encodeURIComponent(params[name] ?? 'x'));

export const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'];
