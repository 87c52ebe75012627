import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { ReactNode } from 'react';
import { Notice } from './Notice';
import { PageHeader } from './PageHeader';

/**
 * The page around the form that adds or changes an entry of an organisation catalogue (species sheets,
 * lamp types): a way back (to the list, or to the entry), the title and what to give, and the form — or,
 * for someone who may not add or change entries, who to ask instead.
 */
export function EntryFormPage({
  back,
  title,
  lead,
  allowed,
  refusal,
  children,
}: {
  back: { href: string; label: string };
  title: string;
  lead?: string;
  /** May this person add (or change) the entry; else they read the refusal. */
  allowed: boolean;
  refusal: { title: string; body: string };
  children: ReactNode;
}) {
  return (
    <>
      <Breadcrumbs trail={[back]} />
      <PageHeader title={title} lead={lead} />
      {allowed ? (
        children
      ) : (
        <Notice tone="warning" title={refusal.title}>
          {refusal.body}
        </Notice>
      )}
    </>
  );
}
