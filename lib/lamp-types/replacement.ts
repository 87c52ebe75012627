import type { LampTechId } from '@/models/lamp-type';

/**
 * Typical replacement interval per technology, months: what keepers are usually told when they have no
 * meter (common practice, no published source). A lamp's own readings in the lamp log are better: they
 * say when the basking-zone UV actually falls below the species' need. null: replace when it fails.
 */
export const TYPICAL_REPLACEMENT_MONTHS: Record<LampTechId, number | null> = {
  t5: 12,
  t8: 6,
  compact: 6,
  'mercury-vapour': 12,
  'metal-halide': 12,
  'led-uvb': null,
  halogen: null,
  incandescent: null,
  ceramic: null,
};

export const REPLACEMENT_SOURCE =
  'typical replacement interval: common practice, no published source — meter readings in the lamp log decide better';
export const LED_REPLACEMENT_SOURCE =
  'no established replacement interval for UVB LEDs (common practice, no published source) — follow meter readings';
export const HEAT_REPLACEMENT_SOURCE = 'heat-only lamp: replace when it fails';
