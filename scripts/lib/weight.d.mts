// Types of scripts/lib/weight.mjs for TypeScript callers (tests/browser/weight.browser.ts).
export type Marker = 'konva' | 'engine';
export type Bytes = { raw: number; gzip: number };
export declare const PAGES: { name: string; route: string; draws: boolean }[];
export declare const MARKERS: Record<Marker, string>;
export declare function findDistDir(root: string, preferred?: string): string | null;
export declare function firstLoadFiles(dist: string, route: string): string[];
export declare function weigh(dist: string, files: string[]): Bytes;
export declare function markersIn(dist: string, files: string[]): Marker[];
export declare function filesWithMarker(dist: string, name: Marker): string[];
export declare function measurePages(dist: string): {
  name: string;
  route: string;
  draws: boolean;
  files: string[];
  firstLoad: Bytes;
  markers: Marker[];
  lazyFiles: string[];
  lazy: Bytes;
}[];
