/**
 * Work done after the answer has gone out (an e-mail that should not slow the answer, or
 * reveal by its time whether it was sent). Failures are logged, never thrown at anyone;
 * `settled()` lets a clean shutdown or a test wait until everything started has finished.
 */
export interface BackgroundTasks {
  run: (what: string, task: () => Promise<unknown>) => void;
  settled: () => Promise<void>;
}

export function createBackgroundTasks(log: (message: string, error: unknown) => void = console.error): BackgroundTasks {
  const running = new Set<Promise<unknown>>();
  return {
    run(what, task) {
      const job: Promise<unknown> = Promise.resolve()
        .then(task)
        .catch((error) => log(`${what} failed:`, error))
        .finally(() => running.delete(job));
      running.add(job);
    },
    async settled() {
      while (running.size > 0) await Promise.allSettled([...running]);
    },
  };
}
