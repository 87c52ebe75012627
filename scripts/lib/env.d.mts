// Types of scripts/lib/env.mjs for TypeScript callers (tests).
export declare const ROOT: string;
export declare const DATA_DIR: string;
export declare const BIN: string;
export declare const DEFAULTS: Record<string, string>;
export declare function parseDotEnv(text: string): Record<string, string>;
export declare function loadEnv(): NodeJS.ProcessEnv;
export declare function ensureSecret(): string;
export declare function usesPrivateDb(env?: Record<string, string | undefined>): boolean;
export declare function urlPort(url: string): number;
