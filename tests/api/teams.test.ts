import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { addMember, makeTeam, makeTeamScenario, makeUser } from './support/factories';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

describe('teams', () => {
  it('makes the creator the owner and lists the team with its counts', async () => {
    const user = await makeUser(ctx);
    const agent = await clientAs(ctx, user.id);
    const created = await agent.post('/api/teams').send({ name: '  Thursday Robotics  ' });
    expect(created.status).toBe(201);
    expect(created.body.team).toMatchObject({ name: 'Thursday Robotics', role: 'owner' });
    const list = await agent.get('/api/teams');
    expect(list.body.teams).toEqual([
      expect.objectContaining({ name: 'Thursday Robotics', role: 'owner', memberCount: 1, robotCount: 0 }),
    ]);
  });

  it('does not list teams the person is not in', async () => {
    const s = await makeTeamScenario(ctx);
    const list = await (await clientAs(ctx, s.outsider.id)).get('/api/teams');
    expect(list.body.teams).toEqual([]);
  });

  it('lists members with their roles', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/teams/${s.team.id}/members`);
    const roles = Object.fromEntries(
      response.body.members.map((m: { name: string; role: string }) => [m.name, m.role]),
    );
    expect(roles).toEqual({ Owner: 'owner', Editor: 'editor', Viewer: 'viewer', Spare: 'viewer' });
  });
});

describe('roles', () => {
  it('lets an owner change a role and records who changed what', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .patch(`/api/teams/${s.team.id}/members/${s.viewer.id}`)
      .send({ role: 'editor' });
    expect(response.status).toBe(200);
    expect(response.body.members.find((m: { userId: string }) => m.userId === s.viewer.id).role).toBe('editor');
    const event = listTeamActivity(ctx.db, s.team.id, { limit: 10 }).find((e) => e.action === 'member.role_changed');
    expect(event).toMatchObject({ actorName: 'Owner', detail: { name: 'Viewer', from: 'viewer', to: 'editor' } });
  });

  it('refuses to demote the last owner', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .patch(`/api/teams/${s.team.id}/members/${s.owner.id}`)
      .send({ role: 'viewer' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('last_owner');
  });

  it('lets an owner step down once there is a second owner', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    await owner.patch(`/api/teams/${s.team.id}/members/${s.editor.id}`).send({ role: 'owner' });
    const response = await owner.patch(`/api/teams/${s.team.id}/members/${s.owner.id}`).send({ role: 'editor' });
    expect(response.status).toBe(200);
  });

  it('refuses an unknown role, naming the field', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .patch(`/api/teams/${s.team.id}/members/${s.viewer.id}`)
      .send({ role: 'admin' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.role).toBe('Choose owner, editor or viewer');
  });

  it('answers 404 for a person who is not a member', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.owner.id)
    )
      .patch(`/api/teams/${s.team.id}/members/${s.outsider.id}`)
      .send({ role: 'editor' });
    expect(response.status).toBe(404);
  });
});

describe('removing members', () => {
  it('lets an owner remove a member, who then cannot see the team', async () => {
    const s = await makeTeamScenario(ctx);
    expect(
      (await (await clientAs(ctx, s.owner.id)).delete(`/api/teams/${s.team.id}/members/${s.editor.id}`)).status,
    ).toBe(204);
    expect((await (await clientAs(ctx, s.editor.id)).get(`/api/teams/${s.team.id}`)).status).toBe(404);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 10 }).map((e) => e.action)).toContain('member.removed');
  });

  it('lets any member leave', async () => {
    const s = await makeTeamScenario(ctx);
    expect(
      (await (await clientAs(ctx, s.viewer.id)).delete(`/api/teams/${s.team.id}/members/${s.viewer.id}`)).status,
    ).toBe(204);
  });

  it('does not let the last owner leave', async () => {
    const owner = await makeUser(ctx);
    const team = makeTeam(ctx, owner);
    addMember(ctx, team.id, await makeUser(ctx), 'editor');
    const response = await (await clientAs(ctx, owner.id)).delete(`/api/teams/${team.id}/members/${owner.id}`);
    expect(response.status).toBe(409);
  });
});
