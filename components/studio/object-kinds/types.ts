// The studio's half of an object kind's record: what only the canvas and the inspector need (Konva and
// React: the canvas shape, the palette icon and the inspector form), kept out of the pure record in
// shared/object-kinds/ so that the server's report raster and the share pages never load it. One file a
// kind, registered in index.ts and found by type.
import type { ReactNode } from 'react';
import type { ObjectOf, ObjectType } from '@/shared/object-kinds';
import type { Camera } from '../geometry/camera';

export interface StudioKind<K extends ObjectType> {
  /**
   * Its look on the studio canvas, drawn in stage pixels from the camera. Nothing in it listens to
   * events: hit testing is the canvas's (interaction.ts), from the kind's form.
   */
  Shape(props: { o: ObjectOf<K>; cam: Camera }): ReactNode;
  /** Its palette icon: strokes on the icons' 24-unit grid (panels/icons.tsx draws the frame). */
  icon: ReactNode;
  /** Its fields in the inspector, below the name every kind has. */
  Form(props: { o: ObjectOf<K> }): ReactNode;
}
