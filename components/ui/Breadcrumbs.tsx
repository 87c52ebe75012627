import Link from '@/components/ui/Link';
import { Fragment } from 'react';
import { link } from './styles';

export type Crumb = { href: string; label: string };

/**
 * The way up from a page: the pages above it as links, then this page's own name (marked as the current
 * page for screen readers). With one crumb and no current name it is a plain "← back" link, the form the
 * catalogue and edit pages use.
 */
export function Breadcrumbs({ trail, current }: { trail: Crumb[]; current?: string }) {
  const [back] = trail;
  if (current === undefined && trail.length === 1 && back) {
    return (
      <p className="mb-2 text-body">
        <Link href={back.href} className={link}>
          ← {back.label}
        </Link>
      </p>
    );
  }
  return (
    <nav aria-label="Breadcrumb" className="mb-2 text-body">
      {trail.map((crumb, i) => (
        <Fragment key={crumb.href}>
          {i > 0 && <Separator />}
          <Link href={crumb.href} className={link}>
            {crumb.label}
          </Link>
        </Fragment>
      ))}
      {current !== undefined && (
        <>
          <Separator />
          <span aria-current="page">{current}</span>
        </>
      )}
    </nav>
  );
}

function Separator() {
  return (
    <span className="text-basalt-500" aria-hidden="true">
      {' '}
      /{' '}
    </span>
  );
}
