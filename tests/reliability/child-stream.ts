// Runs a tsx child that reports one JSON event a line on stdout and takes commands on stdin, and lets a
// test wait for what it has reported so far.
import { spawn, type ChildProcess } from 'node:child_process';
import { createInterface } from 'node:readline';
import { ROOT, TSX, tsxArgs } from '../helpers/tsx';

export type ChildEvent = { ev: string; [key: string]: unknown };

export type EventChild = {
  events: ChildEvent[];
  send(command: string): void;
  /** Resolves when `check` passes on the events so far; rejects (with the stderr tail) after `ms`. */
  until(what: string, check: (events: ChildEvent[]) => boolean, ms: number): Promise<void>;
  exited: Promise<number | null>;
  kill(): void;
};

export function eventChild(file: string, env: NodeJS.ProcessEnv): EventChild {
  // A process group of its own: tsx runs the script in a node child, and kill() must reach both.
  const child: ChildProcess = spawn(TSX, tsxArgs(file), {
    cwd: ROOT,
    env,
    stdio: ['pipe', 'pipe', 'pipe'],
    detached: true,
  });
  const events: ChildEvent[] = [];
  let stderr = '';
  let exitCode: number | null | undefined;
  child.stderr!.on('data', (d: Buffer) => (stderr = (stderr + d.toString()).slice(-4000)));
  createInterface({ input: child.stdout! }).on('line', (line) => {
    try {
      events.push(JSON.parse(line) as ChildEvent);
    } catch {
      stderr = `${stderr}\n(stdout) ${line}`.slice(-4000);
    }
  });
  const exited = new Promise<number | null>((resolve) =>
    child.on('exit', (code) => {
      exitCode = code;
      resolve(code);
    }),
  );
  return {
    events,
    send: (command) => child.stdin!.write(`${command}\n`),
    async until(what, check, ms) {
      const end = Date.now() + ms;
      while (!check(events)) {
        if (exitCode !== undefined) throw new Error(`child exited (${exitCode}) before ${what}:\n${stderr}`);
        if (Date.now() > end) throw new Error(`no ${what} within ${ms} ms; child stderr:\n${stderr}`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    exited,
    kill: () => {
      if (exitCode !== undefined || !child.pid) return;
      try {
        process.kill(-child.pid, 'SIGKILL');
      } catch {
        /* already gone */
      }
    },
  };
}
