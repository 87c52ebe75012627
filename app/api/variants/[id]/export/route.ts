import { z } from 'zod';
import { notFound, route } from '@/lib/api';
import { download, fileBase, reportPdf, fieldPng } from '@/lib/reports/build';
import { organisationName } from '@/lib/organisations/queries';
import { findSheet } from '@/lib/species/store';
import { variantFor } from '@/lib/variants/access';
import { idParams } from '@/lib/variants/schemas';
import { attachedSpecies, speciesOptions, type SpeciesOption } from '@/lib/variants/species';
import { readStoredDesign } from '@/lib/variants/stored-design';

const exportQuery = z.object({
  format: z.enum(['json', 'png', 'pdf'], { error: 'format must be json, png or pdf.' }).default('json'),
  field: z.enum(['uvi', 'uvb', 'tempC'], { error: 'field must be uvi, uvb or tempC.' }).default('uvi'),
  months: z.coerce.number({ error: 'months must be a number.' }).int().min(0).max(120).default(0),
  species: z.coerce.number({ error: 'species must be a species sheet id.' }).int().positive().optional(),
});

/**
 * Downloads a variant: `json` is the design file itself (for upload elsewhere), `png` one field as a
 * picture, `pdf` the report with assessment (species from `?species=` or the enclosure's own), lamps
 * and cautions.
 */
export const GET = route({
  params: idParams,
  query: exportQuery,
  handler: async ({ params, query, user }) => {
    const variant = await variantFor(user, params.id, 'read');
    const design = readStoredDesign(variant.designJson);
    const base = fileBase(variant.name);
    if (query.format === 'json') {
      return download(
        `${JSON.stringify(design, null, 2)}\n`,
        'application/json; charset=utf-8',
        `${base}.baskwell.json`,
      );
    }
    const enclosure = variant.design.enclosure;
    const subject = {
      variantName: variant.name,
      version: variant.version,
      designName: variant.design.name,
      enclosureName: enclosure.name,
      organisationName: '',
      design,
    };
    if (query.format === 'png') {
      return download(new Uint8Array(fieldPng(subject, query)), 'image/png', `${base}-${query.field}.png`);
    }
    const organisation = await organisationName(enclosure.organisationId);
    const options = await speciesOptions(enclosure.organisationId);
    let species: SpeciesOption | null;
    if (query.species) {
      const sheet = await findSheet(query.species);
      // A sheet of another organisation is as unknown as a missing one.
      if (!sheet || sheet.organisationId !== enclosure.organisationId) throw notFound('That species sheet');
      species = options.find((o) => o.id === sheet.id) ?? null;
    } else {
      species = attachedSpecies(options, enclosure.speciesName);
    }
    const pdf = await reportPdf(
      { ...subject, organisationName: organisation ?? '' },
      { field: query.field, months: query.months, species },
    );
    return download(new Uint8Array(pdf), 'application/pdf', `${base}.pdf`);
  },
});
