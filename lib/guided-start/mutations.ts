import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { assertKeeperInOrganisation } from '@/lib/enclosures/mutations';
import { invalid } from '@/lib/errors';
import { createDesign } from '@/lib/variants/mutations';
import { Enclosure } from '@/models';
import { authorised } from './access';
import type { GuidedStartInput } from './input';
import { proposeFor, type ProposalView } from './queries';

/** Runs the search again (the server trusts no design from the browser) and saves the result. */
export async function createFromGuidedStart(
  user: CurrentUser,
  input: GuidedStartInput,
): Promise<{ enclosureId: number; variantId: number }> {
  const { keeperId } = await authorised(user, input);
  await assertKeeperInOrganisation(input.organisationId, keeperId);
  const view = await proposeFor(user, input);
  if (view.blocked) throw invalid(undefined, view.blocked);
  const enclosure = await Enclosure.create({
    organisationId: input.organisationId,
    keeperId,
    name: input.name,
    widthCm: input.widthCm,
    heightCm: input.heightCm,
    depthCm: input.depthCm,
    speciesName: view.sheet.commonName,
    animalName: input.animalName,
    notes: null,
  });
  try {
    const { variant } = await createDesign(user, enclosure, {
      name: 'Guided start',
      variantName: 'Proposed set-up',
      design: { ...view.design, notes: notesFor(view) },
    });
    return { enclosureId: enclosure.id, variantId: variant.id };
  } catch (e) {
    // Never leave an enclosure without the design the person asked for.
    await enclosure.destroy();
    throw e;
  }
}

function notesFor(view: ProposalView): string {
  return [
    `Proposed by the guided start for ${view.sheet.commonName} (${view.sheet.scientificName}).`,
    ...view.explanation.map((l) => `${l.heading}: ${l.text}`),
    'Every figure is an estimate: verify with a UV meter and a thermometer before an animal lives with it.',
  ].join('\n\n');
}
