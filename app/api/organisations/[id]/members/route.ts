import { z } from 'zod';
import { allow, page, pageQuery, route } from '@/lib/api';
import { idParams, idSchema, roleSchema } from '@/lib/api/schemas';
import { changeMemberRole, removeMember } from '@/lib/organisations/mutations';
import { memberJson, membersOf } from '@/lib/organisations/queries';

/** The organisation's members (owner and staff). */
export const GET = route({
  params: idParams,
  query: z.object({ ...pageQuery, role: roleSchema.optional() }),
  handler: async ({ params, query, user }) => {
    allow(user, 'read', { kind: 'member', organisationId: params.id }, 'That organisation');
    return page(await membersOf(params.id, query), query.limit, memberJson);
  },
});

/** Changes a member's role. Owner only; an organisation always keeps at least one owner. */
export const PATCH = route({
  params: idParams,
  body: z.object({ userId: idSchema('The user id'), role: roleSchema }),
  handler: async ({ params, body, user }) => {
    allow(
      user,
      'update',
      { kind: 'member', organisationId: params.id, userId: body.userId },
      'That organisation',
    );
    return changeMemberRole(params.id, body.userId, body.role);
  },
});

/** Removes a member (`?userId=`). Owner only. Their sessions end at once: the session version is bumped. */
export const DELETE = route({
  params: idParams,
  query: z.object({ userId: idSchema('The user id') }),
  handler: async ({ params, query, user }) => {
    allow(
      user,
      'delete',
      { kind: 'member', organisationId: params.id, userId: query.userId },
      'That organisation',
    );
    await removeMember(params.id, query.userId);
    return { ok: true };
  },
});
