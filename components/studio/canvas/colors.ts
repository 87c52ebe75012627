// Canvas colours, from the Baskwell palette in tailwind.config.ts (Konva needs plain values).
export const C = {
  ink: '#1c1f1a', // basalt-900
  basalt200: '#cdd1c8',
  basalt300: '#a9afa1',
  basalt400: '#7e8673',
  basalt500: '#5f6756',
  basalt600: '#4a5143',
  basalt700: '#3b4036',
  paper: '#fbfaf6',
  outside: '#eef0eb',
  sand100: '#f9efd6',
  sand200: '#f2dcab',
  sand300: '#e9c475',
  sand400: '#dfa845',
  sand500: '#d18f2b',
  sand700: '#94561f',
  sand800: '#784520',
  moss300: '#8fc292',
  moss400: '#5fa265',
  moss600: '#2e6a36',
  moss700: '#27552e',
  ember200: '#f8cdc7',
  ember500: '#da5540',
  ember700: '#a5301f',
  sky100: '#ddedf8',
  sky300: '#98cbea',
  sky400: '#67aede',
  sky600: '#3377c5',
  sky700: '#2b63b4',
  sky800: '#295193',
  white: '#ffffff',
} as const;

/** Selection and handle colour. */
export const SELECT = C.sky600;
/** Highlight of a finding's location. */
export const HIGHLIGHT = C.sand400;

/**
 * The basking marks drawn over a surface (HusbandryLayer): colour, height above the surface (px) and
 * name, which the canvas legend repeats as a key.
 */
export const BASKING_MARKS = {
  uv: { colour: C.sky600, lift: 7, label: 'UV range' },
  heat: { colour: C.ember500, lift: 13, label: 'Basking heat' },
  both: { colour: C.moss600, lift: 19, label: 'UV + heat' },
} as const;

export type BaskingMarkKind = keyof typeof BASKING_MARKS;
