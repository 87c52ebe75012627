/**
 * The CSP sources that admit the stylesheets a production build writes into its pages' HTML
 * (next.config.ts, `inlineCss`). Next puts them in `<style>` elements without the response's nonce
 * (React takes a style nonce only in a form Next does not pass), so the policy names each one by the
 * SHA-256 of its content instead: exactly that text is admitted, and an injected stylesheet is still
 * refused. The content is the build's CSS file byte for byte, so the hashes are of those files, read
 * once. A page that has no such file (`next dev` links its CSS) gets none.
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

let cached: string[] | null = null;

/** `'sha256-…'` for every .css file of a build's `static/chunks` folder (none when it has none). */
export function styleHashesOf(chunksDir: string): string[] {
  let names: string[];
  try {
    names = readdirSync(chunksDir).filter((n) => n.endsWith('.css'));
  } catch {
    return [];
  }
  return names.sort().map(
    (n) =>
      `'sha256-${createHash('sha256')
        .update(readFileSync(path.join(chunksDir, n)))
        .digest('base64')}'`,
  );
}

/** The hashes of the build this server runs (NEXT_DIST_DIR, as next.config.ts reads it), read once. */
export function inlineStyleHashes(): string[] {
  if (process.env.NODE_ENV !== 'production') return [];
  cached ??= styleHashesOf(
    path.join(process.cwd(), process.env.NEXT_DIST_DIR || '.next', 'static', 'chunks'),
  );
  return cached;
}
