// Keeps exactly `slots` tasks running on the pool and always starts the most urgent ready task
// first: reference searches (the long chains every entry waits on) before entries. A plain FIFO
// pool lets a burst of short entry tasks delay the next search in a chain and leaves a worker idle
// at the end of the run.
import type { Piscina } from "piscina";

interface Waiting {
  priority: number;
  order: number;
  task: unknown;
  resolve: (value: unknown) => void;
  reject: (reason: unknown) => void;
}

export function createScheduler(pool: Piscina, slots: number) {
  const waiting: Waiting[] = [];
  let running = 0;
  let order = 0;
  const next = () => {
    while (running < slots && waiting.length > 0) {
      waiting.sort((a, b) => a.priority - b.priority || a.order - b.order);
      const w = waiting.shift()!;
      running++;
      pool.run(w.task).then(w.resolve, w.reject).finally(() => {
        running--;
        next();
      });
    }
  };
  return {
    /** Runs `task` when a slot is free; lower `priority` goes first. */
    run<T>(task: unknown, priority: number): Promise<T> {
      return new Promise<T>((resolve, reject) => {
        waiting.push({ priority, order: order++, task, resolve: resolve as (v: unknown) => void, reject });
        next();
      });
    },
  };
}
