import { describe, expect, it } from 'vitest';
import { httpPersistence } from './http';
import { localPersistence } from './local';
import { memoryStorage, OfflineError, SaveRejectedError } from './types';
import { exampleDesign } from '../examples/exampleDesign';

function fakeFetch(handler: (url: string, init: RequestInit) => Response | Promise<Response>) {
  const calls: { url: string; init: RequestInit }[] = [];
  const f = (async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    return handler(url, init);
  }) as unknown as typeof fetch;
  return { f, calls };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

describe('httpPersistence', () => {
  it('loads and validates the stored design', async () => {
    const { f, calls } = fakeFetch(() =>
      json(200, { variant: { id: 'a b', name: 'x', version: 4, design: exampleDesign(), updatedAt: 'now' } }),
    );
    const p = httpPersistence('a b', f);
    const r = await p.load();
    expect(r.version).toBe(4);
    expect(r.design.objects).toHaveLength(8);
    expect(calls[0]?.url).toBe('/api/variants/a%20b');
  });

  it('accepts the numeric ids the variants API answers with', async () => {
    const { f } = fakeFetch(() =>
      json(200, { variant: { id: 12, name: 'A', version: 2, design: exampleDesign() } }),
    );
    expect((await httpPersistence('12', f).load()).version).toBe(2);
  });

  it('puts the design with its base version', async () => {
    const { f, calls } = fakeFetch(() => json(200, { variant: { id: 'v', version: 5, updatedAt: 'now' } }));
    const r = await httpPersistence('v', f).save(exampleDesign(), 4);
    expect(r).toEqual({ version: 5 });
    expect(calls[0]?.init.method).toBe('PUT');
    expect(JSON.parse(String(calls[0]?.init.body))).toMatchObject({ baseVersion: 4 });
  });

  it('turns 409 into a conflict carrying the current design', async () => {
    const { f } = fakeFetch(() =>
      json(409, {
        error: { code: 'stale', message: 'stale' },
        current: { version: 9, design: exampleDesign() },
      }),
    );
    const r = await httpPersistence('v', f).save(exampleDesign(), 4);
    expect('conflict' in r && r.conflict.version).toBe(9);
  });

  it('treats 503 and network failures as offline, other failures as rejections', async () => {
    await expect(
      httpPersistence('v', fakeFetch(() => json(503, {})).f).save(exampleDesign(), 1),
    ).rejects.toBeInstanceOf(OfflineError);
    const down = fakeFetch(() => {
      throw new TypeError('Failed to fetch');
    }).f;
    await expect(httpPersistence('v', down).save(exampleDesign(), 1)).rejects.toBeInstanceOf(OfflineError);
    const forbidden = fakeFetch(() => json(403, { error: { code: 'forbidden', message: 'Not yours' } })).f;
    await expect(httpPersistence('v', forbidden).save(exampleDesign(), 1)).rejects.toMatchObject({
      status: 403,
      message: 'Not yours',
    });
    await expect(httpPersistence('v', forbidden).load()).rejects.toBeInstanceOf(SaveRejectedError);
  });
});

describe('localPersistence', () => {
  it('starts from the initial design and saves with increasing versions', async () => {
    const storage = memoryStorage();
    const p = localPersistence('scratch', exampleDesign, storage);
    const first = await p.load();
    expect(first.version).toBe(0);
    expect(await p.save(first.design, 0)).toEqual({ version: 1 });
    expect((await p.load()).version).toBe(1);
    const stale = await p.save(first.design, 0);
    expect('conflict' in stale).toBe(true);
  });
});
