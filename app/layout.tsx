import type { Metadata } from 'next';
import localFont from 'next/font/local';
import { connection } from 'next/server';
import type { ReactNode } from 'react';
import { SafetyNote } from '@/components/shell/SafetyNote';
import { firstFieldScript } from '@/components/studio/first-field-script';
import { ViewerZoneProvider } from '@/components/ui/LocalTime';
import { pageNonce } from '@/lib/security/page-nonce';
import { viewerZone } from '@/lib/time/viewer-zone';
import './globals.css';

const inter = localFont({
  src: '../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2',
  variable: '--font-sans',
  weight: '100 900',
  display: 'swap',
});

export const metadata: Metadata = {
  title: { default: 'Baskwell', template: '%s · Baskwell' },
  description:
    'Plan the light and heat of reptile and amphibian enclosures, check them against the species, and plan lamp replacements from meter readings.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page renders per request: its scripts must carry this request's CSP nonce (proxy.ts), which a
  // page prerendered at build time cannot know.
  await connection();
  // Moments are shown in the viewer's zone; the browser reports it in a cookie after its first page.
  const [zone, nonce] = await Promise.all([viewerZone(), pageNonce()]);
  return (
    <html lang="en" className={inter.variable}>
      <head>
        {/* Shows a studio page's field picture before the first frame (first-field-script.ts): a module
            waits for no stylesheet, and `blocking="render"` keeps the browser from painting before it has
            run. Other pages leave it at once. */}
        <script
          nonce={nonce}
          suppressHydrationWarning
          type="module"
          async
          blocking="render"
          dangerouslySetInnerHTML={{ __html: firstFieldScript() }}
        />
      </head>
      <body className="flex min-h-screen flex-col">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2 focus:text-basalt-900 focus:shadow"
        >
          Skip to content
        </a>
        <ViewerZoneProvider zone={zone}>
          <div className="flex flex-1 flex-col">{children}</div>
        </ViewerZoneProvider>
        <SafetyNote />
      </body>
    </html>
  );
}
