import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { ReactNode } from 'react';
import { Notice } from './Notice';
import { PageHeader } from './PageHeader';

/**
 * The page around a "new entry" form of an organisation catalogue (species sheets, lamp types): a way
 * back to the list, the title and what to give, and the form — or, for someone who may not add entries,
 * who to ask instead.
 */
export function NewEntryPage({
  back,
  title,
  lead,
  mayCreate,
  refusal,
  children,
}: {
  back: { href: string; label: string };
  title: string;
  lead: string;
  mayCreate: boolean;
  refusal: { title: string; body: string };
  children: ReactNode;
}) {
  return (
    <>
      <Breadcrumbs trail={[back]} />
      <PageHeader title={title} lead={lead} />
      {mayCreate ? (
        children
      ) : (
        <Notice tone="warning" title={refusal.title}>
          {refusal.body}
        </Notice>
      )}
    </>
  );
}
