import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { afterAll, describe, expect, it } from 'vitest';
import {
  adminSql,
  ensureDatabases,
  ensureMariaDB,
  mariadbPaths,
  recreateDatabase,
  runningPid,
  type MariadbHandle,
} from './mariadb.mjs';
import { findProgram } from './packages.mjs';

// A throwaway private instance in a temporary folder, on a port of its own.
const dataRoot = mkdtempSync(path.join(os.tmpdir(), 'bw-mdb-'));
const paths = mariadbPaths(dataRoot);
let handle: MariadbHandle | undefined;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

afterAll(async () => {
  await handle?.release();
  rmSync(dataRoot, { recursive: true, force: true });
});

describe.skipIf(!findProgram('mariadbd'))('private MariaDB', () => {
  it('refuses a port another program holds, before touching anything', async () => {
    const blocker = net.createServer();
    await new Promise<void>((r) => blocker.listen(0, '127.0.0.1', () => r()));
    const port = (blocker.address() as net.AddressInfo).port;
    try {
      await expect(ensureMariaDB({ port, dataRoot })).rejects.toThrow(`port ${port} is already in use`);
      expect(existsSync(paths.dataDir)).toBe(false);
    } finally {
      blocker.close();
    }
  });

  it('initialises and starts on its port, is reused, and serves the application user', async () => {
    const port = await freePort();
    handle = await ensureMariaDB({ port, dataRoot });
    expect(handle.started).toBe(true);
    expect(runningPid(paths)).toBe(handle.pid);
    expect((await adminSql('SELECT @@port, @@bind_address, @@character_set_server', paths)).trim()).toBe(
      `${port}\t127.0.0.1\tutf8mb4`,
    );

    const again = await ensureMariaDB({ port, dataRoot });
    expect(again).toMatchObject({ started: false, pid: handle.pid });

    await ensureDatabases(
      { names: ['bw_one', 'bw_one_test'], user: 'bw_app', password: "it's-secret" },
      paths,
    );
    await recreateDatabase('bw_one_test', paths);
    const conn = await mariadb.createConnection({
      host: '127.0.0.1',
      port,
      user: 'bw_app',
      password: "it's-secret",
      database: 'bw_one_test',
    });
    try {
      await conn.query('CREATE TABLE t (id INT PRIMARY KEY)');
      const rows: Array<{ n: bigint | number }> = await conn.query('SELECT COUNT(*) AS n FROM t');
      expect(Number(rows[0]?.n)).toBe(0);
    } finally {
      await conn.end();
    }
    await expect(ensureMariaDB({ port: port + 1, dataRoot })).rejects.toThrow(`running on port ${port}`);
  });

  it('stops the server it started on release', async () => {
    const pid = handle?.pid;
    await handle?.release();
    handle = undefined;
    expect(runningPid(paths)).toBeNull();
    expect(() => process.kill(pid ?? 0, 0)).toThrow();
  });
});
