import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { getRevision, saveRevision } from '@server/features/robots/robots.service';
import { configHash } from '@shared/history/config-hash';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { robotConfig } from '../factories/robot-config';
import { makeTeamScenario, type TeamScenario } from './support/factories';
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

/** The line firmware generated from this revision prints at boot. */
function bootLineOf(s: TeamScenario, number: number, name = s.robot.name): string {
  const hash = configHash(getRevision(ctx.appContext, s.robot.id, number).config);
  return `boot robot="${name}" revision=${number} hash=${hash} generator=0.1.0 board=uno input=rc-pwm`;
}

describe('the boot-line lookup', () => {
  it('finds the revision the firmware was built from and says it is the head', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Quicker failsafe', (c) => (c.safety.failsafeTimeoutMs = 150));
    const answer = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/boot-line`)
      .send({ line: bootLineOf(s, 2) });
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({
      match: { number: 2, isHead: true, message: 'Quicker failsafe' },
      headRevision: 2,
      nameMatches: true,
    });
    expect(answer.body.verdict).toBe('This robot runs revision 2, the current head.');
  });

  it('finds an older revision and says how far behind the head it is', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Two', (c) => (c.safety.failsafeTimeoutMs = 150));
    save(s, 'Three', (c) => (c.safety.failsafeTimeoutMs = 200));
    const answer = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/boot-line`)
      .send({ line: bootLineOf(s, 1) });
    expect(answer.body.match).toMatchObject({ number: 1, isHead: false });
    expect(answer.body.verdict).toBe('This robot runs revision 1; the head is revision 3.');
  });

  it('names the other revisions with the same configuration after a restore', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Two', (c) => (c.safety.failsafeTimeoutMs = 150));
    await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/1/restore`)
      .send({ baseRevision: 2 });
    const answer = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/boot-line`)
      .send({ line: bootLineOf(s, 3) });
    expect(answer.body.match).toMatchObject({ number: 3, isHead: true });
    expect(answer.body.sameConfiguration).toEqual([1]);
  });

  it('says clearly when no revision matches', async () => {
    const s = await makeTeamScenario(ctx);
    const line = `boot robot="${s.robot.name}" revision=1 hash=0123abcd generator=0.1.0`;
    const answer = await (await clientAs(ctx, s.viewer.id)).post(`/api/robots/${s.robot.id}/boot-line`).send({ line });
    expect(answer.status).toBe(200);
    expect(answer.body.match).toBeNull();
    expect(answer.body.verdict).toBe(
      `No revision of ${s.robot.name} has the configuration hash 0123abcd. Revision 1 exists but its configuration differs: the firmware was built from unsaved changes or from another robot.`,
    );
  });

  it('notices a line from another robot', async () => {
    const s = await makeTeamScenario(ctx);
    const answer = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/boot-line`)
      .send({ line: bootLineOf(s, 1, 'Somebody Else') });
    expect(answer.body.nameMatches).toBe(false);
    expect(answer.body.verdict).toMatch(/^The line names “Somebody Else”, not “/);
  });

  it('recognises firmware built before the configuration schema changed', async () => {
    const s = await makeTeamScenario(ctx);
    // Revision 1 stored as version 1 wrote it; firmware then hashed that stored form.
    const stored = {
      ...robotConfig(),
      name: s.robot.name,
      schemaVersion: 1,
      controls: { ...robotConfig().controls, rateSwitch: { channel: null, positions: 2, rates: [0.5, 1] } },
    };
    ctx.database.sqlite
      .prepare('update revisions set config = ? where robot_id = ? and number = 1')
      .run(JSON.stringify(stored), s.robot.id);
    const line = `boot robot="${s.robot.name}" revision=1 hash=${configHash(stored)}`;
    const answer = await (await clientAs(ctx, s.viewer.id)).post(`/api/robots/${s.robot.id}/boot-line`).send({ line });
    expect(answer.body.match).toMatchObject({ number: 1 });
  });

  it('explains a line it cannot read', async () => {
    const s = await makeTeamScenario(ctx);
    const answer = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/boot-line`)
      .send({ line: 'health good=50/s' });
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields.line).toMatch(/No boot line found/);
  });
});
