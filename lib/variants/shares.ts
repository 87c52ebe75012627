import 'server-only';
import { Op } from 'sequelize';
import { afterCursor, page } from '@/lib/api';
import type { CurrentUser } from '@/lib/auth/session-user';
import { config } from '@/lib/config';
import { Design, Enclosure, Organisation, ShareLink, Variant } from '@/models';
import { physicsOf } from '@/simulation';
import { readStoredDesign } from './stored-design';
import { hashShareToken, isWellFormedShareToken, newShareToken, shareLinkState, shareUrl } from './tokens';
import { wholeSecond } from './time';
import { shareView, type ShareView } from './views';

export const MAX_SHARE_DAYS = 365;

export async function createShare(
  user: CurrentUser,
  variant: Variant,
  input: { expiresInDays?: number },
  now = new Date(),
): Promise<ShareView & { token: string; url: string }> {
  const { token, tokenHash } = newShareToken();
  const expiresAt = input.expiresInDays
    ? wholeSecond(new Date(now.getTime() + input.expiresInDays * 86_400_000))
    : null;
  const share = await ShareLink.create({ variantId: variant.id, tokenHash, expiresAt, createdById: user.id });
  // The token is shown this once; only its hash is kept.
  return { ...shareView(share, now), token, url: shareUrl(config().APP_URL, token) };
}

export async function listShares(
  variant: Variant,
  opts: { cursor?: number; limit: number },
): Promise<{ items: ShareView[]; nextCursor: string | null }> {
  const rows = await ShareLink.findAll({
    where: { variantId: variant.id, ...afterCursor(opts.cursor) },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
  const now = new Date();
  return page(rows, opts.limit, (s) => shareView(s, now));
}

/** Revoking is idempotent: the first revocation time is kept. */
export async function revokeShare(share: ShareLink): Promise<ShareView> {
  if (!share.revokedAt) await share.update({ revokedAt: wholeSecond() });
  return shareView(share);
}

export type PublicShare = {
  variant: { id: number; name: string; version: number; updatedAt: string };
  designName: string;
  enclosureName: string;
  organisationName: string;
  /** The organisation's data is invented example data (the demo). */
  exampleData: boolean;
  speciesName: string | null;
  organisationId: number;
  design: ReturnType<typeof readStoredDesign>;
  expiresAt: string | null;
};

/**
 * What an anonymous visitor of `/s/<token>` may see: exactly one variant and the names around it.
 * Malformed, unknown, revoked and expired tokens all give null (the page answers 404 alike).
 */
export async function resolveShareToken(token: string, now = new Date()): Promise<PublicShare | null> {
  if (!isWellFormedShareToken(token)) return null;
  const share = await ShareLink.findOne({
    where: { tokenHash: hashShareToken(token), revokedAt: { [Op.is]: null } },
  });
  if (!share || shareLinkState(share, now) !== 'active') return null;
  const variant = (await Variant.findByPk(share.variantId, {
    include: [
      {
        model: Design,
        as: 'design',
        required: true,
        include: [
          {
            model: Enclosure,
            as: 'enclosure',
            required: true,
            include: [{ model: Organisation, as: 'organisation', attributes: ['id', 'name', 'exampleData'] }],
          },
        ],
      },
    ],
  })) as (Variant & { design: Design & { enclosure: Enclosure & { organisation?: Organisation } } }) | null;
  if (!variant) return null;
  const enclosure = variant.design.enclosure;
  return {
    variant: {
      id: variant.id,
      name: variant.name,
      version: variant.version,
      updatedAt: new Date(variant.updatedAt).toISOString(),
    },
    designName: variant.design.name,
    enclosureName: enclosure.name,
    organisationName: enclosure.organisation?.name ?? '',
    exampleData: enclosure.organisation?.exampleData ?? false,
    organisationId: enclosure.organisationId,
    speciesName: enclosure.speciesName ?? null,
    // Without its photo backdrop: a visitor with the link may not read the enclosure's uploads.
    design: physicsOf(readStoredDesign(variant.designJson)),
    expiresAt: share.expiresAt ? share.expiresAt.toISOString() : null,
  };
}
