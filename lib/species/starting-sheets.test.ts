import { describe, expect, it } from 'vitest';
import { speciesSheetSchema } from '@/simulation';
import { SHEET_FIELDS, speciesInputSchema, type SheetField } from './schema';
import { STARTING_SHEETS } from './starting-sheets';
import { toEngineSheet } from './to-engine';

const hasValue = (sheet: (typeof STARTING_SHEETS)[number], f: SheetField) => sheet[f] !== null;

describe('starting species sheets', () => {
  it('has a dozen species, each with a unique seed key and scientific name', () => {
    expect(STARTING_SHEETS.length).toBe(12);
    expect(new Set(STARTING_SHEETS.map((s) => s.seedKey)).size).toBe(12);
    expect(new Set(STARTING_SHEETS.map((s) => s.scientificName)).size).toBe(12);
  });

  it('covers lizards, snakes, a chameleon, geckos, chelonians and an amphibian', () => {
    const names = STARTING_SHEETS.map((s) => s.scientificName);
    for (const n of [
      'Pogona vitticeps',
      'Eublepharis macularius',
      'Correlophus ciliatus',
      'Chamaeleo calyptratus',
    ]) {
      expect(names).toContain(n);
    }
    for (const n of ['Pantherophis guttatus', 'Python regius', 'Testudo hermanni', 'Litoria caerulea']) {
      expect(names).toContain(n);
    }
  });

  it.each(STARTING_SHEETS.map((s) => [s.commonName, s] as const))(
    '%s passes the input schema',
    (_name, sheet) => {
      const { seedKey: _k, ...input } = sheet;
      const r = speciesInputSchema.safeParse(input);
      expect(r.success, JSON.stringify(!r.success && r.error.issues)).toBe(true);
    },
  );

  it.each(STARTING_SHEETS.map((s) => [s.commonName, s] as const))(
    '%s: every figure it gives is covered by a source, each a citation or marked "from memory"',
    (_name, sheet) => {
      expect(sheet.sources.length).toBeGreaterThan(0);
      for (const field of SHEET_FIELDS.filter((f) => hasValue(sheet, f))) {
        const covering = sheet.sources.filter((s) => s.covers.includes(field));
        expect(covering.length, `${field} has no source`).toBeGreaterThan(0);
      }
      for (const s of sheet.sources) {
        const honest =
          /from memory/i.test(s.citation) ||
          /common practice, no published source/i.test(s.citation) ||
          /\b(19|20)\d\d\b/.test(s.citation);
        expect(honest, s.citation).toBe(true);
        expect(s.confidence.length).toBeGreaterThan(0);
      }
    },
  );

  it('names the UV zone definitions by their published source on every sheet', () => {
    for (const sheet of STARTING_SHEETS) {
      const zone = sheet.sources.find((s) => s.covers.includes('uvZone'));
      expect(zone?.citation).toMatch(/Ferguson et al\. 2010, Zoo Biology 29:317–334/);
      // The species' zone itself is from memory, and says so.
      expect(zone?.confidence).toMatch(/from memory/);
    }
  });

  it('turns into a valid engine species sheet', () => {
    for (const sheet of STARTING_SHEETS) {
      const r = speciesSheetSchema.safeParse(toEngineSheet(sheet));
      expect(r.success, sheet.commonName).toBe(true);
    }
  });
});
