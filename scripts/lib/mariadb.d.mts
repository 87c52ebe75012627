// Types of scripts/lib/mariadb.mjs for TypeScript callers (tests).
export type MariadbPaths = {
  dataDir: string;
  pidFile: string;
  logFile: string;
  ownerFile: string;
  usersDir: string;
  socket: string;
};
export type MariadbHandle = { pid: number; started: boolean; socket: string; release(): Promise<void> };
export declare function mariadbPaths(dataRoot?: string): MariadbPaths;
export declare function runningPid(p?: MariadbPaths): number | null;
export declare function adminSql(sql: string, p?: MariadbPaths): Promise<string>;
export declare function ensureMariaDB(options: {
  port: number;
  owner?: 'auto' | 'manual';
  dataRoot?: string;
}): Promise<MariadbHandle>;
export declare function stopMariaDB(p?: MariadbPaths): Promise<boolean>;
export declare function ensureDatabases(
  options: { names: string[]; user: string; password: string },
  p?: MariadbPaths,
): Promise<void>;
export declare function recreateDatabase(name: string, p?: MariadbPaths): Promise<void>;
