// Grid resolution for the live fields: fine when the design is still, coarser while dragging so
// that answers keep up with the pointer. Cell sizes come from a short list so results are stable.

const STEPS = [0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10];

/** Cell budget at rest and during a drag (chosen from the engine benchmark on a 2-core machine). */
export const CELLS_AT_REST = 30_000;
export const CELLS_WHILE_DRAGGING = 8_000;

export function cellSizeFor(width: number, height: number, dragging: boolean): number {
  const budget = dragging ? CELLS_WHILE_DRAGGING : CELLS_AT_REST;
  const ideal = Math.sqrt((width * height) / budget);
  return STEPS.find((s) => s >= ideal) ?? Math.ceil(ideal);
}
