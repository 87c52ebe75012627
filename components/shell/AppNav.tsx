'use client';

import Link from '@/components/ui/Link';
import { usePathname } from 'next/navigation';
import { activeNavHref } from './nav-active';

export type NavItem = { href: string; label: string };

/** The areas of the app; the current one is marked for sight and for screen readers. */
export function AppNav({ items }: { items: NavItem[] }) {
  const current = activeNavHref(
    items.map((i) => i.href),
    usePathname(),
  );
  return (
    <nav aria-label="Main" className="-mb-px flex gap-1 overflow-x-auto">
      {items.map((item) => {
        const active = item.href === current;
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? 'page' : undefined}
            // One class (app/globals.css): the current tab is styled by its aria-current.
            className="nav-tab"
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
