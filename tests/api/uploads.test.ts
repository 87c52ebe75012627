import { describe, expect, it } from 'vitest';
import * as uploadsRoute from '@/app/api/uploads/route';
import * as uploadRoute from '@/app/api/uploads/[id]/route';
import { withFakeS3 } from '@/tests/helpers/fake-s3';
import { getObject, putObject } from '@/lib/storage/s3';
import { jpegWithMetadata, pngWithMetadata } from '@/tests/fixtures/images';
import { Organisation, Upload } from '@/models';
import { createMember, withTestDatabase } from '../helpers/db';
import { createEnclosureWorld, type EnclosureWorld } from '../helpers/world';
import { call, ORIGIN, send, sessionCookie } from './http';

// Backdrop photos against the real test database and the fake S3 server.
withFakeS3();
withTestDatabase();

const world = () => createEnclosureWorld();
type W = EnclosureWorld;

async function upload(w: W, bytes: Uint8Array, contentType: string, as = w.keeper, name = 'photo.jpg') {
  const path = `/api/uploads?kind=backdrop&enclosureId=${w.enclosure.id}&name=${encodeURIComponent(name)}`;
  const req = new Request(`${ORIGIN}${path}`, {
    method: 'POST',
    headers: { origin: ORIGIN, cookie: await sessionCookie(as), 'content-type': contentType },
    body: Buffer.from(bytes),
  });
  const res = await uploadsRoute.POST(req, { params: Promise.resolve({}) });
  return { status: res.status, body: await res.json() };
}

const getFile = (w: W, id: number, as: W['keeper'] | null) =>
  call(uploadRoute.GET, { path: `/api/uploads/${id}`, params: { id }, as });

describe('backdrop uploads', () => {
  it('stores an accepted photo, without its metadata, in the fake S3 bucket', async () => {
    const w = await world();
    const r = await upload(w, jpegWithMetadata(), 'image/jpeg');
    expect(r.status).toBe(201);
    expect(r.body.upload).toMatchObject({
      kind: 'backdrop',
      contentType: 'image/jpeg',
      enclosureId: w.enclosure.id,
    });
    const row = (await Upload.findByPk(r.body.upload.id))!;
    expect(row.storageKey).toMatch(new RegExp(`^org-\\d+/enclosure-${w.enclosure.id}/backdrop/.+\\.jpg$`));
    const stored = Buffer.from((await getObject(row.storageKey))!);
    expect(stored.length).toBe(row.sizeBytes);
    expect(stored.toString('latin1')).not.toContain('Exif');
    expect(stored.toString('latin1')).not.toContain('GPS');
  });

  it('detects the type from the content: a PNG sent as JPEG is stored as PNG', async () => {
    const w = await world();
    const r = await upload(w, pngWithMetadata().bytes, 'image/jpeg', w.keeper, 'photo.jpg');
    expect(r.status).toBe(201);
    expect(r.body.upload.contentType).toBe('image/png');
  });

  it('refuses a file that claims to be a JPEG but is not, and stores nothing', async () => {
    const w = await world();
    const fake = new TextEncoder().encode('<html><script>alert(1)</script></html>');
    const r = await upload(w, fake, 'image/jpeg');
    expect(r.status).toBe(415);
    expect(r.body.error.message).toMatch(/says it is image\/jpeg, but does not start like any of them/);
    const broken = await upload(w, jpegWithMetadata().subarray(0, 60), 'image/jpeg');
    expect(broken.status).toBe(415);
    expect(await Upload.count()).toBe(0);
  });

  it('answers 413 beyond 10 MB', async () => {
    const w = await world();
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set(jpegWithMetadata());
    const r = await upload(w, big, 'image/jpeg');
    expect(r.status).toBe(413);
    expect(await Upload.count()).toBe(0);
  });

  it('serves the photo only to people who may see the enclosure', async () => {
    const w = await world();
    const r = await upload(w, jpegWithMetadata(), 'image/jpeg');
    const id = r.body.upload.id;
    for (const as of [w.keeper, w.staff]) {
      const got = await getFile(w, id, as);
      expect(got.status).toBe(200);
      expect(got.res.headers.get('content-type')).toBe('image/jpeg');
      expect(got.res.headers.get('x-content-type-options')).toBe('nosniff');
    }
    expect((await getFile(w, id, w.otherKeeper)).status).toBe(404);
    expect((await getFile(w, id, w.outsider)).status).toBe(404);
    expect((await getFile(w, id, null)).status).toBe(401);
    // Another keeper cannot add a photo to this enclosure either.
    expect((await upload(w, jpegWithMetadata(), 'image/jpeg', w.otherKeeper)).status).toBe(404);
  });

  it('deletes the photo and its stored object', async () => {
    const w = await world();
    const r = await upload(w, jpegWithMetadata(), 'image/jpeg');
    const id = r.body.upload.id;
    const key = (await Upload.findByPk(id))!.storageKey;
    const denied = await send(uploadRoute.DELETE, 'DELETE /api/uploads/[id]', { id, as: w.otherKeeper });
    expect(denied.status).toBe(404);
    const ok = await send(uploadRoute.DELETE, 'DELETE /api/uploads/[id]', { id, as: w.keeper });
    expect(ok.status).toBe(200);
    expect(await getObject(key)).toBeNull();
    expect(await Upload.count()).toBe(0);
  });

  it('keeps a file filed under no enclosure to its uploader, staff (read) and owners', async () => {
    const w = await world();
    const org = (await w.enclosure.reload()).organisationId;
    const { user: owner } = await createMember('owner', (await Organisation.findByPk(org))!);
    const bytes = jpegWithMetadata();
    const storageKey = `org-${org}/loose/${Date.now()}.jpg`;
    await putObject(storageKey, bytes, 'image/jpeg');
    const loose = await Upload.create({
      kind: 'backdrop',
      ownerId: w.keeper.id,
      organisationId: org,
      enclosureId: null,
      storageKey,
      contentType: 'image/jpeg',
      sizeBytes: bytes.length,
      sha256: 'a'.repeat(64),
      originalName: 'loose.jpg',
    });
    for (const as of [w.keeper, w.staff, owner]) expect((await getFile(w, loose.id, as)).status).toBe(200);
    for (const as of [w.otherKeeper, w.outsider]) expect((await getFile(w, loose.id, as)).status).toBe(404);
    const del = (as: W['keeper']) =>
      send(uploadRoute.DELETE, 'DELETE /api/uploads/[id]', { id: loose.id, as });
    for (const as of [w.otherKeeper, w.outsider]) expect((await del(as)).status).toBe(404);
    const staffDelete = await del(w.staff);
    expect(staffDelete.status).toBe(403);
    expect(staffDelete.body.error.message).toMatch(/Only the person who uploaded it, or an owner/);
    expect(await Upload.count({ where: { id: loose.id } })).toBe(1);
    expect((await del(owner)).status).toBe(200);
    expect(await Upload.count({ where: { id: loose.id } })).toBe(0);
  });
});

describe('serving uploads safely', () => {
  it('sends its own policy, no caching, and a name with the extension of what the file is', async () => {
    const w = await world();
    const r = await upload(w, pngWithMetadata().bytes, 'text/html', w.keeper, 'page.html');
    expect(r.status).toBe(201);
    const got = await getFile(w, r.body.upload.id, w.keeper);
    expect(got.status).toBe(200);
    const h = got.res.headers;
    expect(h.get('content-type')).toBe('image/png');
    expect(h.get('content-disposition')).toBe('inline; filename="page.png"');
    expect(h.get('cache-control')).toBe('private, no-store');
    expect(h.get('content-security-policy')).toBe("default-src 'none'; sandbox; frame-ancestors 'none'");
  });

  it('refuses a picture claiming 50000 × 50000 pixels with 413 naming the cap', async () => {
    const w = await world();
    const huge = Buffer.from(pngWithMetadata().bytes);
    huge.writeUInt32BE(50_000, 16);
    huge.writeUInt32BE(50_000, 20);
    const r = await upload(w, huge, 'image/png');
    expect(r.status).toBe(413);
    expect(r.body.error.field).toBe('file');
    expect(r.body.error.message).toMatch(/12000 pixels/);
  });

  it('serves a stored readings CSV with its formula cells neutralised', async () => {
    const w = await world();
    const csv = 'taken_at,value,note\n2025-03-01T10:00:00Z,40,=HYPERLINK("http://evil.example")\n';
    const key = `org-test/enclosure-${w.enclosure.id}/readings/formula.csv`;
    await putObject(key, new TextEncoder().encode(csv), 'text/csv');
    const row = await Upload.create({
      kind: 'readings-csv',
      ownerId: w.keeper.id,
      organisationId: w.enclosure.organisationId,
      enclosureId: w.enclosure.id,
      originalName: 'meter.csv',
      storageKey: key,
      contentType: 'text/csv',
      sizeBytes: csv.length,
      sha256: 'x'.repeat(64),
    });
    const got = await getFile(w, row.id, w.keeper);
    expect(got.status).toBe(200);
    expect(got.res.headers.get('content-disposition')).toBe('attachment; filename="meter.csv"');
    expect(got.text).toContain(`"'=HYPERLINK(""http://evil.example"")"`);
    expect(got.text).toContain('2025-03-01T10:00:00Z,40,');
  });
});
