import { request as httpRequest, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { nestsDeeperThan } from '@server/middleware/validate';
import { makeUser } from '../api/support/factories';
import { client, createTestContext, TEST_APP_URL, type TestContext } from '../api/support/test-app';

// A request body costs the server work to read and parse. A stranger must not be able to make
// it do that work: the origin and session are checked first, bodies are small, nesting shallow.

let ctx: TestContext;
let server: Server;
let port: number;

beforeAll(async () => {
  ctx = await createTestContext();
  server = ctx.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  port = (server.address() as AddressInfo).port;
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  await ctx.close();
});

/**
 * Sends only the headers of a POST that announces a megabyte of JSON, and never the body: a
 * server that checks before reading answers; one that reads first would wait for ever.
 */
function postWithoutSendingBody(path: string, headers: Record<string, string>): Promise<IncomingMessage> {
  return new Promise((resolve, reject) => {
    const req = httpRequest({
      host: '127.0.0.1',
      port,
      path,
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'Content-Length': String(1024 * 1024), ...headers },
    });
    req.on('response', (response) => {
      response.resume();
      resolve(response);
      req.destroy();
    });
    req.on('error', (error) => ((error as NodeJS.ErrnoException).code === 'ECONNRESET' ? undefined : reject(error)));
    req.flushHeaders();
  });
}

const nested = (depth: number) => `{"email":${'['.repeat(depth)}${']'.repeat(depth)},"password":"x"}`;

describe('reading request bodies', () => {
  it('refuses a request from another site before reading its body', async () => {
    const response = await postWithoutSendingBody('/api/auth/sign-in', { Origin: 'https://elsewhere.example' });
    expect(response.statusCode).toBe(403);
  });

  it('refuses a request without a session before reading its body', async () => {
    const response = await postWithoutSendingBody('/api/robots/some-robot/revisions', { Origin: TEST_APP_URL });
    expect(response.statusCode).toBe(401);
  });

  it('refuses a sign-in body larger than a few kilobytes', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-in')
      .send({ email: 'a@example.org', password: 'x'.repeat(8 * 1024) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('too_large');
  });

  it('refuses a megabyte of nested arrays at sign-in by its size', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(nested(500_000));
    expect(response.status).toBe(413);
  });

  it('refuses deeply nested JSON that fits the size limit', async () => {
    const response = await client(ctx)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(nested(200));
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('too_deep');
  });

  it('still signs in with an ordinary body', async () => {
    const user = await makeUser(ctx);
    const response = await client(ctx).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(response.status).toBe(200);
  });
});

describe('measuring how deep JSON nests', () => {
  it('counts arrays and objects, not brackets inside strings', () => {
    expect(nestsDeeperThan(Buffer.from('{"a":[{"b":[1]}]}'), 4)).toBe(false);
    expect(nestsDeeperThan(Buffer.from('{"a":[{"b":[[1]]}]}'), 4)).toBe(true);
    expect(nestsDeeperThan(Buffer.from(`{"a":"${'['.repeat(100)}"}`), 4)).toBe(false);
    expect(nestsDeeperThan(Buffer.from('{"a":"quote \\" then [[[[[[["}'), 4)).toBe(false);
  });
});
