import type { CSSProperties, ReactNode } from 'react';
import type { Design } from '@/simulation';
import { drawingTop } from './DesignShapes';

/**
 * The drawing's extent in design centimetres: the enclosure and the lamps above it, with a margin of
 * `pad` on every side, and the SVG viewBox that shows it.
 */
export function designBox(design: Design, pad: number) {
  const top = drawingTop(design);
  const width = design.enclosure.width + 2 * pad;
  const height = top + 2 * pad;
  return { top, width, height, viewBox: `${-pad} ${-top - pad} ${width} ${height}` };
}

/**
 * A design drawn in its own coordinates (cm, y up) as a labelled SVG picture: the children are drawn
 * inside one group that flips y, so the field, the enclosure and the objects need no conversion. Plain
 * SVG, so it renders on the server too (share pages, the guided start's sketch).
 */
export function DesignSvg({
  design,
  pad,
  label,
  title = false,
  standalone = false,
  style,
  children,
}: {
  design: Design;
  pad: number;
  label: string;
  /** Repeat the label as the SVG's <title> (shown as a tooltip, kept when the SVG is saved on its own). */
  title?: boolean;
  /** An SVG that may be served as its own file: it names its namespace and keeps its aspect ratio. */
  standalone?: boolean;
  style?: CSSProperties;
  children: ReactNode;
}) {
  return (
    <svg
      xmlns={standalone ? 'http://www.w3.org/2000/svg' : undefined}
      viewBox={designBox(design, pad).viewBox}
      role="img"
      aria-label={label}
      className="h-auto w-full"
      preserveAspectRatio={standalone ? 'xMidYMid meet' : undefined}
      style={style}
    >
      {title && <title>{label}</title>}
      <g transform="scale(1,-1)">{children}</g>
    </svg>
  );
}
