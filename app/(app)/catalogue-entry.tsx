import 'server-only';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import type { ReactNode } from 'react';
import { EntryFormPage } from '@/components/ui/EntryFormPage';
import { loadOwnedForPage, type OwnedRecord } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { can } from '@/lib/permissions';
import { requireMembership, requireUser } from '@/lib/session';
import { toDto as sheetDto } from '@/lib/species/queries';
import type { SpeciesSheetDto } from '@/lib/species/schema';

/** The kinds of entry an organisation keeps in its catalogue, and what the pages show of each. */
type EntryDto = { species: SpeciesSheetDto; 'lamp-type': LampTypeDto };
export type EntryKind = keyof EntryDto;

type Refusal = { title: string; body: string };
type EntryKindPages<K extends EntryKind> = {
  toDto: (row: OwnedRecord<K>) => EntryDto[K];
  name: (entry: EntryDto[K]) => string;
  /** The list the entries are in: the way back from adding one. */
  list: { href: string; label: string };
};

/**
 * Species sheets and lamp types are kept the same way (any member reads them, owner and staff add and
 * change them), so the pages that load, add and change them are made here; each page says its own words.
 */
const KINDS: { [K in EntryKind]: EntryKindPages<K> } = {
  species: {
    toDto: sheetDto,
    name: (sheet) => sheet.commonName,
    list: { href: '/species', label: 'All species' },
  },
  'lamp-type': {
    toDto: lampTypeDto,
    name: (lampType) => lampType.name,
    list: { href: '/lamp-catalogue', label: 'Lamp catalogue' },
  },
};

/** The props of an entry's pages: its id as the address gives it. */
export type EntryPageProps = { params: Promise<{ id: string }> };

/** An entry the user may read (else the page 404s, hiding other organisations' entries). */
export async function loadEntry<K extends EntryKind>(kind: K, user: CurrentUser, rawId: string) {
  const found = await loadOwnedForPage(kind, rawId, user);
  if (!found) notFound();
  return { entry: KINDS[kind].toDto(found.record), mayEdit: found.canEdit };
}

/** An entry page's title: the entry's name. */
export function entryMetadata<K extends EntryKind>(kind: K) {
  return async ({ params }: EntryPageProps): Promise<Metadata> => {
    const user = await requireUser();
    const { entry } = await loadEntry(kind, user, (await params).id);
    return { title: KINDS[kind].name(entry) };
  };
}

/** The page that adds an entry to the organisation's catalogue, or says who may. */
export async function NewEntryPage<K extends EntryKind>({
  kind,
  title,
  lead,
  refusal,
  form,
}: {
  kind: K;
  title: string;
  lead: string;
  /** What someone who may not add entries reads instead of the form. */
  refusal: Refusal;
  form: (organisationId: number) => ReactNode;
}) {
  const { list } = KINDS[kind];
  const session = await requireMembership(`${list.href}/new`);
  if (!session) return null;
  const { user, organisationId } = session;
  return (
    <EntryFormPage
      back={list}
      title={title}
      lead={lead}
      allowed={can(user, 'create', { kind, organisationId })}
      refusal={refusal}
    >
      {form(organisationId)}
    </EntryFormPage>
  );
}

/** The page that changes an entry, or says who may. */
export async function EditEntryPage<K extends EntryKind>({
  kind,
  params,
  lead,
  refusal,
  form,
}: EntryPageProps & {
  kind: K;
  lead?: string;
  /** What someone who may read the entry but not change it reads instead of the form. */
  refusal: Refusal;
  form: (entry: EntryDto[K]) => ReactNode;
}) {
  const { id } = await params;
  const { list, name } = KINDS[kind];
  const user = await requireUser(`${list.href}/${id}/edit`);
  const { entry, mayEdit } = await loadEntry(kind, user, id);
  return (
    <EntryFormPage
      back={{ href: `${list.href}/${entry.id}`, label: name(entry) }}
      title={`Edit: ${name(entry)}`}
      lead={lead}
      allowed={mayEdit}
      refusal={refusal}
    >
      {form(entry)}
    </EntryFormPage>
  );
}
