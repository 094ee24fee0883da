/** Thrown by a full queue: the caller should try again later. */
export class QueueFullError extends Error {
  constructor(readonly waiting: number) {
    super(`${waiting} jobs are already waiting`);
    this.name = 'QueueFullError';
  }
}

export interface SerialQueue {
  /** Runs the job after every job added before it has finished; throws QueueFullError when full. */
  run<T>(job: () => Promise<T>): Promise<T>;
  /** Jobs added and not yet finished (the running one included). */
  readonly pending: number;
}

/**
 * One job at a time, in arrival order, with at most `maxPending` jobs admitted. A compile
 * takes a core of the machine for seconds, so the server runs one and lets a few wait rather
 * than starting one per request.
 */
export function createSerialQueue(maxPending: number): SerialQueue {
  let tail: Promise<unknown> = Promise.resolve();
  let pending = 0;
  return {
    get pending() {
      return pending;
    },
    run<T>(job: () => Promise<T>): Promise<T> {
      if (pending >= maxPending) throw new QueueFullError(pending);
      pending += 1;
      const result = tail.then(job).finally(() => {
        pending -= 1;
      });
      tail = result.catch(() => undefined);
      return result;
    },
  };
}
