/** The standing note printed with every figure of a report. */
export const ESTIMATE_NOTE =
  'Every figure here is an estimate from a model — verify with a meter and thermometer (a UV meter and a thermometer in the enclosure) before relying on it.';

/** Printed under the cautions, as the app shows it under its caution list. */
export const DEFER_NOTE =
  'These notes do not replace a reptile-experienced vet, the lamp maker’s instructions or local electrical and fire codes.';
