import { z } from 'zod';

const range = (lo: number, hi: number) =>
  z
    .tuple([z.number().finite().min(lo).max(hi), z.number().finite().min(lo).max(hi)])
    .refine(([a, b]) => a <= b, 'the lower bound must not exceed the upper bound');

/** A species sheet: what an animal needs (temperatures in °C, UV zone of Ferguson et al. 2010). */
export const speciesSheetSchema = z.strictObject({
  name: z.string().trim().min(1).max(200),
  uvZone: z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4)]),
  baskingSurfaceC: range(-10, 80),
  coolEndC: range(-10, 80),
  nightMinC: z.number().finite().min(-10).max(60).optional(),
  /** Optional broadband UVB target at the basking spot, µW/cm². */
  uvbTargetUw: range(0, 100000).optional(),
  /**
   * Adult total length, nose to tail tip, cm (shelled animals and frogs: their body length). Sizes the
   * shared basking spot; absent, the shortest one (BASKING_MIN_CM) is asked for.
   */
  adultLengthCm: z.number().finite().gt(0).max(1000).optional(),
  /** Climbs walls and mesh: the underside of every screen becomes a reachable surface. Default false. */
  climbs: z.boolean().optional(),
  /**
   * An albino or hypomelanistic morph: with little skin pigment it is aimed one UV zone lower (zone 1
   * stays zone 1) and the basking finding carries a caution. Default false.
   */
  lowMelanin: z.boolean().optional(),
  /** Day length, hours: named in the timer advice for UV lamps. */
  photoperiodH: range(0, 24).optional(),
});

export type SpeciesSheet = z.infer<typeof speciesSheetSchema>;
