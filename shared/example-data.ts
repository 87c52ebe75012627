/**
 * The words that mark invented example data (the demo organisations) wherever their lamps, readings and
 * reports appear, so a demo reading is never taken for a real shop's.
 */
export const EXAMPLE_DATA_LABEL = 'Example data';

export const EXAMPLE_DATA_NOTE =
  'Example data: invented for the Baskwell demo. These lamps and meter readings are not real measurements.';
