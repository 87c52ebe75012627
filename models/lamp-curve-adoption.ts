import { date, id, ref, table, text, timestamps, unsigned } from './columns';

/**
 * One adoption of a shop's measured decay curve for one of its lamp types, with who adopted it and when,
 * the fit as it was then (`fitJson`, frozen), and who withdrew it and when (null while in force).
 */
export class LampCurveAdoption extends table('lamp_curve_adoptions', {
  id: id(),
  organisationId: ref(),
  lampTypeId: ref(),
  lamps: unsigned(),
  readings: unsigned(),
  fitJson: text(),
  adoptedById: ref().nullable(),
  adoptedAt: date(),
  withdrawnById: ref().nullable(),
  withdrawnAt: date().nullable(),
  ...timestamps(),
}) {}
