import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { robotConfigInput } from '../factories/robot-config';
import { addMember, makeTeamScenario, uniqueEmail } from './support/factories';
import { client, clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

interface Event {
  id: number;
  action: string;
  actorName: string | null;
  detail: Record<string, unknown>;
}

async function activityLog(
  s: { team: { id: string }; owner: { id: string } },
  query = '',
): Promise<{ events: Event[]; nextBefore: number | null }> {
  const response = await (await clientAs(ctx, s.owner.id)).get(`/api/teams/${s.team.id}/activity${query}`);
  expect(response.status).toBe(200);
  return response.body;
}

describe('the team activity log', () => {
  it('records every kind of action, with who did it', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    const editor = await clientAs(ctx, s.editor.id);
    const robotPath = `/api/robots/${s.robot.id}`;

    await client(ctx).post('/api/auth/sign-in').send({ email: s.viewer.email, password: s.viewer.password });
    await owner.post(`/api/teams/${s.team.id}/invitations`).send({ email: uniqueEmail('guest'), role: 'viewer' });
    await owner.patch(`/api/teams/${s.team.id}/members/${s.spare.id}`).send({ role: 'editor' });
    await editor.post(`${robotPath}/revisions`).send({ baseRevision: 1, message: 'Tuned', config: robotConfigInput() });
    await editor.post(`${robotPath}/revisions/1/restore`).send({ baseRevision: 2 });
    await editor.post(`${robotPath}/flashes`).send({ revision: 3, note: 'on the bench' });
    await editor
      .post(`/api/teams/${s.team.id}/robots/import`)
      .attach('file', Buffer.from(JSON.stringify(robotConfigInput())), 'copy.json');
    await editor
      .post(`${robotPath}/revisions/import`)
      .field('baseRevision', '3')
      .attach('file', Buffer.from(JSON.stringify(robotConfigInput())), 'again.json');
    await owner.delete(robotPath);

    const { events } = await activityLog(s);
    const seen = events.map((e) => `${e.actorName}: ${e.action}`);
    expect(seen).toEqual(
      expect.arrayContaining([
        'Viewer: user.signed_in',
        'Owner: invitation.sent',
        'Owner: member.role_changed',
        'Editor: revision.saved',
        'Editor: revision.restored',
        'Editor: flash.recorded',
        'Editor: robot.imported',
        'Editor: revision.imported',
        'Owner: robot.deleted',
      ]),
    );
    expect(events[0].action).toBe('robot.deleted');
  });

  it('shows sign-ins of members only, and only since they joined', async () => {
    const s = await makeTeamScenario(ctx);
    await client(ctx).post('/api/auth/sign-in').send({ email: s.outsider.email, password: s.outsider.password });
    // The outsider joins a minute after signing in: that earlier sign-in stays out of this team's log.
    addMember(ctx, s.team.id, s.outsider, 'viewer');
    ctx.database.sqlite
      .prepare('update memberships set created_at = created_at + 60000 where user_id = ?')
      .run(s.outsider.id);
    await client(ctx).post('/api/auth/sign-in').send({ email: s.editor.email, password: s.editor.password });
    const { events } = await activityLog(s, '?kind=sign-ins');
    expect(events.map((e) => e.actorName)).toEqual(['Editor']);
  });

  it('filters by kind of action', async () => {
    const s = await makeTeamScenario(ctx);
    await (await clientAs(ctx, s.editor.id)).post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 1 });
    const { events } = await activityLog(s, '?kind=flashes');
    expect(events.map((e) => e.action)).toEqual(['flash.recorded']);
  });

  it('pages back through older events', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    for (let i = 0; i < 3; i++)
      await editor.post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 1, note: `flash ${i}` });
    const first = await activityLog(s, '?kind=flashes&limit=2');
    expect(first.events.map((e) => e.detail.note)).toEqual(['flash 2', 'flash 1']);
    const second = await activityLog(s, `?kind=flashes&limit=2&before=${first.nextBefore}`);
    expect(second.events.map((e) => e.detail.note)).toEqual(['flash 0']);
    expect(second.nextBefore).toBeNull();
  });

  it('refuses an unknown kind, naming the choices', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.owner.id)).get(`/api/teams/${s.team.id}/activity?kind=everything`);
    expect(response.status).toBe(400);
    expect(response.body.error.fields.kind).toBe(
      'kind must be one of all, sign-ins, people, robots, revisions, flashes',
    );
  });

  it("shows members the team's events but not when others signed in", async () => {
    const s = await makeTeamScenario(ctx);
    await client(ctx).post('/api/auth/sign-in').send({ email: s.viewer.email, password: s.viewer.password });
    await (await clientAs(ctx, s.editor.id)).post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 1 });
    const response = await (await clientAs(ctx, s.editor.id)).get(`/api/teams/${s.team.id}/activity`);
    expect(response.status).toBe(200);
    const actions = response.body.events.map((e: Event) => e.action);
    expect(actions).toContain('flash.recorded');
    expect(actions).not.toContain('user.signed_in');
  });

  it('refuses the sign-ins to members who are not owners, naming the field', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.editor.id)).get(`/api/teams/${s.team.id}/activity?kind=sign-ins`);
    expect(response.status).toBe(403);
    expect(response.body.error.fields.kind).toBe('Only owners see when members signed in');
  });
});
