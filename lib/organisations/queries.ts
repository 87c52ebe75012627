import 'server-only';
import { Membership, Organisation, User } from '@/models';
import { contactLine, type OrganisationContact } from './schemas';

/** Reads of an organisation and its people. Access is checked by the caller (a route's allow()). */

export type MemberRow = Membership & { user?: User };

export const memberJson = (m: MemberRow) => ({
  userId: m.userId,
  name: m.user?.name ?? '',
  email: m.user?.email ?? '',
  role: m.role,
  joinedAt: m.createdAt.toISOString(),
});

export async function organisationName(id: number): Promise<string | null> {
  return (await Organisation.findByPk(id, { attributes: ['name'] }))?.name ?? null;
}

/** Whether the organisation holds invented example data (the demo), which every view of it must say. */
export async function isExampleData(id: number): Promise<boolean> {
  return (await Organisation.findByPk(id, { attributes: ['exampleData'] }))?.exampleData ?? false;
}

/** The organisation's name and how customers reach it (for slips and e-mails to customers), or null. */
export async function organisationContact(id: number) {
  const org = await Organisation.findByPk(id, {
    attributes: ['id', 'name', 'contactPhone', 'contactEmail', 'contactAddress'],
  });
  if (!org) return null;
  const contact: OrganisationContact = {
    contactPhone: org.contactPhone ?? null,
    contactEmail: org.contactEmail ?? null,
    contactAddress: org.contactAddress ?? null,
  };
  return { id: org.id, name: org.name, ...contact, line: contactLine(contact) };
}
