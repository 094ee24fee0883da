import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uniqueEmail } from '../api/support/factories';
import { createTestContext, type TestContext } from '../api/support/test-app';

// An Origin is scheme, host and port together: a page served over https (or on another port)
// is a different site from the http app, even with the same host name.

let ctx: TestContext;
let proxied: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ appUrl: 'http://mixwright.test' });
  proxied = await createTestContext({ appUrl: 'https://robots.example.org', trustProxyHops: 1 });
});
afterAll(async () => {
  await ctx.close();
  await proxied.close();
});

const signUp = (app: TestContext) =>
  request(app.app)
    .post('/api/auth/sign-up')
    .send({ name: 'Origin Test', email: uniqueEmail(), password: 'a long enough password' });

describe('the origin check', () => {
  it('refuses the app’s host name under another scheme', async () => {
    const response = await signUp(ctx).set('Origin', 'https://mixwright.test');
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('origin_mismatch');
  });

  it('refuses the app’s host name on another port', async () => {
    expect((await signUp(ctx).set('Origin', 'http://mixwright.test:8080')).status).toBe(403);
  });

  it('refuses the host a request was sent to under another scheme', async () => {
    const response = await signUp(ctx).set('Host', 'workshop.local:3000').set('Origin', 'https://workshop.local:3000');
    expect(response.status).toBe(403);
  });

  it('accepts the exact origin of the app, and of the host the request was sent to', async () => {
    expect((await signUp(ctx).set('Origin', 'http://mixwright.test')).status).toBe(201);
    expect(
      (await signUp(ctx).set('Host', 'workshop.local:3000').set('Origin', 'http://workshop.local:3000')).status,
    ).toBe(201);
  });

  it('takes the scheme from a trusted proxy', async () => {
    const response = await signUp(proxied)
      .set('Host', 'robots.internal')
      .set('X-Forwarded-Proto', 'https')
      .set('Origin', 'https://robots.internal');
    expect(response.status).toBe(201);
  });
});
