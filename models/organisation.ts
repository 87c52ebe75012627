import { boolean, id, string, table, timestamps } from './columns';

/** A shop, zoo, rescue or household: the unit that owns people, enclosures and catalogues. */
export class Organisation extends table('organisations', {
  id: id(),
  name: string(120),
  /** Invented example data (the demo): every page and report showing its lamps and readings says so. */
  exampleData: boolean().defaultsTo(false),
  /** How customers reach the shop (each optional): shown on test slips and in e-mails to customers. */
  contactPhone: string(40).nullable(),
  contactEmail: string(254).nullable(),
  contactAddress: string(200).nullable(),
  ...timestamps(),
}) {}
