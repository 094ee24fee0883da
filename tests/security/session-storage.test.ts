import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser } from '../api/support/factories';
import { client, createTestContext, type TestContext } from '../api/support/test-app';

// Someone who gets a copy of the database (a backup, a laptop, the old `npm start` that served
// it) must not be able to use the sessions in it.

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

async function signIn(): Promise<string> {
  const user = await makeUser(ctx);
  const response = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
  const cookie = [response.headers['set-cookie']].flat().find((c) => c?.startsWith('mixwright_session='))!;
  return cookie.split(';')[0].slice('mixwright_session='.length);
}

const storedIds = () =>
  (ctx.database.sqlite.prepare('select id from sessions').all() as { id: string }[]).map((row) => row.id);

describe('stored sessions', () => {
  it('keep only a hash of the token the browser holds', async () => {
    const token = await signIn();
    expect(storedIds()).not.toContain(token);
    expect(storedIds()).toContain(createHash('sha256').update(token).digest('hex'));
  });

  it('cannot be used as a cookie when read from the database', async () => {
    await signIn();
    for (const id of storedIds()) {
      const response = await client(ctx).get('/api/auth/me').set('Cookie', `mixwright_session=${id}`);
      expect(response.status).toBe(401);
    }
  });

  it('still sign in the browser that holds the token, and end on sign-out', async () => {
    const token = await signIn();
    const cookie = `mixwright_session=${token}`;
    expect((await client(ctx).get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    expect((await client(ctx).post('/api/auth/sign-out').set('Cookie', cookie)).status).toBe(204);
    expect((await client(ctx).get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
  });
});
