import { describe, expect, it } from 'vitest';
import { createSerialQueue, QueueFullError } from '@server/features/firmware/verify-queue';

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

describe('the compile queue', () => {
  it('starts a job only after the one before it has finished', async () => {
    const log: string[] = [];
    const queue = createSerialQueue(5);
    const a = gate(log, 'a');
    const b = gate(log, 'b');
    const results = [queue.run(a.job), queue.run(b.job)];
    await tick();
    expect(log).toEqual(['start a']);
    a.open();
    b.open();
    expect(await Promise.all(results)).toEqual(['a', 'b']);
    expect(log).toEqual(['start a', 'end a', 'start b', 'end b']);
  });

  it('refuses a job when as many as allowed are already admitted', async () => {
    const queue = createSerialQueue(2);
    const log: string[] = [];
    const a = gate(log, 'a');
    const b = gate(log, 'b');
    const running = [queue.run(a.job), queue.run(b.job)];
    expect(() => queue.run(async () => 'c')).toThrow(QueueFullError);
    a.open();
    b.open();
    await Promise.all(running);
    expect(queue.pending).toBe(0);
    await expect(queue.run(async () => 'c')).resolves.toBe('c');
  });

  it('goes on with the next job after one fails', async () => {
    const queue = createSerialQueue(3);
    const failed = queue.run(async () => {
      throw new Error('compiler crashed');
    });
    const next = queue.run(async () => 'next');
    await expect(failed).rejects.toThrow('compiler crashed');
    await expect(next).resolves.toBe('next');
    expect(queue.pending).toBe(0);
  });
});
