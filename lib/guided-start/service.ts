import 'server-only';
import { forbidden, invalid, notFound } from '@/lib/errors';
import type { Assessment, Design } from '@/simulation';
import { assertKeeperInOrganisation } from '@/lib/enclosures/mutations';

import { runEngineTask } from '@/lib/engine-pool';
import type { CurrentUser } from '@/lib/auth/session-user';
import { allLampTypes } from '@/lib/lamp-types/queries';
import { can } from '@/lib/permissions';
import type { SpeciesSheetDto } from '@/lib/species/schema';
import { toDto } from '@/lib/species/queries';
import { loadOwned } from '@/lib/access';
import { toEngineSheet } from '@/lib/species/to-engine';
import { createDesign } from '@/lib/variants/mutations';
import { Enclosure } from '@/models';
import { explain, type Explanation } from './explain';
import type { GuidedStartInput } from './input';
import { blockedMessage } from './blocked';
import { lampCounts } from './layout';

/**
 * The guided start on the server: checks who asks and for what, runs the search on the organisation's
 * own catalogue and species sheet, and creates the enclosure with its first design and variant.
 */

export type ProposalView = {
  sheet: SpeciesSheetDto;
  design: Design;
  assessment: Assessment;
  explanation: Explanation;
  summary: {
    uvLamp: string;
    uvCount: number;
    reflector: boolean;
    heatLamp: string | null;
    heatCount: number;
    mount: string;
    perchTopCm: number;
  };
  /**
   * Null when the design may be built; otherwise why not, in plain words: no design from the catalogue
   * keeps the animal safe in this enclosure, and the guided start will not offer one that could hurt it.
   */
  blocked: string | null;
};

async function authorised(user: CurrentUser, input: GuidedStartInput) {
  const organisationId = input.organisationId;
  if (!can(user, 'read', { kind: 'species', organisationId })) throw notFound('That organisation');
  const keeperId = input.keeperId ?? user.id;
  if (!can(user, 'create', { kind: 'enclosure', organisationId, keeperId })) {
    throw forbidden('You can only start enclosures of your own.');
  }
  const row = await loadOwned('species', input.speciesId, user, 'read');
  // A sheet of another organisation the person belongs to is still not this enclosure's to use.
  if (row.organisationId !== organisationId) throw notFound('That species sheet');
  return { keeperId, sheet: toDto(row) };
}

export async function proposeFor(user: CurrentUser, input: GuidedStartInput): Promise<ProposalView> {
  const { sheet } = await authorised(user, input);
  const lampTypes = await allLampTypes(input.organisationId);
  const species = toEngineSheet(sheet);
  const enclosure = {
    width: input.widthCm,
    height: input.heightCm,
    depth: input.depthCm,
    roomTempC: input.roomTempC,
    walls: input.walls,
  };
  // Dozens of engine runs: on an engine thread, not the server's event loop.
  const p = await runEngineTask('propose', { input: { species, enclosure, lid: input.lid }, lampTypes });
  if (!p) {
    throw invalid(
      undefined,
      'No UV lamp in your catalogue fits this enclosure. Add a suitable lamp type to the lamp catalogue, or check the size.',
    );
  }
  const counts = lampCounts(p.candidate);
  return {
    sheet,
    design: p.design,
    assessment: p.assessment,
    explanation: explain(p, species, enclosure, input.lid),
    summary: {
      uvLamp: p.candidate.uv.name,
      uvCount: counts.uv,
      reflector: p.candidate.reflector,
      heatLamp: p.candidate.heat?.name ?? null,
      heatCount: counts.heat,
      mount: p.candidate.mount,
      perchTopCm: p.candidate.perchTopCm,
    },
    blocked: p.harmful.length ? blockedMessage(sheet.commonName, p.harmful) : null,
  };
}

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
