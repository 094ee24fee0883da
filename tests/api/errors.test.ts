import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, createTestContext, TEST_APP_URL, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

describe('API errors', () => {
  it('answers an unknown API path with 404 in the error shape', async () => {
    const response = await client(ctx).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.type).toBe('application/json');
    expect(response.body).toEqual({ error: { code: 'not_found', message: 'No API route GET /api/no-such-thing' } });
  });

  it('answers a body that is not JSON with 400', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('malformed_json');
  });

  it('refuses a body above the size limit with 413', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-in')
      .send({ email: 'a@example.org', password: 'x'.repeat(4096) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('too_large');
  });

  it('names every invalid field by its path', async () => {
    const response = await client(ctx).post('/api/auth/sign-up').send({ email: 'not an address' });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
    expect(response.body.error.message).toMatch(/^\w+: .+ \(and 2 more\)$/);
  });

  it('sends protective headers on every answer', async () => {
    const response = await request(ctx.app).get('/api/auth/me').set('Origin', TEST_APP_URL);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });
});
