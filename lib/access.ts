import { forbidden, notFound } from '@/lib/errors';
import { can, type Action, type Resource, type SessionUser } from '@/lib/permissions';

/**
 * "May they": throws unless `can` allows. Someone with no right to even see the thing gets "not found",
 * so the existence of another organisation's (or another keeper's) things is never revealed; someone who
 * may see it but not change it gets "forbidden". Domain errors: the route pipeline answers them 404 and
 * 403, a page with its 404.
 */
export function allow(user: SessionUser, action: Action, resource: Resource, what = 'That'): void {
  if (can(user, action, resource)) return;
  if (action !== 'read' && can(user, 'read', resource)) throw forbidden();
  throw notFound(what);
}
