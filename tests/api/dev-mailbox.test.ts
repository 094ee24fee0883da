import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { makeUser } from './support/factories';
import { client, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext | null = null;
afterEach(async () => {
  await ctx?.close();
  ctx = null;
});

describe('the development mailbox', () => {
  it('lists caught e-mail with its links, as JSON and as a page', async () => {
    ctx = await createTestContext();
    const user = await makeUser(ctx, { name: 'Mail <Reader>' });
    await client(ctx).post('/api/auth/password-reset').send({ email: user.email });
    await ctx.background.settled();
    const json = await request(ctx.app).get('/api/dev/mailbox');
    expect(json.body.messages[0]).toMatchObject({ subject: 'Reset your Mixwright password', to: user.email });
    expect(json.body.messages[0].links[0]).toMatch(/\/reset-password\?token=/);
    const page = await request(ctx.app).get('/dev/mailbox');
    expect(page.type).toBe('text/html');
    expect(page.text).toContain('Reset your Mixwright password');
    expect(page.text).toContain('Mail &lt;Reader&gt;');
  });

  it('does not exist in production', async () => {
    ctx = await createTestContext({ nodeEnv: 'production' });
    expect((await request(ctx.app).get('/api/dev/mailbox')).status).toBe(404);
    expect((await request(ctx.app).get('/dev/mailbox')).status).toBe(404);
  });
});

describe('production settings', () => {
  it('marks the session cookie Secure', async () => {
    ctx = await createTestContext({ nodeEnv: 'production' });
    const user = await makeUser(ctx);
    const response = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect([response.headers['set-cookie']].flat().join()).toMatch(/mixwright_session=[^;]+;.*Secure/i);
  });
});
