import type { DesignObject } from '@/simulation';
import { lampLook } from '@/shared/lamp-look';

/**
 * How the objects of a design are drawn: one look over a computed field (dark ink on coloured bands)
 * and one for a plain sketch on a light background.
 */
export type ShapeLook = {
  /** The base line width, in centimetres of the drawing. */
  stroke: number;
  screen: { color: string; width: number; dash: [number, number] };
  glass: { color: string; width: number };
  ledge: { fill: string; stroke: string; width: number };
  hide: { fill: string; stroke: string; width: number };
  foliage: { fill: string; opacity: number; stroke: string; dash: [number, number] };
  perch: string;
  /** Sizes only: a lamp's colours are its kind's, the same in every picture (shared/lamp-look.ts). */
  lamp: { tubeWidth: number; bulbRadius: number };
};

/** Over a computed field: objects stand out from every band colour. */
export function fieldLook(stroke: number): ShapeLook {
  return {
    stroke,
    screen: { color: '#1c1f1a', width: stroke * 1.5, dash: [stroke * 4, stroke * 3] },
    glass: { color: '#3377c5', width: stroke * 2 },
    ledge: { fill: '#7a6e64', stroke: '#1c1f1a', width: stroke },
    hide: { fill: 'none', stroke: '#1c1f1a', width: stroke * 1.5 },
    foliage: { fill: '#3e8546', opacity: 0.25, stroke: '#27552e', dash: [stroke * 4, stroke * 2] },
    perch: '#4a3b2a',
    lamp: { tubeWidth: stroke * 5, bulbRadius: 2 },
  };
}

/** A plain sketch: lamps in their kind's colours, solid furniture in grey. */
export const SKETCH_LOOK: ShapeLook = {
  stroke: 0.8,
  screen: { color: '#7e8673', width: 1.2, dash: [2, 1.5] },
  glass: { color: '#4592d2', width: 1.4 },
  ledge: { fill: '#cdd1c8', stroke: '#4a5143', width: 0.6 },
  hide: { fill: '#cdd1c8', stroke: '#4a5143', width: 0.6 },
  foliage: { fill: '#3e8546', opacity: 0.25, stroke: '#27552e', dash: [2, 1] },
  perch: '#94561f',
  lamp: { tubeWidth: 2.4, bulbRadius: 2.4 },
};

/**
 * The objects of a design as SVG in design coordinates (centimetres, y up): the caller's group flips y.
 * Server- and client-safe (no hooks, no canvas).
 */
export function DesignShapes({ objects, look }: { objects: readonly DesignObject[]; look: ShapeLook }) {
  return <>{objects.map((o) => shapeOf(o, look))}</>;
}

function shapeOf(o: DesignObject, look: ShapeLook) {
  switch (o.type) {
    case 'screen':
    case 'glass':
    case 'perch': {
      const s =
        o.type === 'perch'
          ? { stroke: look.perch, strokeWidth: o.thickness, strokeLinecap: 'round' as const }
          : o.type === 'screen'
            ? {
                stroke: look.screen.color,
                strokeWidth: look.screen.width,
                strokeDasharray: look.screen.dash.join(' '),
              }
            : { stroke: look.glass.color, strokeWidth: look.glass.width };
      return <line key={o.id} x1={o.x1} y1={o.y1} x2={o.x2} y2={o.y2} {...s} />;
    }
    case 'ledge':
    case 'hide':
    case 'foliage': {
      const s =
        o.type === 'foliage'
          ? {
              fill: look.foliage.fill,
              fillOpacity: look.foliage.opacity,
              stroke: look.foliage.stroke,
              strokeWidth: look.stroke,
              strokeDasharray: look.foliage.dash.join(' '),
            }
          : { fill: look[o.type].fill, stroke: look[o.type].stroke, strokeWidth: look[o.type].width };
      return <rect key={o.id} x={o.x} y={o.y} width={o.width} height={o.height} {...s} />;
    }
    case 'lamp': {
      // The studio's marks: a tube is a rounded bar with a core line, a bulb a disc with a core dot.
      const c = lampLook(o);
      const half = (o.length ?? 0) / 2;
      const t = look.lamp.tubeWidth;
      const r = look.lamp.bulbRadius;
      const edge = Math.max(look.stroke, t / 6);
      return o.form === 'tube' && half > 0 ? (
        <g key={o.id} data-lamp-kind={c.word}>
          <rect
            x={o.x - half}
            y={o.y - t / 2}
            width={2 * half}
            height={t}
            rx={t / 2}
            fill={c.fill}
            stroke={c.stroke}
            strokeWidth={edge}
          />
          <line
            x1={o.x - half + t / 2}
            y1={o.y}
            x2={o.x + half - t / 2}
            y2={o.y}
            stroke={c.core}
            strokeWidth={t / 3}
            strokeLinecap="round"
          />
        </g>
      ) : (
        <g key={o.id} data-lamp-kind={c.word}>
          <circle
            cx={o.x}
            cy={o.y}
            r={r}
            fill={c.fill}
            stroke={c.stroke}
            strokeWidth={Math.max(look.stroke, r / 4)}
          />
          <circle cx={o.x} cy={o.y} r={r * 0.45} fill={c.core} />
        </g>
      );
    }
    default:
      return null;
  }
}

/** The height a side view must show: the enclosure and the lamps resting on or above its lid. */
export function drawingTop(design: { enclosure: { height: number }; objects: readonly DesignObject[] }) {
  return Math.max(design.enclosure.height, ...design.objects.map((o) => (o.type === 'lamp' ? o.y + 4 : 0)));
}
