import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

/**
 * The layer rules live in eslint.config.mjs. Each case plants one import in a file of a layer (the file
 * need not exist: ESLint picks the rules by its path) and checks that the lint fails for that reason, and
 * that the allowed way in passes, so a rule that is dropped or loosened fails here.
 */
let eslint: ESLint;
beforeAll(() => {
  eslint = new ESLint({ cwd: process.cwd() });
});

async function restrictedImports(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${code}\nexport const used = planted;\n`, { filePath });
  return (result?.messages ?? []).filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
}

describe('layer boundaries', () => {
  it.each([
    ['lib/planted.ts', "import { planted } from '@/components/ui/Link';", /do not draw/],
    [
      'lib/variants/planted.ts',
      "import { planted } from '../../components/studio/state/types';",
      /do not draw/,
    ],
    ['shared/planted.ts', "import { planted } from '@/lib/db';", /pure code for both sides/],
    ['shared/planted.ts', "import { planted } from 'react';", /pure code for both sides/],
    ['shared/planted.ts', "import { planted } from '@/models';", /through a lib\/ domain module/],
    ['components/planted.tsx', "import { planted } from '@/models';", /through a lib\/ domain module/],
    [
      'components/studio/planted.ts',
      "import type { planted } from '@/models/lamp-type';",
      /lib\/ domain module/,
    ],
    ['components/planted.tsx', "import { planted } from '@/lib/db';", /no database/],
    ['components/planted.tsx', "import { planted } from 'sequelize';", /no database/],
    ['app/planted/page.tsx', "import { planted } from '@/models';", /through a lib\/ domain module/],
    [
      'app/api/planted/route.ts',
      "import type { planted } from '@/models/membership';",
      /lib\/ domain module/,
    ],
    ['components/planted.tsx', "import { planted } from '@/simulation/model/schema';", /through its index/],
    ['lib/planted.ts', "import { planted } from '../simulation/fields/grid';", /through its index/],
    ['scripts/planted.ts', "import { planted } from '@/simulation/contours';", /through its index/],
    ['simulation/planted.ts', "import { planted } from 'react';", /framework-free/],
  ])('%s: %s fails the lint', async (file, code, reason) => {
    const messages = await restrictedImports(file, code);
    expect(messages.length).toBeGreaterThan(0);
    expect(messages.join('\n')).toMatch(reason);
  });

  it.each([
    ['lib/planted.ts', "import { planted } from '@/shared/units';"],
    ['lib/planted.ts', "import { planted } from '@/models';"],
    ['components/planted.tsx', "import { planted } from '@/shared/field-scale';"],
    ['components/planted.tsx', "import { planted } from '@/simulation';"],
    ['app/planted/page.tsx', "import { planted } from '@/lib/variants/queries';"],
    ['tests/planted.test.ts', "import { planted } from '@/simulation/testing/fixtures';"],
  ])('%s: %s passes', async (file, code) => {
    expect(await restrictedImports(file, code)).toEqual([]);
  });
});

/** lib/ files that reach the database, the mail server, the file store or the server's secrets directly. */
const SERVER_IMPORT =
  /from\s+['"](?:@\/lib\/db|@\/models[^'"]*|@\/lib\/config|sequelize|mariadb|umzug|nodemailer|next-auth[^'"]*|next\/headers|@aws-sdk\/[^'"]+|bcryptjs)['"]/;

function libFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return libFiles(p);
    return /\.tsx?$/.test(e.name) && !/\.test\.tsx?$|for-tests|test-helpers/.test(e.name) ? [p] : [];
  });
}

describe('server modules', () => {
  it("start with import 'server-only', so a browser bundle that reaches one fails the build", () => {
    const unmarked = libFiles('lib').filter((f) => {
      const src = readFileSync(f, 'utf8');
      return (
        SERVER_IMPORT.test(src.replace(/import\s+type\s[^;]+;/g, '')) && !/^import 'server-only';$/m.test(src)
      );
    });
    expect(unmarked).toEqual([]);
    expect(readFileSync('lib/db.ts', 'utf8')).toMatch(/^import 'server-only';$/m);
  });
});
