/** Thrown when a gate already has as many jobs waiting as it allows. */
export class GateFullError extends Error {
  constructor(readonly waiting: number) {
    super(`${waiting} jobs are already waiting`);
    this.name = 'GateFullError';
  }
}

export interface ConcurrencyGate {
  /** Runs the job when fewer than `maxRunning` run; throws GateFullError when the wait is full. */
  run<T>(job: () => Promise<T>): Promise<T>;
  readonly running: number;
  readonly waiting: number;
  readonly maxRunning: number;
  readonly maxWaiting: number;
}

/**
 * At most `maxRunning` jobs at once, the next `maxWaiting` in arrival order, and a refusal
 * beyond that: a flood of expensive jobs then costs the machine a fixed share, and the rest of
 * the app keeps its cores.
 */
export function createConcurrencyGate(options: { maxRunning: number; maxWaiting: number }): ConcurrencyGate {
  let running = 0;
  const queue: (() => void)[] = [];
  const release = () => {
    running -= 1;
    const next = queue.shift();
    if (next) {
      running += 1;
      next();
    }
  };
  return {
    maxRunning: options.maxRunning,
    maxWaiting: options.maxWaiting,
    get running() {
      return running;
    },
    get waiting() {
      return queue.length;
    },
    run<T>(job: () => Promise<T>): Promise<T> {
      if (running < options.maxRunning) {
        running += 1;
        return job().finally(release);
      }
      if (queue.length >= options.maxWaiting) throw new GateFullError(queue.length);
      return new Promise<void>((resolve) => queue.push(resolve)).then(() => job().finally(release));
    },
  };
}
