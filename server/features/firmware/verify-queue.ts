/** Thrown by a full queue: the caller should try again later. */
export class QueueFullError extends Error {
  constructor(readonly waiting: number) {
    super(`${waiting} jobs are already waiting`);
    this.name = 'QueueFullError';
  }
}

/** Thrown when one person or one team already has as many jobs admitted as they may. */
export class QueueShareError extends Error {
  constructor(
    readonly who: 'person' | 'team',
    readonly limit: number,
  ) {
    super(`This ${who} already has ${limit} jobs waiting or running`);
    this.name = 'QueueShareError';
  }
}

export interface QueueLimits {
  /** Jobs admitted at once in all (the running one included). */
  maxPending: number;
  /** Of those, at most this many from one person… */
  perPerson: number;
  /** …and this many from one team. */
  perTeam: number;
}

export interface QueuedJob<T> {
  /** Equal keys are equal work: a second request for a waiting or running key joins it. */
  key: string;
  person: string;
  team: string;
  job: () => Promise<T>;
}

export interface CompileQueue {
  /** Runs the job in its turn, or joins an equal one; throws QueueFullError or QueueShareError. */
  run<T>(request: QueuedJob<T>): Promise<T>;
  /** Jobs admitted and not yet finished (the running one included). */
  readonly pending: number;
}

interface Entry {
  request: QueuedJob<unknown>;
  result: Promise<unknown>;
  start: () => void;
  started: boolean;
}

/**
 * One job at a time. A compile takes a core of the machine for seconds, so the server runs one
 * and lets a few wait, and shares the waiting places fairly: each person and each team may hold
 * only some of them, a request for work already waiting or running joins it instead of taking
 * a place, and the next job to run is from the team served longest ago.
 */
export function createCompileQueue(limits: QueueLimits): CompileQueue {
  const entries = new Map<string, Entry>();
  const lastServed = new Map<string, number>();
  let served = 0;
  let running = false;

  const count = (field: 'person' | 'team', value: string) =>
    [...entries.values()].filter((e) => e.request[field] === value).length;

  function startNext(): void {
    if (running) return;
    const waiting = [...entries.values()].filter((e) => !e.started);
    if (waiting.length === 0) return;
    // Map order is arrival order, so among teams served equally long ago the earliest goes first.
    const next = waiting.reduce((best, e) =>
      (lastServed.get(e.request.team) ?? -1) < (lastServed.get(best.request.team) ?? -1) ? e : best,
    );
    running = true;
    next.started = true;
    lastServed.set(next.request.team, (served += 1));
    next.start();
  }

  return {
    get pending() {
      return entries.size;
    },
    run<T>(request: QueuedJob<T>): Promise<T> {
      const existing = entries.get(request.key);
      if (existing) return existing.result as Promise<T>;
      if (entries.size >= limits.maxPending) throw new QueueFullError(entries.size);
      if (count('person', request.person) >= limits.perPerson) throw new QueueShareError('person', limits.perPerson);
      if (count('team', request.team) >= limits.perTeam) throw new QueueShareError('team', limits.perTeam);
      let start!: () => void;
      const turn = new Promise<void>((resolve) => (start = resolve));
      const result = turn.then(request.job).finally(() => {
        entries.delete(request.key);
        running = false;
        startNext();
      });
      entries.set(request.key, { request, result, start, started: false });
      startNext();
      return result;
    },
  };
}
