import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uniqueEmail } from './support/factories';
import { createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

const body = () => ({ name: 'Origin Test', email: uniqueEmail(), password: 'a long enough password' });

describe('the origin check', () => {
  it('refuses a state-changing request without an Origin header', async () => {
    const response = await request(ctx.app).post('/api/auth/sign-up').send(body());
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('origin_mismatch');
  });

  it('refuses a request from another site', async () => {
    const response = await request(ctx.app)
      .post('/api/auth/sign-up')
      .set('Origin', 'https://elsewhere.example')
      .send(body());
    expect(response.status).toBe(403);
  });

  it('accepts a request whose Origin names the host it was sent to', async () => {
    const response = await request(ctx.app)
      .post('/api/auth/sign-up')
      .set('Host', 'workshop.local:3000')
      .set('Origin', 'http://workshop.local:3000')
      .send(body());
    expect(response.status).toBe(201);
  });

  it('lets reads through without an Origin header', async () => {
    const response = await request(ctx.app).get('/api/auth/me');
    expect(response.status).toBe(401);
  });
});
