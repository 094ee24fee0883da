import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, uniqueEmail } from './support/factories';
import { client, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({
    rateLimits: {
      signIn: { windowMs: 60_000, limit: 3 },
      signInPerAddress: { windowMs: 60_000, limit: 1000 },
      passwordReset: { windowMs: 60_000, limit: 2 },
      signUp: { windowMs: 60_000, limit: 2 },
    },
  });
});
afterAll(() => ctx.close());

describe('rate limits', () => {
  it('stops sign-in attempts on one account after the limit, even with the right password', async () => {
    const user = await makeUser(ctx);
    for (let i = 0; i < 3; i += 1) {
      expect(
        (await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong guess' })).status,
      ).toBe(401);
    }
    const blocked = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatchObject({
      code: 'rate_limited',
      message: expect.stringContaining('try again in 1 minute'),
    });
    expect(blocked.headers['ratelimit-policy']).toBeDefined();
  });

  it('counts attempts per account, so another person at the same address can still sign in', async () => {
    const other = await makeUser(ctx);
    const response = await client(ctx).post('/api/auth/sign-in').send({ email: other.email, password: other.password });
    expect(response.status).toBe(200);
  });

  it('stops password reset requests after the limit', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 3; i += 1) {
      statuses.push((await client(ctx).post('/api/auth/password-reset').send({ email: uniqueEmail() })).status);
    }
    expect(statuses).toEqual([202, 202, 429]);
  });

  it('stops sign-ups from one address after the limit, so taken e-mails cannot be probed at speed', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 3; i += 1) {
      statuses.push(
        (
          await client(ctx)
            .post('/api/auth/sign-up')
            .send({ email: uniqueEmail(), name: 'New Builder', password: 'a long enough password' })
        ).status,
      );
    }
    expect(statuses).toEqual([201, 201, 429]);
  });
});

describe('rate limits behind a reverse proxy', () => {
  const tightLimits = {
    rateLimits: {
      signIn: { windowMs: 60_000, limit: 3 },
      signInPerAddress: { windowMs: 60_000, limit: 1000 },
      passwordReset: { windowMs: 60_000, limit: 1 },
      signUp: { windowMs: 60_000, limit: 1 },
    },
  };
  const resetFrom = (app: TestContext, address: string) =>
    client(app).post('/api/auth/password-reset').set('X-Forwarded-For', address).send({ email: uniqueEmail() });

  it('counts each forwarded client address on its own when one proxy hop is trusted', async () => {
    const proxied = await createTestContext({ ...tightLimits, trustProxyHops: 1 });
    try {
      expect((await resetFrom(proxied, '203.0.113.7')).status).toBe(202);
      expect((await resetFrom(proxied, '203.0.113.8')).status).toBe(202);
      expect((await resetFrom(proxied, '203.0.113.7')).status).toBe(429);
    } finally {
      await proxied.close();
    }
  });

  it('ignores a forwarded address when no proxy is trusted, so a client cannot dodge the limit', async () => {
    const direct = await createTestContext(tightLimits);
    try {
      expect((await resetFrom(direct, '203.0.113.7')).status).toBe(202);
      expect((await resetFrom(direct, '203.0.113.8')).status).toBe(429);
    } finally {
      await direct.close();
    }
  });
});
