import { z } from 'zod';
import { notFound, ownedRoute } from '@/lib/api';
import { runEngineTask } from '@/lib/engine-pool';
import { isExampleData, organisationName } from '@/lib/organisations/queries';
import { download, fileBase } from '@/lib/reports/build';
import { countExport, EXPORT_MONTHS } from '@/lib/reports/limits';
import { findSheet } from '@/lib/species/queries';
import { attachedSpecies, speciesOptions, type SpeciesOption } from '@/lib/variants/species';
import { assertComputable, readStoredDesign } from '@/lib/variants/stored-design';

const exportQuery = z.object({
  format: z.enum(['json', 'png', 'pdf'], { error: 'format must be json, png or pdf.' }).default('json'),
  field: z.enum(['uvi', 'uvb', 'tempC'], { error: 'field must be uvi, uvb or tempC.' }).default('uvi'),
  // Only the lamp ages the app offers: every value is its own engine run and memo entry.
  months: z.coerce
    .number({ error: 'months must be a number.' })
    .refine((m) => (EXPORT_MONTHS as readonly number[]).includes(m), {
      error: `months must be one of ${EXPORT_MONTHS.join(', ')}.`,
    })
    .default(0),
  species: z.coerce.number({ error: 'species must be a species sheet id.' }).int().positive().optional(),
});

/**
 * Downloads a variant: `json` is the design file itself (for upload elsewhere), `png` one field as a
 * picture, `pdf` the report with assessment (species from `?species=` or the enclosure's own), lamps
 * and cautions.
 */
export const GET = ownedRoute('variant', 'read', {
  query: exportQuery,
  handler: async ({ thing: variant, req, query, user }) => {
    const design = readStoredDesign(variant.designJson);
    const base = fileBase(variant.name);
    if (query.format === 'json') {
      return download(
        `${JSON.stringify(design, null, 2)}\n`,
        'application/json; charset=utf-8',
        `${base}.baskwell.json`,
      );
    }
    assertComputable(design);
    const enclosure = variant.design.enclosure;
    // The report's other reads go alongside the count (each a database round trip); the engine waits for
    // the count, so a refused export costs no engine time.
    const reads =
      query.format === 'pdf'
        ? Promise.all([
            organisationName(enclosure.organisationId),
            speciesOptions(enclosure.organisationId),
            isExampleData(enclosure.organisationId),
          ])
        : null;
    await Promise.all([countExport('user', user.id), reads]);
    const subject = {
      variantName: variant.name,
      version: variant.version,
      designName: variant.design.name,
      enclosureName: enclosure.name,
      organisationName: '',
      design,
    };
    if (query.format === 'png') {
      const png = await runEngineTask(
        'fieldPng',
        { subject, field: query.field, months: query.months },
        { signal: req.signal },
      );
      return download(new Uint8Array(png), 'image/png', `${base}-${query.field}.png`);
    }
    const [organisation, options, exampleData] = (await reads)!;
    let species: SpeciesOption | null;
    if (query.species) {
      const sheet = await findSheet(query.species);
      // A sheet of another organisation is as unknown as a missing one.
      if (!sheet || sheet.organisationId !== enclosure.organisationId) throw notFound('That species sheet');
      species = options.find((o) => o.id === sheet.id) ?? null;
    } else {
      species = attachedSpecies(options, enclosure.speciesName);
    }
    const pdf = await runEngineTask(
      'reportPdf',
      {
        subject: {
          ...subject,
          organisationName: organisation ?? '',
          exampleData,
        },
        options: { field: query.field, months: query.months, species },
        now: new Date(),
      },
      { signal: req.signal },
    );
    return download(new Uint8Array(pdf), 'application/pdf', `${base}.pdf`);
  },
});
