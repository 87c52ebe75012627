'use client';
import { memo } from 'react';
import type { Camera } from '../geometry/camera';
import { studioKindOf } from '../object-kinds';
import type { DesignObject } from '../state/types';

/**
 * A design object on the canvas, in the look its kind's studio record draws (object-kinds/<kind>.tsx):
 * our own visual language, in stage pixels from the camera. Memoised, so an object that did not change
 * is not drawn again when another one moves.
 */
export const ObjectShape = memo(function ObjectShape({ o, cam }: { o: DesignObject; cam: Camera }) {
  const { Shape } = studioKindOf(o.type);
  return <Shape o={o} cam={cam} />;
});
