import type { Request } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isLocalRequest } from '@server/middleware/loopback-only';
import { makeTeamScenario, makeUser, type TeamScenario } from '../api/support/factories';
import { client, clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// Without an outgoing mail server, the app catches its own mail. That mail holds password-reset
// and invitation links, so only someone on the machine itself may read it.

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ nodeEnv: 'development' });
});
afterAll(() => ctx.close());

async function requestReset(): Promise<void> {
  const user = await makeUser(ctx);
  await client(ctx).post('/api/auth/password-reset').send({ email: user.email });
}

describe('the local mailbox', () => {
  it('refuses a request addressed to a network host name', async () => {
    await requestReset();
    for (const path of ['/api/dev/mailbox', '/dev/mailbox']) {
      const response = await request(ctx.app).get(path).set('Host', 'workshop-laptop.lan:3000');
      expect(response.status).toBe(403);
      expect(response.body.error.code).toBe('local_only');
      expect(response.text).not.toContain('reset-password?token=');
    }
  });

  it('refuses a request relayed by a proxy, even on this machine', async () => {
    const response = await request(ctx.app).get('/api/dev/mailbox').set('X-Forwarded-For', '203.0.113.9');
    expect(response.status).toBe(403);
    expect(response.text).not.toContain('reset-password?token=');
  });

  it('refuses a request from another machine even when it names localhost', () => {
    const fromNetwork = { socket: { remoteAddress: '192.168.1.20' }, headers: { host: 'localhost:3000' } };
    expect(isLocalRequest(fromNetwork as unknown as Request)).toBe(false);
    const fromHere = { socket: { remoteAddress: '::ffff:127.0.0.1' }, headers: { host: 'localhost:3000' } };
    expect(isLocalRequest(fromHere as unknown as Request)).toBe(true);
  });

  it('answers on this machine at a loopback address, and says it is readable only here', async () => {
    await requestReset();
    const json = await request(ctx.app).get('/api/dev/mailbox').set('Host', 'localhost:3000');
    expect(json.status).toBe(200);
    expect(json.body.messages[0].links[0]).toMatch(/reset-password\?token=/);
    const page = await request(ctx.app).get('/dev/mailbox').set('Host', '127.0.0.1:3000');
    expect(page.text).toContain('can be read only on this computer');
  });
});

describe('invitations without an outgoing mail server', () => {
  let s: TeamScenario;
  beforeAll(async () => {
    s = await makeTeamScenario(ctx);
  });

  it('tells the owner that links are passed on by hand', async () => {
    const response = await (await clientAs(ctx, s.owner.id)).get(`/api/teams/${s.team.id}/invitations`);
    expect(response.body.delivery).toBe('by-hand');
  });

  it('gives the owner the one-time link to pass on', async () => {
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .post(`/api/teams/${s.team.id}/invitations`)
      .send({ email: 'hand.delivered@example.org', role: 'viewer' });
    expect(response.status).toBe(201);
    expect(response.body.delivery).toBe('by-hand');
    const token = String(response.body.link).split('/invitations/')[1];
    const preview = await client(ctx).get(`/api/invitations/${token}`);
    expect(preview.body.invitation.email).toBe('hand.delivered@example.org');
  });

  it('does not put the link in the answer when an outgoing mail server delivers it', async () => {
    const mailed = await createTestContext({ outgoingMail: true });
    try {
      const team = await makeTeamScenario(mailed);
      const response = await (
        await clientAs(mailed, team.owner.id)
      )
        .post(`/api/teams/${team.team.id}/invitations`)
        .send({ email: 'mailed@example.org', role: 'viewer' });
      expect(response.body).toMatchObject({ delivery: 'email', link: null });
    } finally {
      await mailed.close();
    }
  });
});
