import 'server-only';
import { invalid } from '@/lib/errors';
import type { Assessment, Design } from '@/simulation';

import { runEngineTask } from '@/lib/engine-pool';
import type { CurrentUser } from '@/lib/auth/session-user';
import { allLampTypes } from '@/lib/lamp-types/queries';
import type { SpeciesSheetDto } from '@/lib/species/schema';
import { toEngineSheet } from '@/lib/species/to-engine';
import { explain, type Explanation } from './explain';
import type { GuidedStartInput } from './input';
import { blockedMessage } from './blocked';
import { authorised } from './access';
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
