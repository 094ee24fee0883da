import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { makeInvitation, makeTeamScenario, makeUser, uniqueEmail } from './support/factories';
import { client, clientAs, createTestContext, TEST_APP_URL, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

function mailedToken(email: string): string {
  const link = ctx.smtp.mailbox.latestTo(email)?.links.find((l) => l.startsWith(`${TEST_APP_URL}/invitations/`));
  if (!link) throw new Error(`No invitation link was mailed to ${email}`);
  return link.split('/invitations/')[1];
}

describe('inviting', () => {
  it('mails a one-time link and stores only its hash', async () => {
    const s = await makeTeamScenario(ctx);
    const email = uniqueEmail('guest');
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .post(`/api/teams/${s.team.id}/invitations`)
      .send({ email, role: 'editor' });
    expect(response.status).toBe(201);
    const mail = ctx.smtp.mailbox.latestTo(email)!;
    expect(mail.subject).toBe(`Owner invited you to ${s.team.name} on Mixwright`);
    const token = mailedToken(email);
    const hashes = ctx.database.sqlite.prepare('select token_hash from invitations').all() as { token_hash: string }[];
    expect(hashes.map((h) => h.token_hash)).not.toContain(token);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 5 }).map((e) => e.action)).toContain('invitation.sent');
  });

  it('expires after 7 days', async () => {
    const s = await makeTeamScenario(ctx);
    const email = uniqueEmail();
    const before = Date.now();
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .post(`/api/teams/${s.team.id}/invitations`)
      .send({ email, role: 'viewer' });
    const days = (new Date(response.body.invitation.expiresAt).getTime() - before) / 86_400_000;
    expect(days).toBeCloseTo(7, 2);
  });

  it('refuses to invite someone who is already a member', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .post(`/api/teams/${s.team.id}/invitations`)
      .send({ email: s.editor.email, role: 'viewer' });
    expect(response.status).toBe(409);
    expect(response.body.error.fields.email).toBe('Already a member of this team');
  });

  it('replaces an open invitation to the same address', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    const email = uniqueEmail();
    await owner.post(`/api/teams/${s.team.id}/invitations`).send({ email, role: 'viewer' });
    const first = mailedToken(email);
    await owner.post(`/api/teams/${s.team.id}/invitations`).send({ email, role: 'editor' });
    expect((await client(ctx).get(`/api/invitations/${first}`)).status).toBe(410);
    const open = await owner.get(`/api/teams/${s.team.id}/invitations`);
    expect(open.body.invitations.filter((i: { email: string }) => i.email === email)).toEqual([
      expect.objectContaining({ role: 'editor' }),
    ]);
  });
});

describe('accepting', () => {
  it('shows anyone with the link whom it is for', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await client(ctx).get(`/api/invitations/${s.invitation.token}`);
    expect(response.body.invitation).toMatchObject({
      teamName: s.team.name,
      email: s.invitation.email,
      role: 'viewer',
      invitedByName: 'Owner',
    });
  });

  it('adds the invited person with the invited role', async () => {
    const s = await makeTeamScenario(ctx);
    const invitee = await makeUser(ctx, { email: s.invitation.email });
    const agent = await clientAs(ctx, invitee.id);
    const response = await agent.post(`/api/invitations/${s.invitation.token}/accept`);
    expect(response.body).toEqual({ teamId: s.team.id, role: 'viewer' });
    expect((await agent.get(`/api/teams/${s.team.id}`)).body.team.role).toBe('viewer');
  });

  it('refuses someone signed in with another e-mail address', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.outsider.id)).post(`/api/invitations/${s.invitation.token}/accept`);
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('invitation_email_mismatch');
  });

  it('works only once', async () => {
    const s = await makeTeamScenario(ctx);
    const invitee = await makeUser(ctx, { email: s.invitation.email });
    const agent = await clientAs(ctx, invitee.id);
    await agent.post(`/api/invitations/${s.invitation.token}/accept`);
    const again = await agent.post(`/api/invitations/${s.invitation.token}/accept`);
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation_used');
  });

  it('refuses an expired invitation', async () => {
    const s = await makeTeamScenario(ctx);
    const invitation = makeInvitation(ctx, {
      teamId: s.team.id,
      invitedBy: s.owner,
      expiresAt: new Date(Date.now() - 1000),
    });
    const invitee = await makeUser(ctx, { email: invitation.email });
    const response = await (await clientAs(ctx, invitee.id)).post(`/api/invitations/${invitation.token}/accept`);
    expect(response.status).toBe(410);
    expect(response.body.error.code).toBe('invitation_expired');
  });

  it('refuses a withdrawn invitation', async () => {
    const s = await makeTeamScenario(ctx);
    await (await clientAs(ctx, s.owner.id)).delete(`/api/teams/${s.team.id}/invitations/${s.invitation.id}`);
    const response = await client(ctx).get(`/api/invitations/${s.invitation.token}`);
    expect(response.status).toBe(410);
    expect(response.body.error.code).toBe('invitation_revoked');
  });

  it('answers 404 for a token that was never issued', async () => {
    const response = await client(ctx).get(`/api/invitations/${'a'.repeat(43)}`);
    expect(response.status).toBe(404);
  });
});
