// A MariaDB of a test's own: its own data folder in a temporary directory and its own free port, so a
// test may kill it (SIGKILL by pid) or change its global settings without touching the shared test
// instance. Started with the same flags as the project's own (scripts/lib/mariadb.mjs).
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {
  adminSql,
  ensureDatabases,
  ensureMariaDB,
  mariadbPaths,
  runningPid,
  stopMariaDB,
  type MariadbPaths,
} from '../../scripts/lib/mariadb.mjs';
import { freePort } from '../helpers/ports';

export const THROWAWAY_USER = 'baskwell';
export const THROWAWAY_PASSWORD = 'throwaway-test-password';

export type Throwaway = {
  port: number;
  root: string;
  paths: MariadbPaths;
  database: string;
  /** The running mariadbd's pid (read from its pid file and checked against /proc). */
  pid(): number | null;
  /** Starts (or restarts, on the same data folder and port) the server; resolves once it answers. */
  start(): Promise<number>;
  sql(statement: string): Promise<string>;
  /** Environment for a child process of the app pointed at this server's database. */
  env(): NodeJS.ProcessEnv;
  /** Stops the server (cleanly, or by SIGKILL when it will not) and removes its folder. */
  destroy(): Promise<void>;
};

export async function throwawayMariaDB(database: string): Promise<Throwaway> {
  // Short path: the socket lives beside the data and unix socket paths are limited to ~107 bytes.
  const root = mkdtempSync(path.join(os.tmpdir(), 'bw-mdb-'));
  const paths = mariadbPaths(root);
  const port = await freePort();
  const t: Throwaway = {
    port,
    root,
    paths,
    database,
    pid: () => runningPid(paths),
    async start() {
      const handle = await ensureMariaDB({ port, dataRoot: root, owner: 'auto' });
      await ensureDatabases({ names: [database], user: THROWAWAY_USER, password: THROWAWAY_PASSWORD }, paths);
      return handle.pid;
    },
    sql: (statement) => adminSql(statement, paths),
    env: () => ({
      ...process.env,
      DB_HOST: '127.0.0.1',
      DB_PORT: String(port),
      DB_NAME: database,
      DB_USER: THROWAWAY_USER,
      DB_PASSWORD: THROWAWAY_PASSWORD,
    }),
    async destroy() {
      const pid = runningPid(paths);
      if (pid) {
        await stopMariaDB(paths).catch(() => {
          try {
            process.kill(pid, 'SIGKILL');
          } catch {
            /* already gone */
          }
        });
      }
      rmSync(root, { recursive: true, force: true });
    },
  };
  return t;
}
