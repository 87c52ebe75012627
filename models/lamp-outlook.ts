import type { NonAttribute } from 'sequelize';
import { date, dateOnly, double, ref, smallUnsigned, string, table, text, unsigned } from './columns';
import type { Lamp } from './lamp';

/**
 * A lamp's outlook as last computed (lib/lamp-log/stored-outlooks.ts writes it): the status, the dates the
 * lamp log filters and sorts by, and the rest as JSON. It is current when `sourceVersion` equals the
 * lamp's `outlookVersion` and `asOf` is today; otherwise pages say the figures are being brought up to
 * date.
 */
export class LampOutlook extends table(
  'lamp_outlooks',
  {
    lampId: ref().primaryKey(),
    organisationId: ref(),
    label: string(120),
    enclosureName: string(120),
    firstUsedOn: dateOnly(),
    status: string(16),
    statusRank: smallUnsigned(),
    nextDueOn: dateOnly().nullable(),
    testDueOn: dateOnly().nullable(),
    replaceDueOn: dateOnly().nullable(),
    fallsBelowOn: dateOnly().nullable(),
    lastReadingAt: date().nullable(),
    remainingFraction: double().nullable(),
    outlookJson: text('medium'),
    asOf: dateOnly(),
    sourceVersion: unsigned(),
    computedAt: date(3),
  },
  { timestamps: false },
) {
  declare lamp?: NonAttribute<Lamp>;
}
