import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, uniqueEmail } from './support/factories';
import { client, createTestContext, TEST_APP_URL, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

async function requestLink(email: string): Promise<string> {
  const response = await client(ctx).post('/api/auth/password-reset').send({ email });
  expect(response.status).toBe(202);
  await ctx.background.settled();
  const mail = ctx.smtp.mailbox.latestTo(email);
  const link = mail?.links.find((l) => l.startsWith(`${TEST_APP_URL}/reset-password?token=`));
  if (!link) throw new Error(`No reset link was mailed to ${email}`);
  return new URL(link).searchParams.get('token')!;
}

describe('password reset', () => {
  it('mails a one-time link to an address that has an account', async () => {
    const user = await makeUser(ctx);
    const token = await requestLink(user.email);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const stored = ctx.database.sqlite.prepare('select token_hash from password_reset_tokens').all() as {
      token_hash: string;
    }[];
    expect(stored.map((r) => r.token_hash)).not.toContain(token);
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const response = await client(ctx).post('/api/auth/password-reset').send({ email });
    expect(response.status).toBe(202);
    await ctx.background.settled();
    expect(ctx.smtp.mailbox.latestTo(email)).toBeUndefined();
  });

  it('sets the new password, signs out old sessions and signs in with the new one', async () => {
    const user = await makeUser(ctx);
    const oldCookie = await ctx.sessionCookie(user.id);
    const token = await requestLink(user.email);
    const agent = client(ctx);
    const reset = await agent
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'a brand new password' });
    expect(reset.status).toBe(200);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await client(ctx).get('/api/auth/me').set('Cookie', oldCookie)).status).toBe(401);
    expect(
      (await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password })).status,
    ).toBe(401);
    expect(
      (await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: 'a brand new password' }))
        .status,
    ).toBe(200);
  });

  it('works only once', async () => {
    const user = await makeUser(ctx);
    const token = await requestLink(user.email);
    await client(ctx).post('/api/auth/password-reset/confirm').send({ token, password: 'first new password' });
    const again = await client(ctx)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'second new password' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('reset_link_invalid');
  });

  it('refuses a link older than its lifetime', async () => {
    const user = await makeUser(ctx);
    const token = await requestLink(user.email);
    ctx.database.sqlite
      .prepare('update password_reset_tokens set expires_at = ? where user_id = ?')
      .run(Date.now() - 1000, user.id);
    const response = await client(ctx)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'too late password' });
    expect(response.status).toBe(400);
  });
});
