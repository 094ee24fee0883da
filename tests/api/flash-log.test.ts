import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { saveRevision } from '@server/features/robots/robots.service';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { robotConfig } from '../factories/robot-config';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { rowCounts } from './support/row-counts';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

function save(s: TeamScenario, message: string, change: (c: RobotConfig) => void = () => {}) {
  const config = { ...robotConfig(), name: s.robot.name };
  change(config);
  return saveRevision(ctx.appContext, s.editor, s.robot.id, {
    baseRevision: findLiveRobot(ctx.db, s.robot.id)!.headRevision,
    message,
    config,
  });
}

describe('the flash log', () => {
  it('records who flashed which revision, when, with a note, and audits it', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const recorded = await editor
      .post(`/api/robots/${s.robot.id}/flashes`)
      .send({ revision: 1, note: 'Club night', flashedAt: new Date().toISOString() });
    expect(recorded.status).toBe(201);
    expect(recorded.body.flash).toMatchObject({ revisionNumber: 1, flashedByName: 'Editor', note: 'Club night' });
    const log = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/flashes`);
    expect(log.body.flashes).toHaveLength(1);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'flash.recorded',
      actorName: 'Editor',
      detail: { number: 1, note: 'Club night' },
    });
  });

  it('shows the newest flash on the robot list', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Second');
    await (await clientAs(ctx, s.editor.id)).post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 2 });
    const robots = await (await clientAs(ctx, s.viewer.id)).get(`/api/teams/${s.team.id}/robots`);
    expect(robots.body.robots[0].lastFlash).toMatchObject({ revisionNumber: 2 });
  });

  it('refuses a revision that does not exist, naming the field', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/flashes`)
      .send({ revision: 4 });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.revision).toBe('Revision 4 does not exist; the newest is 1');
  });

  it('refuses a flash time in the future', async () => {
    const s = await makeTeamScenario(ctx);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString();
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/flashes`)
      .send({ revision: 1, flashedAt: tomorrow });
    expect(response.body.error.fields.flashedAt).toBe('The flash time is in the future');
  });

  it('refuses a flash time before the revision was saved', async () => {
    const s = await makeTeamScenario(ctx);
    const lastYear = new Date(Date.now() - 365 * 86_400_000).toISOString();
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/flashes`)
      .send({ revision: 1, flashedAt: lastYear });
    expect(response.body.error.fields.flashedAt).toMatch(/Revision 1 was saved after that time/);
  });

  it('is refused to a viewer, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const before = rowCounts(ctx);
    const response = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/flashes`)
      .send({ revision: 1 });
    expect(response.status).toBe(403);
    expect(rowCounts(ctx)).toEqual(before);
  });
});
