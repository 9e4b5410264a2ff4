// The app as a child process (server/index.ts with tsx's loader), for the load benchmark and the crash
// tests: started with its own environment, waited for until it answers, stopped or killed.
import { spawn, type ChildProcess } from 'node:child_process';
import { openSync, closeSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '../..');
/** Long enough for tsx to compile the server and run the migrations on a slow machine. */
const READY_TIMEOUT_MS = 30_000;
const READY_POLL_MS = 100;

export interface ServerProcess {
  child: ChildProcess;
  url: string;
  /** Resolves once the process has exited, with its signal or code. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  stop(): Promise<void>;
}

/**
 * Starts the app on `port` with `env` on top of a minimal environment; stdout and stderr go to
 * `logFile`. `entry` (relative to the repository, with `args`) starts another server instead.
 */
export async function startServerProcess(opts: {
  port: number;
  env: Record<string, string>;
  logFile: string;
  entry?: string;
  args?: string[];
  /** Node's own flags (e.g. --cpu-prof), before the loader. */
  nodeArgs?: string[];
}): Promise<ServerProcess> {
  const fd = openSync(opts.logFile, 'a');
  // tsx as a loader in this one process (not its CLI, which runs the server in a grandchild): a
  // signal sent to the child reaches the server itself.
  const child = spawn(
    process.execPath,
    [...(opts.nodeArgs ?? []), '--import', 'tsx', join(root, opts.entry ?? 'server/index.ts'), ...(opts.args ?? [])],
    {
      cwd: root,
      env: { PATH: process.env.PATH ?? '', HOST: '127.0.0.1', PORT: String(opts.port), ...opts.env },
      stdio: ['ignore', fd, fd],
    },
  );
  closeSync(fd);
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((res) =>
    child.once('exit', (code, signal) => res({ code, signal })),
  );
  const url = `http://127.0.0.1:${opts.port}`;
  await waitUntilAnswering(url, exited);
  return {
    child,
    url,
    exited,
    async stop() {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
      await exited;
    },
  };
}

/** Polls until the app answers an API request (any status) or the process exits. */
export async function waitUntilAnswering(url: string, exited?: Promise<unknown>, timeoutMs = READY_TIMEOUT_MS): Promise<number> {
  const started = Date.now();
  let gone = false;
  void exited?.then(() => (gone = true));
  while (Date.now() - started < timeoutMs) {
    if (gone) throw new Error('the server exited before it answered');
    try {
      const res = await fetch(`${url}/api/auth/me`);
      await res.arrayBuffer();
      return Date.now() - started;
    } catch {
      await new Promise((r) => setTimeout(r, READY_POLL_MS));
    }
  }
  throw new Error(`the server did not answer within ${timeoutMs} ms`);
}
