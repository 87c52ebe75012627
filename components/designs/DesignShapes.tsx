import { createElement, type ReactElement } from 'react';
import type { DesignObject } from '@/simulation';
import { kindOf, type ShapeLook, type SvgNode } from '@/shared/object-kinds';
import { drawingTop } from '@/shared/object-kinds/drawing';

export type { ShapeLook };
export { drawingTop };

/**
 * How the objects of a design are drawn: one look over a computed field (dark ink on coloured bands)
 * and one for a plain sketch on a light background. Each kind's colours are in its record
 * (shared/object-kinds/); a lamp's are its kind's, the same in every picture (shared/lamp-look.ts).
 */
export function fieldLook(stroke: number): ShapeLook {
  return { over: 'field', stroke };
}

/** A plain sketch: lamps in their kind's colours, solid furniture in grey. */
export const SKETCH_LOOK: ShapeLook = { over: 'paper', stroke: 0.8 };

/**
 * The objects of a design as SVG in design coordinates (centimetres, y up): the caller's group flips y.
 * Server- and client-safe (no hooks, no canvas).
 */
export function DesignShapes({ objects, look }: { objects: readonly DesignObject[]; look: ShapeLook }) {
  return <>{objects.map((o) => element(kindOf(o.type).svg(o, look), o.id))}</>;
}

function element(node: SvgNode, key?: string): ReactElement {
  return createElement(
    node.tag,
    key === undefined ? node.attrs : { key, ...node.attrs },
    ...(node.children ?? []).map((child, k) => element(child, String(k))),
  );
}
