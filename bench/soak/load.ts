import { httpRequest, type Answer } from './http';

export interface Client {
  cookie: string;
}

export interface PhaseFigures {
  name: string;
  requests: number;
  seconds: number;
  p50: number;
  p99: number;
  serverErrors: number;
  /** Other facts of the phase, e.g. saves and conflicts. */
  notes: string;
}

export function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

/** The figures of one phase from every answer's time and status. */
export function figures(name: string, answers: Answer[], seconds: number, notes = ''): PhaseFigures {
  const times = answers.map((a) => a.ms).sort((a, b) => a - b);
  return {
    name,
    requests: answers.length,
    seconds,
    p50: percentile(times, 50),
    p99: percentile(times, 99),
    serverErrors: answers.filter((a) => a.status >= 500).length,
    notes,
  };
}

/**
 * Runs `step` in a loop on every client at once until `seconds` have passed; each step records
 * its own answers. This is how 50 people clicking as fast as the server answers look to it.
 */
export async function runClients(
  clients: Client[],
  seconds: number,
  step: (client: Client, index: number, record: (answer: Answer) => void) => Promise<void>,
): Promise<{ answers: Answer[]; seconds: number }> {
  const answers: Answer[] = [];
  const started = performance.now();
  const until = started + seconds * 1000;
  await Promise.all(
    clients.map(async (client, index) => {
      while (performance.now() < until) await step(client, index, (answer) => answers.push(answer));
    }),
  );
  return { answers, seconds: (performance.now() - started) / 1000 };
}

/** Reads the head, then saves on it; on 409 saves again on the newer head the answer names. */
export async function saveWithRetries(
  base: string,
  headers: Record<string, string>,
  robotId: string,
  config: (attempt: number) => unknown,
  record: (answer: Answer) => void,
): Promise<{ number: number | null; conflicts: number }> {
  const head = await httpRequest(base, { method: 'GET', path: `/api/robots/${robotId}`, headers });
  record(head);
  if (head.status !== 200) return { number: null, conflicts: 0 };
  let baseRevision = (JSON.parse(head.body.toString()) as { head: { number: number } }).head.number;
  for (let attempt = 0; attempt < 1000; attempt += 1) {
    const body = JSON.stringify({ baseRevision, message: `Soak save ${attempt}`, config: config(attempt) });
    const saved = await httpRequest(base, {
      method: 'POST',
      path: `/api/robots/${robotId}/revisions`,
      headers: { ...headers, 'Content-Type': 'application/json' },
      body,
    });
    record(saved);
    if (saved.status === 201) {
      return {
        number: (JSON.parse(saved.body.toString()) as { revision: { number: number } }).revision.number,
        conflicts: attempt,
      };
    }
    if (saved.status !== 409) return { number: null, conflicts: attempt };
    baseRevision = (JSON.parse(saved.body.toString()) as { error: { head: { number: number } } }).error.head.number;
  }
  return { number: null, conflicts: 1000 };
}
