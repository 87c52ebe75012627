// Types of scripts/lib/proc.mjs for TypeScript callers (scripts run with tsx).
export declare function log(msg: string): void;
export declare function bin(name: string): string;
export declare function run(
  cmd: string,
  args?: string[],
  opts?: { env?: NodeJS.ProcessEnv; cwd?: string; capture?: boolean; check?: boolean; input?: string },
): Promise<{ code: number; stdout: string; stderr: string }>;
/** Resolves whether something accepts TCP connections on host:port. */
export declare function canConnect(port: number, host?: string): Promise<boolean>;
export declare function freePort(start: number, host?: string): Promise<number>;
