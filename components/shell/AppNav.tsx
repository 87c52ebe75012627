'use client';

import Link from '@/components/ui/Link';
import { usePathname } from 'next/navigation';
import { focusRing } from '@/components/ui/styles';
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
            className={`whitespace-nowrap rounded-t-md border-b-2 px-3 py-2 text-body font-medium ${focusRing} ${
              active
                ? 'border-sand-400 text-white'
                : 'border-transparent text-basalt-300 hover:border-basalt-500 hover:text-white'
            }`}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
