import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashToken } from '@server/lib/ids';
import { makeUser } from './support/factories';
import { client, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ sessionDays: 30 });
});
afterAll(() => ctx.close());

const nowSeconds = () => Math.floor(Date.now() / 1000);
/** The cookie carries the token; the row is keyed by its hash. */
const tokenOf = (cookie: string) => cookie.split('=')[1];
const rowIdOf = (cookie: string) => hashToken(tokenOf(cookie));

function setExpiry(sessionId: string, expiresAt: number): void {
  ctx.database.sqlite.prepare('update sessions set expires_at = ? where id = ?').run(expiresAt, sessionId);
}

function expiryOf(sessionId: string): number | undefined {
  return (
    ctx.database.sqlite.prepare('select expires_at from sessions where id = ?').get(sessionId) as
      { expires_at: number } | undefined
  )?.expires_at;
}

describe('session expiry', () => {
  it('refuses an expired session and clears the cookie', async () => {
    const user = await makeUser(ctx);
    const cookie = await ctx.sessionCookie(user.id);
    setExpiry(rowIdOf(cookie), nowSeconds() - 10);
    const response = await client(ctx).get('/api/auth/me').set('Cookie', cookie);
    expect(response.status).toBe(401);
    expect([response.headers['set-cookie']].flat().join()).toMatch(/mixwright_session=;.*Max-Age=0/i);
    expect(expiryOf(rowIdOf(cookie))).toBeUndefined();
  });

  it('extends a session used in the second half of its life and renews the cookie', async () => {
    const user = await makeUser(ctx);
    const cookie = await ctx.sessionCookie(user.id);
    setExpiry(rowIdOf(cookie), nowSeconds() + 5 * 86_400);
    const response = await client(ctx).get('/api/auth/me').set('Cookie', cookie);
    expect(response.status).toBe(200);
    expect([response.headers['set-cookie']].flat().join()).toContain(`mixwright_session=${tokenOf(cookie)}`);
    expect(expiryOf(rowIdOf(cookie))).toBeGreaterThan(nowSeconds() + 29 * 86_400);
  });

  it('starts a session that lasts the configured number of days', async () => {
    const user = await makeUser(ctx);
    const cookie = await ctx.sessionCookie(user.id);
    const expiry = expiryOf(rowIdOf(cookie))!;
    expect(expiry).toBeGreaterThan(nowSeconds() + 29.9 * 86_400);
    expect(expiry).toBeLessThanOrEqual(nowSeconds() + 30 * 86_400);
  });
});
