// A small in-process job queue: photo processing runs off the request path, one or two at a time,
// so a burst of uploads cannot starve the server of memory or CPU. The job's state lives in the
// database (the page polls it); this queue only decides when work runs.

export interface JobQueue {
  /** Queues `id` unless it is already waiting; a job that is running is queued again to run after it. */
  add(id: string): void;
  /** True while `id` is waiting or running here. */
  has(id: string): boolean;
  /** Resolves when nothing is waiting or running. */
  idle(): Promise<void>;
}

export function createJobQueue(
  run: (id: string) => Promise<void>,
  opts: { concurrency: number; onError: (id: string, err: unknown) => void },
): JobQueue {
  const waiting: string[] = [];
  const running = new Set<string>();
  let idleWaiters: (() => void)[] = [];

  const settleIdle = () => {
    if (waiting.length === 0 && running.size === 0) {
      const waiters = idleWaiters;
      idleWaiters = [];
      for (const w of waiters) w();
    }
  };

  const pump = () => {
    while (running.size < opts.concurrency) {
      // Skip a job whose earlier run is still going: it waits for its turn instead of racing itself.
      const index = waiting.findIndex((id) => !running.has(id));
      if (index < 0) break;
      const [id] = waiting.splice(index, 1);
      running.add(id);
      run(id)
        .catch((err) => opts.onError(id, err))
        .finally(() => {
          running.delete(id);
          pump();
          settleIdle();
        });
    }
  };

  return {
    add(id) {
      if (!waiting.includes(id)) waiting.push(id);
      pump();
    },
    has: (id) => running.has(id) || waiting.includes(id),
    idle: () =>
      new Promise<void>((resolve) => {
        idleWaiters.push(resolve);
        settleIdle();
      }),
  };
}
