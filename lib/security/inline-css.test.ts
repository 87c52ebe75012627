import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { styleHashesOf } from './inline-css';

describe("the policy's hashes of a build's inlined stylesheets", () => {
  let dir = '';
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it("names each .css file by the SHA-256 of its bytes, in CSP's form, and nothing else", () => {
    dir = mkdtempSync(path.join(tmpdir(), 'inline-css-'));
    writeFileSync(path.join(dir, 'a.css'), 'body{color:#123}');
    writeFileSync(path.join(dir, 'b.js'), 'console.log(1)');
    // sha256("body{color:#123}") in base64, worked out apart from the code under test.
    expect(styleHashesOf(dir)).toEqual(["'sha256-3NukuEgz3eCqFp2865Fm74xAoTPS6ruvf41GmFVYVzg='"]);
  });

  it('has none for a folder that does not exist (no build: next dev links its CSS)', () => {
    dir = path.join(tmpdir(), 'inline-css-missing-folder');
    expect(styleHashesOf(dir)).toEqual([]);
  });
});
