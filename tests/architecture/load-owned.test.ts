import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// A thing loaded by id and then checked with can() is loadOwned's job (lib/access.ts): one place knows
// where each kind's ownership comes from and answers "not found" and "forbidden" alike everywhere. This
// finds a file that loads by primary key (or through a domain's find-by-id) and asks can() or allow() itself.

function sourceFiles(): string[] {
  const out = execFileSync(
    'git',
    ['ls-files', '--cached', '--others', '--exclude-standard', '--', 'app', 'lib'],
    {
      encoding: 'utf8',
    },
  );
  return out.split('\n').filter((f) => /\.tsx?$/.test(f) && !/\.test\.tsx?$/.test(f));
}

/** The code without its comments (a comment may well say "the caller has checked can()"). */
const code = (src: string) => src.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:])\/\/.*$/gm, '$1');

/** Whether a file both loads a record by id and asks the permission check itself. */
function loadsAndChecks(src: string): boolean {
  const c = code(src);
  return /\.findByPk\(|(^|[^.\w])find(Sheet|LampType)\(/m.test(c) && /(^|[^.\w])(can|allow)\(/m.test(c);
}

describe('loading a thing for a user', () => {
  it('finds a planted find-then-check, and passes loadOwned and a plain read', () => {
    expect(
      loadsAndChecks("const t = await LampType.findByPk(id);\nif (!t || !can(user, 'read', r)) notFound();"),
    ).toBe(true);
    expect(
      loadsAndChecks("const s = await SpeciesSheet.findByPk(id);\nallow(user, 'update', r, 'That');"),
    ).toBe(true);
    expect(loadsAndChecks("const t = await loadOwned('lamp-type', id, user, 'read');")).toBe(false);
    expect(loadsAndChecks('// the caller asked can() first\nreturn Organisation.findByPk(id);')).toBe(false);
    expect(loadsAndChecks('const ok = list.can(x);\nreturn Organisation.findByPk(id);')).toBe(false);
  });

  it('only lib/access.ts loads by id and checks access in one place', () => {
    const found = sourceFiles().filter(
      (f) => f !== 'lib/access.ts' && loadsAndChecks(readFileSync(f, 'utf8')),
    );
    expect(found).toEqual([]);
  });
});
