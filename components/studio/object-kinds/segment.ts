// What the segment kinds' canvas shapes share: their two ends in stage pixels.
import type { SegmentObject } from '@/shared/object-kinds';
import { designToStage, type Camera, type Point } from '../geometry/camera';

export function stageEnds(o: SegmentObject, cam: Camera): [a: Point, b: Point] {
  return [designToStage(cam, { x: o.x1, y: o.y1 }), designToStage(cam, { x: o.x2, y: o.y2 })];
}
