import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { assignPins } from '@shared/pins/assign-pins';
import { robotProblems } from '@shared/problems/robot-problems';
import { buildStarterConfig } from '@shared/starter';
import { robotConfig, robotConfigInput } from '../factories/robot-config';
import { makeRobot, makeTeamScenario } from './support/factories';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

describe('creating robots', () => {
  it('stores the configuration as revision 1 and fills in defaults', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const created = await editor
      .post(`/api/teams/${s.team.id}/robots`)
      .send({ name: 'Porch Runner', config: robotConfigInput() });
    expect(created.status).toBe(201);
    expect(created.body.robot).toMatchObject({ name: 'Porch Runner', headRevision: 1, lastFlash: null });
    const detail = await editor.get(`/api/robots/${created.body.robot.id}`);
    expect(detail.body.head).toMatchObject({ number: 1, authorName: 'Editor', message: 'First revision' });
    expect(detail.body.head.config.name).toBe('Porch Runner');
    expect(detail.body.head.config.safety.failsafeTimeoutMs).toBe(250);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 5 }).map((e) => e.action)).toContain('robot.created');
  });

  it('refuses an invalid configuration, naming each field by its dotted path', async () => {
    const s = await makeTeamScenario(ctx);
    const config = robotConfigInput();
    config.chassis.wheels[1].radiusMm = -4;
    config.chassis.wheels[0].motor = 'Nobody';
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/teams/${s.team.id}/robots`)
      .send({ name: 'Broken', config });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toMatchObject({
      'config.chassis.wheels.1.radiusMm': 'Radius must be more than 0 mm',
    });
  });

  it('names a cross-field problem by the field it concerns', async () => {
    const s = await makeTeamScenario(ctx);
    const config = robotConfigInput();
    config.chassis.wheels[0].motor = 'Nobody';
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/teams/${s.team.id}/robots`)
      .send({ name: 'Broken', config });
    expect(response.body.error.fields['config.chassis.wheels.0.motor']).toBe('No motor is named "Nobody"');
  });
});

describe('revisions', () => {
  it('saves a new revision on top of the head', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const config = { ...robotConfigInput(), safety: { failsafeTimeoutMs: 150 } };
    const saved = await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Shorter failsafe', config });
    expect(saved.status).toBe(201);
    expect(saved.body.revision).toMatchObject({ number: 2, message: 'Shorter failsafe', authorName: 'Editor' });
    const list = await editor.get(`/api/robots/${s.robot.id}/revisions`);
    expect(list.body.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    const first = await editor.get(`/api/robots/${s.robot.id}/revisions/1`);
    expect(first.body.revision.config.safety.failsafeTimeoutMs).toBe(250);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 5 })[0]).toMatchObject({
      action: 'revision.saved',
      detail: { number: 2 },
    });
  });

  it('answers 409 with the newer head when the edit started from an older revision', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const owner = await clientAs(ctx, s.owner.id);
    await owner
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Owner was first', config: robotConfigInput() });
    const late = await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Editor was second', config: robotConfigInput() });
    expect(late.status).toBe(409);
    expect(late.body.error).toMatchObject({
      code: 'revision_conflict',
      head: { number: 2, message: 'Owner was first', authorName: 'Owner' },
    });
    expect((await editor.get(`/api/robots/${s.robot.id}/revisions`)).body.revisions).toHaveLength(2);
  });

  it('answers 404 for a revision that does not exist', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/revisions/9`);
    expect(response.status).toBe(404);
  });

  it('refuses a revision number that is not a whole number', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/revisions/first`);
    expect(response.status).toBe(400);
    expect(response.body.error.fields.revision).toBeDefined();
  });
});

describe('robots', () => {
  it('renames a robot without making a revision', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const renamed = await editor.patch(`/api/robots/${s.robot.id}`).send({ name: 'Shed Crawler' });
    expect(renamed.body.robot).toMatchObject({ name: 'Shed Crawler', headRevision: 1 });
  });

  it('lists only the robots of the team asked about', async () => {
    const s = await makeTeamScenario(ctx);
    const other = await makeTeamScenario(ctx);
    const second = makeRobot(ctx, s.team.id, s.owner, 'Second');
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/teams/${s.team.id}/robots`);
    expect(response.body.robots.map((r: { id: string }) => r.id).sort()).toEqual([s.robot.id, second.id].sort());
    expect(response.body.robots.map((r: { id: string }) => r.id)).not.toContain(other.robot.id);
  });

  it('hides a robot in the bin as if it did not exist', async () => {
    const s = await makeTeamScenario(ctx);
    ctx.database.sqlite.prepare('update robots set deleted_at = ? where id = ?').run(Date.now(), s.robot.id);
    const viewer = await clientAs(ctx, s.viewer.id);
    expect((await viewer.get(`/api/robots/${s.robot.id}`)).status).toBe(404);
    expect((await viewer.get(`/api/teams/${s.team.id}/robots`)).body.robots).toEqual([]);
  });

  it('shows a member of another team 404 for this team robot', async () => {
    const s = await makeTeamScenario(ctx);
    const other = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, other.owner.id)).get(`/api/robots/${s.robot.id}`);
    expect(response.status).toBe(404);
    expect(response.body.error.message).toBe('Robot not found');
  });
});

describe('the team robot list', () => {
  it('gives each robot its head revision’s layout, board and open problems', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/teams/${s.team.id}/robots`);
    const problems = robotProblems(robotConfig());
    const errors = problems.filter((p) => p.severity === 'error').length;
    expect(response.body.robots[0]).toMatchObject({
      id: s.robot.id,
      layout: 'differential',
      board: 'uno',
      problems: { errors, warnings: problems.length - errors },
    });
    expect(errors).toBeGreaterThan(0);
  });

  it('follows the head revision when a new one is saved', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const starter = buildStarterConfig({
      layout: 'trio-omni',
      board: 'nano',
      input: 'ppm',
      driver: 'pwm-in1-in2-stby',
    });
    const placed = assignPins(starter);
    if (!placed.ok) throw new Error(placed.reason);
    await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Trio on a Nano', config: placed.config });
    const response = await editor.get(`/api/teams/${s.team.id}/robots`);
    const expected = robotProblems(placed.config);
    expect(response.body.robots[0]).toMatchObject({
      headRevision: 2,
      layout: 'trio-omni',
      board: 'nano',
      problems: { errors: 0, warnings: expected.length },
    });
  });

  it('lists a robot whose head cannot be read without layout, board or counts', async () => {
    const s = await makeTeamScenario(ctx);
    ctx.database.sqlite
      .prepare('update revisions set config = ? where robot_id = ?')
      .run('{"schemaVersion":99}', s.robot.id);
    const response = await (await clientAs(ctx, s.owner.id)).get(`/api/teams/${s.team.id}/robots`);
    expect(response.body.robots[0]).toMatchObject({ id: s.robot.id, layout: null, board: null, problems: null });
  });
});
