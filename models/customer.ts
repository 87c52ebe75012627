import { date, id, ref, string, table, text, timestamps } from './columns';

/**
 * A person whose lamps the shop tests at its counter. Personal data (name, e-mail, phone, notes) are the
 * organisation's alone; keepers never see them. Consent to reminder e-mails is kept with its date, and
 * when it was withdrawn.
 */
export class Customer extends table('customers', {
  id: id(),
  organisationId: ref(),
  name: string(120),
  email: string(254).nullable(),
  phone: string(40).nullable(),
  notes: text().nullable(),
  reminderConsentAt: date().nullable(),
  reminderConsentWithdrawnAt: date().nullable(),
  /** The keeper account this customer became (a member with the keeper role), if linked. */
  keeperUserId: ref().nullable(),
  createdById: ref().nullable(),
  ...timestamps(),
}) {}
