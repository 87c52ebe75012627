import type { SpeciesSheet } from '../model/species';

export type { SpeciesSheet };

export type FindingStatus = 'pass' | 'attention' | 'fail';

export interface Segment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export type FindingWhere =
  { kind: 'segments'; segments: Segment[] } | { kind: 'object'; objectIds: string[] };

export interface Finding {
  /** 'basking-uvi', 'uv-refuge', 'uv-gradient', 'hot-spot', 'cool-end', 'lamp-in-reach', 'eye-safety', ... */
  id: string;
  status: FindingStatus;
  title: string;
  /** Plain language; always reads as an estimate to verify with a meter and thermometer. */
  message: string;
  numbers: Record<string, number>;
  where?: FindingWhere;
  /**
   * The shared-basking finding only: where the species' basking UV range is met, where its basking
   * surface temperature is met, and where both are (the studio draws the three).
   */
  basking?: { uv: Segment[]; heat: Segment[]; both: Segment[] };
  /**
   * Checked without a species sheet, this finding holds only if the animal climbs (a lamp near mesh it
   * could hang from): the studio lists it under Check rather than as a banner.
   */
  ifClimbs?: true;
}

export interface Assessment {
  findings: Finding[];
  overall: FindingStatus;
}
