// Types of scripts/lib/packages.mjs for TypeScript callers (tests).
export declare function nodeModulesProblem(root?: string): string | null;
export declare function ensureNodeModules(): Promise<boolean>;
export declare function findProgram(name: string): string | null;
export declare function ensureApt(
  wanted: Record<string, string | string[]>,
  options?: { quiet?: boolean },
): Promise<boolean>;
