import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listUserEvents } from '@server/features/activity/activity.repository';
import { makeUser, uniqueEmail } from './support/factories';
import { client, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

const cookieOf = (setCookie: string[] | string | undefined) =>
  [setCookie ?? []].flat().find((c) => c.startsWith('mixwright_session='));

describe('sign-up', () => {
  it('creates the account, signs the person in and sets an httpOnly SameSite=Lax cookie', async () => {
    const email = uniqueEmail('new');
    const agent = client(ctx);
    const response = await agent
      .post('/api/auth/sign-up')
      .send({ name: ' Ada Tinker ', email: email.toUpperCase(), password: 'a long enough password' });
    expect(response.status).toBe(201);
    expect(response.body.user).toMatchObject({ name: 'Ada Tinker', email });
    const cookie = cookieOf(response.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const me = await agent.get('/api/auth/me');
    expect(me.body.user.email).toBe(email);
  });

  it('refuses an e-mail that already has an account, naming the field', async () => {
    const existing = await makeUser(ctx);
    const response = await client(ctx)
      .post('/api/auth/sign-up')
      .send({ name: 'Twin', email: existing.email, password: 'another long password' });
    expect(response.status).toBe(409);
    expect(response.body.error.fields).toEqual({ email: expect.stringContaining('already exists') });
  });

  it('refuses a short password with a reason beside the password field', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-up')
      .send({ name: 'Short', email: uniqueEmail(), password: 'short' });
    expect(response.status).toBe(400);
    expect(response.body.error).toMatchObject({
      code: 'invalid_input',
      fields: { password: 'Use at least 10 characters' },
    });
  });

  it('stores the password hashed with scrypt, never as typed', async () => {
    const email = uniqueEmail();
    await client(ctx).post('/api/auth/sign-up').send({ name: 'Hash', email, password: 'plain text password' });
    const row = ctx.database.sqlite.prepare('select password_hash from users where email = ?').get(email) as {
      password_hash: string;
    };
    expect(row.password_hash).toMatch(/^scrypt\$/);
    expect(row.password_hash).not.toContain('plain text password');
  });
});

describe('sign-in', () => {
  it('signs in with the right password and records the sign-in', async () => {
    const user = await makeUser(ctx);
    const agent = client(ctx);
    const response = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(response.status).toBe(200);
    expect(cookieOf(response.headers['set-cookie'])).toBeDefined();
    expect((await agent.get('/api/auth/me')).body.user.id).toBe(user.id);
    expect(listUserEvents(ctx.db, user.id).map((e) => e.action)).toContain('user.signed_in');
  });

  it('gives the same answer for a wrong password and an unknown e-mail', async () => {
    const user = await makeUser(ctx);
    const wrong = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: 'not the password' });
    const unknown = await client(ctx)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(cookieOf(wrong.headers['set-cookie'])).toBeUndefined();
  });
});

describe('sign-out', () => {
  it('ends the session so the same cookie no longer works', async () => {
    const user = await makeUser(ctx);
    const agent = client(ctx);
    const signIn = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const cookie = cookieOf(signIn.headers['set-cookie'])!.split(';')[0];
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    const replay = await client(ctx).get('/api/auth/me').set('Cookie', cookie);
    expect(replay.status).toBe(401);
  });
});

describe('the current user', () => {
  it('is 401 without a session', async () => {
    const response = await client(ctx).get('/api/auth/me');
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('unauthenticated');
  });
});
