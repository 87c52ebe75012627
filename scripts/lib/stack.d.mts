// Types of scripts/lib/stack.mjs for TypeScript callers (scripts run with tsx).
export declare const ROOT: string;
export declare class Lifecycle {
  stop(): Promise<void>;
  handleSignals(exitCode?: number): void;
}
export declare function prepareDatabase(
  life: Lifecycle,
  env: NodeJS.ProcessEnv,
  opts?: { recreate?: string[] },
): Promise<void>;
export declare function migrate(env: NodeJS.ProcessEnv): Promise<void>;
export declare function seed(env: NodeJS.ProcessEnv): Promise<{ created: unknown; signIns: unknown }>;
export declare function startNext(
  life: Lifecycle,
  env: NodeJS.ProcessEnv,
  opts?: { port: number; dev?: boolean; build?: boolean; logFile?: string; processes?: number },
): Promise<unknown>;
