// Small line icons drawn for Baskwell's studio (24-unit grid, stroke = currentColor). An object kind's
// icon is in its studio record and drawn here as a `glyph`; this module does not import the records,
// which import panels that draw icons.
import type { ReactNode } from 'react';

const P: Record<string, ReactNode> = {
  select: <path d="M5 3l13 8-6 1.5L9 19z" />,
  pan: (
    <path d="M12 3v18M3 12h18M12 3l-3 3M12 3l3 3M12 21l-3-3M12 21l3-3M3 12l3-3M3 12l3 3M21 12l-3-3M21 12l-3 3" />
  ),
  probe: (
    <>
      <path d="M12 3l3 6-3 12-3-12z" />
      <circle cx="12" cy="9" r="1.5" />
    </>
  ),
  ruler: <path d="M3 17L17 3l4 4L7 21zM7 13l2 2M10 10l2 2M13 7l2 2" />,
  undo: <path d="M9 7L4 12l5 5M4 12h11a5 5 0 010 10h-2" />,
  redo: <path d="M15 7l5 5-5 5M20 12H9a5 5 0 000 10h2" />,
  duplicate: (
    <>
      <rect x="8" y="8" width="12" height="12" rx="2" />
      <path d="M16 8V6a2 2 0 00-2-2H6a2 2 0 00-2 2v8a2 2 0 002 2h2" />
    </>
  ),
  delete: <path d="M4 7h16M9 7V4h6v3M6 7l1 13h10l1-13M10 11v6M14 11v6" />,
  forward: (
    <>
      <rect x="8" y="4" width="12" height="12" rx="1" />
      <path d="M4 8v12h12" />
    </>
  ),
  backward: (
    <>
      <rect x="4" y="8" width="12" height="12" rx="1" />
      <path d="M8 4h12v12" />
    </>
  ),
  zoomIn: <path d="M11 4a7 7 0 100 14 7 7 0 000-14zM21 21l-5-5M11 8v6M8 11h6" />,
  zoomOut: <path d="M11 4a7 7 0 100 14 7 7 0 000-14zM21 21l-5-5M8 11h6" />,
  fit: <path d="M4 9V4h5M20 9V4h-5M4 15v5h5M20 15v5h-5" />,
  grid: <path d="M4 4h16v16H4zM4 10h16M4 15h16M10 4v16M15 4v16" />,
  magnet: <path d="M6 4v8a6 6 0 0012 0V4h-4v8a2 2 0 01-4 0V4zM6 8h4M14 8h4" />,
  help: (
    <>
      <circle cx="12" cy="12" r="9" />
      <path d="M9.5 9.5a2.5 2.5 0 114 2c-1 .7-1.5 1.2-1.5 2.5M12 17h.01" />
    </>
  ),
  save: <path d="M5 4h11l3 3v13H5zM8 4v5h7V4M8 20v-6h8v6" />,
  back: <path d="M15 5l-7 7 7 7" />,
};

export type IconName = keyof typeof P;

/** A named icon, or `glyph`: strokes of its own on the same grid (an object kind's, from its record). */
export function Icon({
  name,
  glyph,
  className = 'h-5 w-5',
}: ({ name: IconName; glyph?: undefined } | { glyph: ReactNode; name?: undefined }) & {
  className?: string;
}) {
  return (
    <svg
      viewBox="0 0 24 24"
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth={1.7}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
    >
      {name ? P[name] : glyph}
    </svg>
  );
}
