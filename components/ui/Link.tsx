import NextLink from 'next/link';
import type { ComponentProps } from 'react';
import { NavigationPending } from '@/components/shell/NavigationPending';

/** next/link with a visible sign while the page it opens is loading (see NavigationPending). */
export default function Link({ children, ...props }: ComponentProps<typeof NextLink>) {
  return (
    <NextLink {...props}>
      {children}
      <NavigationPending />
    </NextLink>
  );
}
