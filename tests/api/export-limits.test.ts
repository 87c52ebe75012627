import { describe, expect, it } from 'vitest';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import { countAttempt, limitKey } from '@/lib/rate-limit';
import { EXPORT_LIMIT } from '@/lib/reports/limits';
import { Variant } from '@/models';
import { benchDesign, heaviestAllowedDesign } from '@/simulation/testing/fixtures';
import { withTestDatabase } from '../helpers/db';
import { createKeeperWorld } from '../helpers/world';
import { call, exportVariant, postDesign, postShare, sharedReport } from './variants.helpers';

withTestDatabase();

async function world() {
  const { keeper, enclosure } = await createKeeperWorld('Limits Test Rooms', {
    enclosure: { name: 'Tank', speciesName: null },
  });
  const { variantId } = await postDesign(keeper, enclosure.id, {
    name: 'Plan',
    variantName: 'First',
    design: benchDesign(1, 1),
  });
  return { keeper, enclosure, variantId };
}

describe('export limits', () => {
  it('accepts only the lamp ages the app offers (every other value was its own engine run)', async () => {
    const w = await world();
    for (const months of ['5', '120', '7.5', '-3']) {
      const r = await exportVariant(w.keeper, w.variantId, `format=png&months=${months}`);
      expect(r.status).toBe(400);
      expect(r.body.error.field).toBe('months');
      expect(r.body.error.message).toBe('months must be one of 0, 3, 6, 12, 18, 24.');
    }
    expect((await exportVariant(w.keeper, w.variantId, 'format=png&months=12')).status).toBe(200);
  });

  it('refuses to save a design beyond the work bound with 422 naming the limit; the heaviest allowed saves', async () => {
    const w = await world();
    const put = (design: unknown) =>
      call(variantRoute.PUT, {
        method: 'PUT',
        path: `/api/variants/${w.variantId}`,
        params: { id: w.variantId },
        user: w.keeper,
        body: { design, baseVersion: 1 },
      });
    const over = await put(benchDesign(10, 10));
    expect(over.status).toBe(422);
    expect(over.body.error.code).toBe('design_too_complex');
    expect(over.body.error.field).toBe('design.objects');
    expect(over.body.error.message).toContain('the limit is 300 million');
    expect(over.body.error.message).toContain('× 30 lamps ×');
    expect((await put(heaviestAllowedDesign())).status).toBe(200);

    const created = await call(enclosureDesignsRoute.POST, {
      method: 'POST',
      path: `/api/enclosures/${w.enclosure.id}/designs`,
      params: { id: w.enclosure.id },
      user: w.keeper,
      body: { name: 'Too much', design: benchDesign(10, 10) },
    });
    expect(created.status).toBe(422);
    expect(created.body.error.code).toBe('design_too_complex');
  });

  it('does not compute a stored design saved before the bound (422), but still hands out its file', async () => {
    const w = await world();
    await Variant.update({ designJson: JSON.stringify(benchDesign(10, 10)) }, { where: { id: w.variantId } });
    const png = await exportVariant(w.keeper, w.variantId, 'format=png');
    expect(png.status).toBe(422);
    expect(png.body.error.message).toContain('the limit is 300 million');
    const file = await exportVariant(w.keeper, w.variantId, 'format=json');
    expect(file.status).toBe(200);
  });

  it('limits PNG and PDF exports per person (429 with Retry-After); the design file is not counted', async () => {
    const w = await world();
    const key = limitKey('export-user', String(w.keeper.id));
    for (let i = 0; i < EXPORT_LIMIT.perUser - 1; i++) await countAttempt([key], EXPORT_LIMIT.windowMs);
    expect((await exportVariant(w.keeper, w.variantId, 'format=png')).status).toBe(200);
    const refused = await exportVariant(w.keeper, w.variantId, 'format=pdf');
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('rate_limited');
    expect(Number(refused.res.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await exportVariant(w.keeper, w.variantId, 'format=json')).status).toBe(200);
  });

  it('limits the downloads of one share link the same way', async () => {
    const w = await world();
    const token = (await postShare(w.keeper, w.variantId)).body.share.token as string;
    const download = () => sharedReport(token, 'png');
    const key = limitKey('export-share', String(w.variantId));
    for (let i = 0; i < EXPORT_LIMIT.perShareLink - 1; i++) await countAttempt([key], EXPORT_LIMIT.windowMs);
    expect((await download()).status).toBe(200);
    const refused = await download();
    expect(refused.status).toBe(429);
    expect(refused.res.headers.get('retry-after')).toBeTruthy();
  });
});
