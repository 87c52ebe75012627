import { z } from 'zod';
import { allow, route } from '@/lib/api';
import { listPeople, memberListQuery } from '@/lib/people/queries';
import { idParams, idSchema, roleSchema } from '@/lib/api/schemas';
import { changeMemberRole, removeMember } from '@/lib/organisations/mutations';

/**
 * The organisation's members (owner and staff), searched, sorted and paged (`q`, `sort`, `dir`,
 * `offset`, `limit`; `role` narrows to one role; see people-list.ts).
 */
export const GET = route({
  params: idParams,
  query: memberListQuery,
  handler: async ({ params, query, user }) => {
    allow(user, 'read', { kind: 'member', organisationId: params.id }, 'That organisation');
    return listPeople({ ...query, organisationId: params.id });
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
