import { describe, expect, it } from 'vitest';
import * as shareRoute from '@/app/api/shares/[id]/route';
import * as sharesRoute from '@/app/api/variants/[id]/shares/route';
import * as sharedPictureRoute from '@/app/s/[token]/picture/[version]/[file]/route';
import { enginePool } from '@/lib/engine-pool';
import { sharePageView, sharePageViews } from '@/lib/variants/share-page';
import { parsePictureParams, pictureCache, sharePicturePath } from '@/lib/variants/share-picture';
import { findShare, resolveShareToken } from '@/lib/variants/queries';
import { attachedSpecies, speciesOptions } from '@/lib/variants/species';
import { hashShareToken } from '@/lib/variants/tokens';
import { ShareLink, SpeciesSheet, Variant } from '@/models';
import { benchDesign } from '@/simulation/testing/fixtures';
import { createOrganisation, withTestDatabase } from '../helpers/db';
import { createKeeperWorld } from '../helpers/world';
import { call, ORIGIN, postDesign, postShare, sharedReport } from './variants.helpers';

withTestDatabase();

async function world() {
  const { org, staff, keeper, enclosure } = await createKeeperWorld('Shop A', {
    enclosure: { name: 'Desert tank', speciesName: null },
    staff: true,
  });
  const { variantId } = await postDesign(staff!, enclosure.id, { name: 'Plan', variantName: 'Low lamp' });
  return { org, staff: staff!, keeper, enclosure, variantId };
}

const share = (w: Awaited<ReturnType<typeof world>>, user = w.keeper, body: unknown = {}) =>
  postShare(user, w.variantId, body);

describe('share links', () => {
  it('creates a link whose token is shown once and stored only as its SHA-256', async () => {
    const w = await world();
    const r = await share(w);
    expect(r.status).toBe(201);
    const { token, url, id, state, expiresAt } = r.body.share;
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(url).toMatch(new RegExp(`/s/${token}$`));
    expect(state).toBe('active');
    expect(expiresAt).toBeNull();
    const row = await ShareLink.findByPk(id);
    expect(row!.tokenHash).toBe(hashShareToken(token));
    expect(JSON.stringify(row!.toJSON())).not.toContain(token);

    const list = await call(sharesRoute.GET, {
      path: `/api/variants/${w.variantId}/shares`,
      params: { id: w.variantId },
      user: w.staff,
    });
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    expect(JSON.stringify(list.body)).not.toContain(token);
  });

  it('opens exactly the shared variant while active', async () => {
    const w = await world();
    const { token } = (await share(w)).body.share;
    const s = await resolveShareToken(token);
    expect(s).not.toBeNull();
    expect(s!.variant).toMatchObject({ id: w.variantId, name: 'Low lamp' });
    expect(s!.enclosureName).toBe('Desert tank');
    expect(s!.organisationName).toBe('Shop A');
    expect(s!.design.enclosure.width).toBe(120);
    const pdf = await sharedReport(token);
    expect(pdf.status).toBe(200);
    expect(pdf.res.headers.get('content-type')).toBe('application/pdf');
    expect((await pdf.res.arrayBuffer()).byteLength).toBeGreaterThan(1000);
  });

  it('shows the design without its photo backdrop (the visitor may not read the enclosure’s photos)', async () => {
    const w = await world();
    const variant = (await Variant.findByPk(w.variantId))!;
    const design = JSON.parse(variant.designJson) as Record<string, unknown>;
    const backdrop = { uploadId: 41, x: 0, y: 0, width: 120, height: 60, opacity: 0.6, visible: true };
    await variant.update({ designJson: JSON.stringify({ ...design, backdrop }) });
    const { token } = (await share(w)).body.share;
    const s = await resolveShareToken(token);
    expect(s!.design).toEqual(design);
    expect('backdrop' in s!.design).toBe(false);
  });

  it('stops working once revoked (404), and revoking twice keeps the first time', async () => {
    const w = await world();
    const { token, id } = (await share(w)).body.share;
    const revoke = () =>
      call(shareRoute.DELETE, { method: 'DELETE', path: `/api/shares/${id}`, params: { id }, user: w.staff });
    const first = await revoke();
    expect(first.status).toBe(200);
    expect(first.body.share.state).toBe('revoked');
    expect(await resolveShareToken(token)).toBeNull();
    for (const format of ['pdf', 'png']) {
      const r = await sharedReport(token, format);
      expect(r.status).toBe(404);
      expect(r.body.error.code).toBe('not_found');
    }
    const second = await revoke();
    expect(second.body.share.revokedAt).toBe(first.body.share.revokedAt);
  });

  it('stops working once expired', async () => {
    const w = await world();
    const r = await share(w, w.keeper, { expiresInDays: 7 });
    const { token, id, expiresAt } = r.body.share;
    const days = (new Date(expiresAt).getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
    expect(await resolveShareToken(token)).not.toBeNull();
    // Eight days later, as the page sees it …
    expect(await resolveShareToken(token, new Date(Date.now() + 8 * 86_400_000))).toBeNull();
    // … and as stored: an expiry already in the past.
    expect((await sharedReport(token, 'png')).status).toBe(200);
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id } });
    expect(await resolveShareToken(token)).toBeNull();
    expect((await sharedReport(token)).status).toBe(404);
  });

  it('answers nothing for unknown or malformed tokens', async () => {
    const w = await world();
    const { token } = (await share(w)).body.share;
    const flipped = (token[0] === 'A' ? 'B' : 'A') + token.slice(1);
    expect(await resolveShareToken(flipped)).toBeNull();
    expect(await resolveShareToken(token.slice(1))).toBeNull();
    expect(await resolveShareToken(hashShareToken(token))).toBeNull();
    expect((await sharedReport(flipped)).status).toBe(404);
    expect((await sharedReport('not-a-token')).status).toBe(404);
  });

  it('validates the expiry', async () => {
    const w = await world();
    for (const expiresInDays of [0, 366, 1.5, '7']) {
      const r = await share(w, w.keeper, { expiresInDays });
      expect(r.status).toBe(400);
      expect(r.body.error.field).toBe('expiresInDays');
    }
    expect(await ShareLink.count()).toBe(0);
  });
});

/** A shared variant with lamps (every field has bands to draw), its version and its link. */
async function sharedVariant() {
  const w = await world();
  await Variant.update({ designJson: JSON.stringify(benchDesign(1, 1)) }, { where: { id: w.variantId } });
  const { token, id } = (await share(w)).body.share;
  const { version } = (await Variant.findByPk(w.variantId))!;
  return { staff: w.staff, variantId: w.variantId, version, token: token as string, id };
}

/** A visitor's request for a picture address, as the browser sends it (optionally revalidating). */
async function picture(address: string, ifNoneMatch?: string) {
  const [, , token, , version, file] = address.split('/');
  const req = new Request(`${ORIGIN}${address}`, {
    headers: ifNoneMatch ? { 'if-none-match': ifNoneMatch } : {},
  });
  return sharedPictureRoute.GET(req, {
    params: Promise.resolve({ token: token!, version: version!, file: file! }),
  });
}

describe('share page pictures', () => {
  it('serves each field as an SVG cacheable for ever, revalidated by its ETag', async () => {
    const s = await sharedVariant();
    pictureCache().clear();
    const address = sharePicturePath(s.token, s.version, 'uvi');
    expect(address).toBe(`/s/${s.token}/picture/${s.version}/uvi.svg`);
    const first = await picture(address);
    expect(first.status).toBe(200);
    expect(first.headers.get('content-type')).toBe('image/svg+xml; charset=utf-8');
    expect(first.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    const etag = first.headers.get('etag')!;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]{20,}"$/);
    const svg = await first.text();
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain('<title>UV Index</title>');
    expect(svg).toContain('<path');
    // The variant's name is the page's alt text, never baked into a picture a rename would not refresh.
    expect(svg).not.toContain('Low lamp');

    // The same answer again (from memory), and a 304 without a body for the tag the browser holds.
    const again = await picture(address);
    expect(again.headers.get('etag')).toBe(etag);
    expect(await again.text()).toBe(svg);
    for (const header of [etag, `W/${etag}`, `"other", ${etag}`, '*']) {
      const r = await picture(address, header);
      expect(r.status, header).toBe(304);
      expect(await r.text()).toBe('');
      expect(r.headers.get('etag')).toBe(etag);
      expect(r.headers.get('cache-control')).toContain('immutable');
    }
    expect((await picture(address, '"other"')).status).toBe(200);

    // Each field is its own picture.
    const temp = await picture(sharePicturePath(s.token, s.version, 'tempC'));
    expect(temp.status).toBe(200);
    expect(temp.headers.get('etag')).not.toBe(etag);
    expect(await temp.text()).toContain('<title>Surface temperature</title>');
  });

  it('stops serving the pictures of a revoked link at once, revalidations included', async () => {
    const s = await sharedVariant();
    const address = sharePicturePath(s.token, s.version, 'uvb');
    const before = await picture(address);
    expect(before.status).toBe(200);
    const etag = before.headers.get('etag')!;
    const revoked = await call(shareRoute.DELETE, {
      method: 'DELETE',
      path: `/api/shares/${s.id}`,
      params: { id: s.id },
      user: s.staff,
    });
    expect(revoked.status).toBe(200);
    for (const r of [await picture(address), await picture(address, etag)]) {
      expect(r.status).toBe(404);
      expect(r.headers.get('cache-control')).toBe('no-store');
      expect(r.headers.get('etag')).toBeNull();
    }
  });

  it('stops serving the pictures of an expired link', async () => {
    const s = await sharedVariant();
    const address = sharePicturePath(s.token, s.version, 'uvi');
    expect((await picture(address)).status).toBe(200);
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: s.id } });
    expect((await picture(address)).status).toBe(404);
  });

  it('serves only the current version, and nothing for a wrong field, version or token', async () => {
    const s = await sharedVariant();
    const old = sharePicturePath(s.token, s.version, 'uvi');
    expect((await picture(old)).status).toBe(200);
    await Variant.increment('version', { where: { id: s.variantId } });
    expect((await picture(old)).status).toBe(404);
    expect((await picture(sharePicturePath(s.token, s.version + 1, 'uvi'))).status).toBe(200);
    const flipped = (s.token[0] === 'A' ? 'B' : 'A') + s.token.slice(1);
    for (const address of [
      sharePicturePath(flipped, s.version + 1, 'uvi'),
      `/s/${s.token}/picture/${s.version + 1}/heat.svg`,
      `/s/${s.token}/picture/${s.version + 1}/uvi.png`,
      `/s/${s.token}/picture/0/uvi.svg`,
      `/s/${s.token}/picture/01/uvi.svg`,
      `/s/not-a-token/picture/1/uvi.svg`,
    ]) {
      expect((await picture(address)).status, address).toBe(404);
    }
  });

  it('reads only well-formed picture addresses', () => {
    expect(parsePictureParams('12', 'tempC.svg')).toEqual({ version: 12, field: 'tempC' });
    for (const [v, f] of [
      ['12', 'tempc.svg'],
      ['-1', 'uvi.svg'],
      ['1.5', 'uvi.svg'],
      ['99999999999', 'uvi.svg'],
      ['3', 'uvi.svg.svg'],
    ]) {
      expect(parsePictureParams(v!, f!), `${v}/${f}`).toBeNull();
    }
  });
});

/** A species sheet of one organisation; figures invented for the test, not husbandry advice. */
const sheet = (organisationId: number, commonName: string, scientificName: string) =>
  SpeciesSheet.create({
    organisationId,
    commonName,
    scientificName,
    uvZone: 3,
    baskingSurfaceMinC: 35,
    baskingSurfaceMaxC: 40,
    warmAirMinC: 28,
    warmAirMaxC: 32,
    coolAirMinC: 22,
    coolAirMaxC: 26,
    nightMinC: 16,
    sourcesJson: '[]',
  });

/** A new link to a variant, made by `user`; its token. */
const linkTo = async (variantId: number, user: Awaited<ReturnType<typeof world>>['staff']) =>
  (await postShare(user, variantId)).body.share.token as string;

describe('share page view', () => {
  it('finds the enclosure’s species sheet as the signed-in pages do, and only in its organisation', async () => {
    const { org, staff, enclosure } = await createKeeperWorld('Shop A', {
      enclosure: { name: 'Desert tank', speciesName: 'EXAMPLUS testi' },
      staff: true,
    });
    const other = await createOrganisation('Shop B');
    await sheet(other.id, 'Example lizard', 'Examplus testi');
    const { variantId } = await postDesign(staff!, enclosure.id, { name: 'Plan', variantName: 'Lit' });
    const token = await linkTo(variantId, staff!);
    // No sheet of its own organisation: none, although another organisation has one of that name.
    expect((await findShare(token))!.species).toBeNull();

    await sheet(org.id, 'Decoy gecko', 'Examplus decoy');
    const wanted = await sheet(org.id, 'Example lizard', 'Examplus testi');
    const found = (await findShare(token))!.species;
    expect(found).toEqual(attachedSpecies(await speciesOptions(org.id), 'EXAMPLUS testi'));
    expect(found).toMatchObject({ id: wanted.id, name: 'Example lizard' });
    expect(found!.sheet).toMatchObject({ name: 'Example lizard', uvZone: 3, baskingSurfaceC: [35, 40] });
  });

  it('works a view out once per design, field and sheet, and afresh after a save or a sheet edit', async () => {
    const { org, staff, enclosure } = await createKeeperWorld('Shop A', {
      enclosure: { name: 'Desert tank', speciesName: 'Example lizard' },
      staff: true,
    });
    const species = await sheet(org.id, 'Example lizard', 'Examplus testi');
    const { variantId } = await postDesign(staff!, enclosure.id, { name: 'Plan', variantName: 'Lit' });
    await Variant.update({ designJson: JSON.stringify(benchDesign(1, 1)) }, { where: { id: variantId } });
    const token = await linkTo(variantId, staff!);
    sharePageViews.clear();
    const tasks = () => enginePool().stats.tasks;

    const before = tasks();
    const first = await sharePageView((await findShare(token))!, 'uvi');
    expect(first.problem).toBeNull();
    expect(first.result!.scale.label).toBe('UV Index');
    expect(first.lamps.length).toBeGreaterThan(0);
    // Views that arrive together share one engine run; later ones are the same view, from memory.
    const [a, b] = await Promise.all([
      sharePageView((await findShare(token))!, 'uvi'),
      sharePageView((await findShare(token))!, 'uvi'),
    ]);
    expect(a).toBe(first);
    expect(b).toBe(first);
    expect(tasks() - before).toBe(1);
    // Another field is another view.
    expect((await sharePageView((await findShare(token))!, 'tempC')).result!.scale.label).not.toBe(
      'UV Index',
    );
    expect(tasks() - before).toBe(2);

    // The sheet edited: the species check is worked out again from the new figures.
    await species.update({ baskingSurfaceMinC: 60, baskingSurfaceMaxC: 70 });
    const edited = await sharePageView((await findShare(token))!, 'uvi');
    expect(edited).not.toBe(first);
    expect(edited.result!.assessment).not.toEqual(first.result!.assessment);

    // The design saved with one lamp fewer: a new view with the lamps as saved.
    const design = benchDesign(1, 1);
    const lampIndex = design.objects.findIndex((o) => o.type === 'lamp');
    design.objects.splice(lampIndex, 1);
    await Variant.update({ designJson: JSON.stringify(design) }, { where: { id: variantId } });
    const saved = await sharePageView((await findShare(token))!, 'uvi');
    expect(saved.lamps).toHaveLength(first.lamps.length - 1);
    expect(tasks() - before).toBe(4);
  });
});
