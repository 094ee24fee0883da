import { describe, expect, it } from 'vitest';
import {
  createCompileQueue,
  QueueFullError,
  QueueShareError,
  type QueuedJob,
} from '@server/features/firmware/verify-queue';

/** A job that finishes when the test says so, recording when it started. */
function gate(log: string[], name: string) {
  let open!: () => void;
  const done = new Promise<void>((resolve) => (open = resolve));
  return {
    job: async () => {
      log.push(`start ${name}`);
      await done;
      log.push(`end ${name}`);
      return name;
    },
    open: () => open(),
  };
}

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));
const roomy = { maxPending: 10, perPerson: 10, perTeam: 10 };
const request = (key: string, job: () => Promise<string>, who: Partial<QueuedJob<string>> = {}) => ({
  key,
  person: 'ana',
  team: 'club',
  job,
  ...who,
});

describe('the compile queue', () => {
  it('starts a job only after the one before it has finished', async () => {
    const log: string[] = [];
    const queue = createCompileQueue(roomy);
    const a = gate(log, 'a');
    const b = gate(log, 'b');
    const results = [queue.run(request('a', a.job)), queue.run(request('b', b.job))];
    await tick();
    expect(log).toEqual(['start a']);
    a.open();
    b.open();
    expect(await Promise.all(results)).toEqual(['a', 'b']);
    expect(log).toEqual(['start a', 'end a', 'start b', 'end b']);
  });

  it('refuses a job when as many as allowed are already admitted', async () => {
    const queue = createCompileQueue({ ...roomy, maxPending: 2 });
    const log: string[] = [];
    const a = gate(log, 'a');
    const b = gate(log, 'b');
    const running = [
      queue.run(request('a', a.job, { person: 'p1' })),
      queue.run(request('b', b.job, { person: 'p2' })),
    ];
    expect(() => queue.run(request('c', async () => 'c', { person: 'p3' }))).toThrow(QueueFullError);
    a.open();
    b.open();
    await Promise.all(running);
    expect(queue.pending).toBe(0);
    await expect(queue.run(request('c', async () => 'c'))).resolves.toBe('c');
  });

  it('goes on with the next job after one fails', async () => {
    const queue = createCompileQueue(roomy);
    const failed = queue.run(
      request('bad', async () => {
        throw new Error('compiler crashed');
      }),
    );
    const next = queue.run(request('next', async () => 'next'));
    await expect(failed).rejects.toThrow('compiler crashed');
    await expect(next).resolves.toBe('next');
    expect(queue.pending).toBe(0);
  });

  it('lets one person hold only their share of the places', () => {
    const queue = createCompileQueue({ maxPending: 6, perPerson: 2, perTeam: 4 });
    const log: string[] = [];
    queue.run(request('r1', gate(log, 'r1').job, { person: 'viewer' }));
    queue.run(request('r2', gate(log, 'r2').job, { person: 'viewer' }));
    expect(() => queue.run(request('r3', gate(log, 'r3').job, { person: 'viewer' }))).toThrow(QueueShareError);
    expect(() => queue.run(request('r4', gate(log, 'r4').job, { person: 'editor' }))).not.toThrow();
  });

  it('lets one team hold only its share of the places', () => {
    const queue = createCompileQueue({ maxPending: 6, perPerson: 2, perTeam: 3 });
    const log: string[] = [];
    for (const [key, person] of [
      ['a', 'p1'],
      ['b', 'p1'],
      ['c', 'p2'],
    ]) {
      queue.run(request(key, gate(log, key).job, { person, team: 'busy club' }));
    }
    const error = (() => {
      try {
        queue.run(request('d', gate(log, 'd').job, { person: 'p3', team: 'busy club' }));
      } catch (e) {
        return e;
      }
    })();
    expect(error).toMatchObject({ who: 'team', limit: 3 });
    expect(() => queue.run(request('e', gate(log, 'e').job, { person: 'p4', team: 'other club' }))).not.toThrow();
  });

  it('joins a request for work already waiting instead of queueing it twice', async () => {
    const queue = createCompileQueue({ maxPending: 2, perPerson: 1, perTeam: 2 });
    const log: string[] = [];
    const first = gate(log, 'first');
    const bundle = gate(log, 'bundle');
    const running = queue.run(request('first', first.job, { person: 'p1' }));
    const waiting = queue.run(request('bundle', bundle.job, { person: 'p2' }));
    // The same person asks again, and someone else asks for the same bundle: both join.
    const again = queue.run(request('bundle', gate(log, 'copy').job, { person: 'p2' }));
    const sameBundle = queue.run(request('bundle', gate(log, 'copy').job, { person: 'p3' }));
    expect(queue.pending).toBe(2);
    first.open();
    bundle.open();
    expect(await Promise.all([running, waiting, again, sameBundle])).toEqual(['first', 'bundle', 'bundle', 'bundle']);
    expect(log.filter((line) => line.startsWith('start'))).toEqual(['start first', 'start bundle']);
  });

  it('runs next the waiting job of the team served longest ago', async () => {
    const queue = createCompileQueue(roomy);
    const log: string[] = [];
    const jobs = [
      ['a1', 'alpha'],
      ['a2', 'alpha'],
      ['a3', 'alpha'],
      ['b1', 'beta'],
    ].map(([key, team]) => ({ key, team, g: gate(log, key) }));
    const results = jobs.map(({ key, team, g }) => queue.run(request(key, g.job, { team, person: key })));
    for (const { g } of jobs) g.open();
    await Promise.all(results);
    expect(log.filter((line) => line.startsWith('start'))).toEqual(['start a1', 'start b1', 'start a2', 'start a3']);
  });
});
