// No server secret reaches the browser: the client files of the production build the browser tests run
// against (NEXT_DIST_DIR/static) are scanned for the session secret, the database password and the
// fallback development key, and for server-only modules that would carry code or settings along.
import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const STATIC_DIR = path.join(ROOT, process.env.NEXT_DIST_DIR ?? '.next', 'static');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}

/** Secret values from the environment the server was built and started with (short ones are not secrets). */
function secrets(): [name: string, value: string][] {
  const named: [string, string | undefined][] = [
    ['NEXTAUTH_SECRET', process.env.NEXTAUTH_SECRET],
    ['TEST_NEXTAUTH_SECRET', process.env.TEST_NEXTAUTH_SECRET],
    ['DB_PASSWORD', process.env.DB_PASSWORD],
    ['the development fallback key', 'baskwell-development-only-secret-never-use-in-production'],
  ];
  return named.filter((e): e is [string, string] => typeof e[1] === 'string' && e[1].length >= 8);
}

describe('client files of the production build', () => {
  const files = filesUnder(STATIC_DIR).filter((f) => /\.(js|mjs|css|json|map|txt|html)$/.test(f));

  it('were found (the scan would pass vacuously otherwise)', () => {
    console.info(`client-secrets: ${files.length} files under ${path.relative(ROOT, STATIC_DIR)}`);
    expect(files.length).toBeGreaterThan(10);
    expect(secrets().map(([n]) => n)).toEqual(expect.arrayContaining(['NEXTAUTH_SECRET', 'DB_PASSWORD']));
  });

  it('contain no secret value', () => {
    const found: string[] = [];
    for (const f of files) {
      const text = readFileSync(f, 'utf8');
      for (const [name, value] of secrets()) {
        if (text.includes(value)) found.push(`${name} in ${path.relative(ROOT, f)}`);
      }
    }
    expect(found).toEqual([]);
  });

  it('carry no server-only module (database driver, ORM, mailer, password hashing)', () => {
    const markers = [/sequelize/i, /\bmariadb\b/i, /nodemailer/i, /bcryptjs/i, /passwordHash/];
    const found: string[] = [];
    for (const f of files.filter((x) => /\.m?js$/.test(x))) {
      const text = readFileSync(f, 'utf8');
      for (const m of markers) if (m.test(text)) found.push(`${m} in ${path.relative(ROOT, f)}`);
    }
    expect(found).toEqual([]);
  });
});
