import 'server-only';
import { loadOwnedForPage } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { isExampleData } from '@/lib/organisations/queries';
import { adoptionHistory } from './adoption';
import { populationFor } from './store';

/**
 * What a lamp type's page shows of the shop's measured curve, or null for someone who may not see the
 * shop's figures (a keeper: they see only which curve is in force, from the type itself).
 */
export async function populationPage(user: CurrentUser, lampTypeId: number) {
  const found = await loadOwnedForPage('lamp-type-figures', lampTypeId, user);
  if (!found) return null;
  const { record: type, canEdit: mayAdopt } = found;
  const [view, history, example] = await Promise.all([
    // A busy or failed engine thread leaves the rest of the type's page readable, with a message.
    populationFor(type).catch(() => null),
    adoptionHistory(type.id),
    isExampleData(type.organisationId),
  ]);
  return {
    view,
    history,
    example,
    mayAdopt,
  };
}
