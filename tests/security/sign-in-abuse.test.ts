import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { configFromEnv } from '@server/config';
import { readEnv } from '@server/env';
import { createConcurrencyGate, GateFullError } from '@server/lib/concurrency-gate';
import { passwordHashGate, verifyPassword } from '@server/lib/password';
import { makeUser, uniqueEmail } from '../api/support/factories';
import { client, createTestContext, type TestContext } from '../api/support/test-app';

// Password spraying: one address trying one password on many accounts. And a sign-in storm:
// each sign-in is a deliberately slow hash, so a flood of them must not take the whole machine.

const productionLimits = configFromEnv(readEnv({})).rateLimits;

describe('sign-in attempts from one address', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext({ rateLimits: productionLimits });
  });
  afterAll(() => ctx.close());

  it('are stopped after a few dozen failures, whatever e-mails they name', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 40; i += 1) {
      const attempt = { email: uniqueEmail('sprayed'), password: 'Summer2026!' };
      statuses.push((await client(ctx).post('/api/auth/sign-in').send(attempt)).status);
    }
    const limit = productionLimits.signInPerAddress.limit;
    expect(statuses.slice(0, limit).every((status) => status === 401)).toBe(true);
    expect(statuses.slice(limit)).toEqual(Array(40 - limit).fill(429));
  });
});

describe('a classroom signing in from one address', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext({ rateLimits: productionLimits });
  });
  afterAll(() => ctx.close());

  it('is never stopped by the per-address limit, since only failures count', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < productionLimits.signInPerAddress.limit + 10; i += 1) {
      const student = await makeUser(ctx);
      statuses.push(
        (await client(ctx).post('/api/auth/sign-in').send({ email: student.email, password: student.password })).status,
      );
    }
    expect(new Set(statuses)).toEqual(new Set([200]));
  });
});

describe('password hashes running at once', () => {
  let ctx: TestContext;
  let release: () => void = () => {};
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  afterEach(() => release());
  afterAll(() => ctx.close());

  /** Takes `count` places in the hash gate (running, then waiting) until the test ends. */
  function occupy(count: number): void {
    const held = new Promise<void>((resolve) => (release = resolve));
    for (let i = 0; i < count; i += 1) void passwordHashGate.run(() => held);
  }

  it('wait their turn when as many as allowed are already running', async () => {
    occupy(passwordHashGate.maxRunning);
    const verifying = verifyPassword('scrypt$10$8$1$c2FsdA$a2V5', 'guess');
    expect(passwordHashGate.waiting).toBe(1);
    release();
    await expect(verifying).resolves.toBe(false);
  });

  it('answer a sign-in beyond the waiting room at once with 503 busy', async () => {
    const user = await makeUser(ctx);
    occupy(passwordHashGate.maxRunning + passwordHashGate.maxWaiting);
    const response = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(response.status).toBe(503);
    expect(response.body.error.code).toBe('busy');
    expect(response.headers['retry-after']).toBe('5');
  });
});

describe('a concurrency gate', () => {
  it('runs at most its limit at once and refuses beyond its waiting room', async () => {
    const gate = createConcurrencyGate({ maxRunning: 2, maxWaiting: 1 });
    const opens: (() => void)[] = [];
    const job = () => new Promise<void>((resolve) => opens.push(resolve));
    const jobs = [gate.run(job), gate.run(job), gate.run(job)];
    expect([gate.running, gate.waiting]).toEqual([2, 1]);
    expect(() => gate.run(job)).toThrow(GateFullError);
    opens.shift()!();
    await jobs[0];
    await new Promise((resolve) => setImmediate(resolve));
    expect([gate.running, gate.waiting]).toEqual([2, 0]);
    opens.splice(0).forEach((open) => open());
    await Promise.all(jobs);
    expect(gate.running).toBe(0);
  });
});
