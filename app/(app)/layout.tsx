import Link from '@/components/ui/Link';
import type { ReactNode } from 'react';
import { AppNav, type NavItem } from '@/components/shell/AppNav';
import { BrandMark } from '@/components/shell/BrandMark';
import { NoOrganisation } from '@/components/shell/NoOrganisation';
import { OrganisationSwitcher } from '@/components/shell/OrganisationSwitcher';
import { SessionKeepAlive } from '@/components/shell/SessionKeepAlive';
import { SignOutButton } from '@/components/shell/SignOutButton';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { mailViewerEnabled } from '@/lib/mail-viewer';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

/** Everything behind sign-in: header with the organisation, navigation, and the page. */
export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requireUser();
  const membership = await currentMembership(user);
  const orgId = membership?.organisationId ?? 0;
  const items: NavItem[] = [
    { href: '/enclosures', label: 'Enclosures' },
    ...(can(user, 'read', { kind: 'member', organisationId: orgId })
      ? [{ href: '/keepers', label: 'Keepers' }]
      : []),
    { href: '/lamp-log', label: 'Lamp log' },
    ...(can(user, 'read', { kind: 'customer', organisationId: orgId })
      ? [
          { href: '/counter', label: 'Counter' },
          { href: '/customers', label: 'Customers' },
        ]
      : []),
    ...(can(user, 'read', { kind: 'shop-figures', organisationId: orgId })
      ? [{ href: '/counter/dashboard', label: 'Counter figures' }]
      : []),
    { href: '/species', label: 'Species' },
    { href: '/lamp-catalogue', label: 'Lamp catalogue' },
    ...(can(user, 'read', { kind: 'member', organisationId: orgId })
      ? [{ href: '/members', label: 'Members' }]
      : []),
    ...(can(user, 'read', { kind: 'jobs', organisationId: orgId }) ? [{ href: '/jobs', label: 'Jobs' }] : []),
    ...(membership && can(user, 'update', { kind: 'organisation', id: orgId })
      ? [{ href: '/organisation', label: 'Settings' }]
      : []),
    ...(mailViewerEnabled() && can(user, 'read', { kind: 'mail', organisationId: orgId })
      ? [{ href: '/mail', label: 'Mail (dev)' }]
      : []),
  ];
  // One query client for the whole signed-in page: the header's organisation switcher writes too.
  return (
    <QueryProvider>
      <SessionKeepAlive />
      <header className="bg-basalt-900">
        <div className="mx-auto max-w-6xl px-4 sm:px-6">
          <div className="flex flex-wrap items-center justify-between gap-3 py-3">
            <div className="flex items-center gap-4">
              <BrandMark href="/enclosures" inverted />
              {membership && <OrganisationSwitcher memberships={user.memberships} currentId={orgId} />}
            </div>
            <div className="flex items-center gap-3 text-body text-basalt-300">
              <Link
                href="/account"
                className="rounded px-1 hover:text-white focus-visible:outline focus-visible:outline-2 focus-visible:outline-sky-400"
                title={`${user.email}: your account, password and sessions`}
              >
                {user.name}
                {membership && <span className="text-basalt-300"> · {membership.role}</span>}
              </Link>
              <SignOutButton className="rounded px-2 py-1 text-body text-basalt-200 hover:bg-basalt-800 hover:text-white focus-visible:outline focus-visible:outline-2 focus-visible:outline-sky-400" />
            </div>
          </div>
          {membership && <AppNav items={items} />}
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        {membership ? children : <NoOrganisation />}
      </main>
    </QueryProvider>
  );
}
