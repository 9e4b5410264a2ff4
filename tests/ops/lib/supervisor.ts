// A small supervisor for fault tests: keeps one app child process running on a fixed port and
// starts a new one whenever the last exits (as systemd or a container runtime would).
import { startServerProcess, type ServerProcess } from '../../../scripts/lib/server-process';

export interface Supervisor {
  url: string;
  /** Restarts so far, and how long each took until the new process answered. */
  restarts: number[];
  current(): ServerProcess | null;
  /** Resolves once a process is answering. */
  ready(): Promise<void>;
  stop(): Promise<void>;
}

export async function supervise(opts: { port: number; env: Record<string, string>; logFile: string }): Promise<Supervisor> {
  let proc: ServerProcess | null = null;
  let stopping = false;
  let readyPromise: Promise<void>;
  const restarts: number[] = [];

  const launch = async (restart: boolean): Promise<void> => {
    const started = Date.now();
    proc = await startServerProcess(opts);
    if (restart) restarts.push(Date.now() - started);
    const mine = proc;
    void mine.exited.then(() => {
      if (stopping || proc !== mine) return;
      proc = null;
      readyPromise = launch(true);
    });
  };
  readyPromise = launch(false);
  await readyPromise;
  return {
    url: `http://127.0.0.1:${opts.port}`,
    restarts,
    current: () => proc,
    ready: () => readyPromise,
    async stop() {
      stopping = true;
      await readyPromise.catch(() => undefined);
      await proc?.stop();
    },
  };
}
