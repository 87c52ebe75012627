import { id, ref, string, table, timestamps } from './columns';

/** A named lighting and heating plan for one enclosure; its content lives in its variants. */
export class Design extends table('designs', {
  id: id(),
  enclosureId: ref(),
  name: string(120),
  createdById: ref().nullable(),
  ...timestamps(),
}) {}
