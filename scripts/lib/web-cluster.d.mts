// Types of scripts/lib/web-cluster.mjs for TypeScript callers.
export declare function webProcesses(value: string | undefined, cores?: number): number;
export declare function runCluster(opts: {
  processes: number;
  exec: string;
  args?: string[];
  pauseMs?: number;
  maxRestarts?: number;
  restartWindowMs?: number;
  log?: (msg: string) => void;
}): { done: Promise<number>; stop: (why?: string) => void; workers: () => unknown[] };
