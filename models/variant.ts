import { authorship, id, ref, string, table, text, timestamps, unsigned } from './columns';

/**
 * One alternative of a design. `designJson` is the design file (validated with the engine's parseDesign
 * before every write); `version` rises by one on every saved change so concurrent edits are caught.
 */
export class Variant extends table('variants', {
  id: id(),
  designId: ref(),
  name: string(120),
  designJson: text('long'),
  version: unsigned().defaultsTo(1),
  ...authorship(),
  ...timestamps(),
}) {}
