// Types of scripts/lib/builds.mjs for TypeScript callers.
export declare const BUILD_DIRS: { test: string; scale: string; bench: string };
export declare function emptyMainBuild(dir: string): string[];
