import 'server-only';
import { cookies, headers } from 'next/headers';
import { notFound, redirect } from 'next/navigation';
import { cache } from 'react';
import { sessionUserFromHeaders } from '@/lib/api/session';
import type { CurrentUser } from '@/lib/auth/session-user';
import { type Action, can, type MembershipClaim } from '@/lib/permissions';

/** The cookie that remembers which of the user's organisations they are working in. */
export const CURRENT_ORG_COOKIE = 'bw_org';

/** The signed-in user for server components, re-checked in the database; once per request. */
export const currentUser = cache(async (): Promise<CurrentUser | null> =>
  sessionUserFromHeaders(await headers()),
);

export async function requireUser(returnTo?: string): Promise<CurrentUser> {
  const user = await currentUser();
  if (!user) redirect(returnTo ? `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}` : '/sign-in');
  return user;
}

/** The props of a page that reads its address's query (`?q=…&page=2`). */
export type SearchParamsProps = { searchParams: Promise<Record<string, string | string[]>> };

/** The props of a page with segments in its address (`/lamp-log/[id]`) that also reads its query. */
export type SegmentPageProps<P extends Record<string, string>> = SearchParamsProps & { params: Promise<P> };

/**
 * A page of the signed-in app: its user (signing in first, back to `returnTo`) and the organisation they
 * are working in. Null when they belong to none: the layout then offers to make or join one instead of the page.
 */
export async function requireMembership(
  returnTo: string,
): Promise<{ user: CurrentUser; membership: MembershipClaim; organisationId: number } | null> {
  const user = await requireUser(returnTo);
  const membership = await currentMembership(user);
  return membership && { user, membership, organisationId: membership.organisationId };
}

/**
 * A page of the signed-in app that only some members see (the people lists, the jobs): as
 * `requireMembership`, and a 404 for a member who may not do `action` on the organisation's `kind`,
 * so the page does not tell them it exists.
 */
export async function requireMembershipThatMay(returnTo: string, action: Action, kind: 'member' | 'jobs') {
  const session = await requireMembership(returnTo);
  if (session && !can(session.user, action, { kind, organisationId: session.organisationId })) notFound();
  return session;
}

/** The organisation chosen in the switcher, if it is still one of the user's; else their first. */
export async function currentMembership(user: CurrentUser): Promise<MembershipClaim | null> {
  const chosen = Number((await cookies()).get(CURRENT_ORG_COOKIE)?.value);
  return user.memberships.find((m) => m.organisationId === chosen) ?? user.memberships[0] ?? null;
}
