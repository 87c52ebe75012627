import type { Metadata } from 'next';
import { StudioLoader } from '@/components/studio/StudioLoader';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { toEngineSheet } from '@/lib/species/to-engine';
import { studioPictureFor } from '@/lib/variants/studio-picture';
import { exampleDesign } from '@/simulation';

export const metadata: Metadata = {
  title: 'Try the studio',
  description:
    'Design the light and heat of an enclosure in your browser — no account needed; kept on this device.',
};

/**
 * "Try the studio": the full studio without an account. The design lives in this browser only
 * (local storage) and starts from the example set-up; the species check uses the starting sheets
 * every organisation begins with.
 */
export default async function ScratchStudioPage() {
  // The example's field, drawn on the server (and kept there): the page opens with it on screen.
  const picture = await studioPictureFor(exampleDesign());
  const species = STARTING_SHEETS.map((s) => ({ id: s.seedKey, ...toEngineSheet(s) }));
  return (
    <StudioLoader
      source={{ kind: 'scratch' }}
      title="Try the studio"
      backHref="/"
      backLabel="Home"
      species={species}
      picture={picture}
    />
  );
}
