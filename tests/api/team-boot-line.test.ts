import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deleteRobot } from '@server/features/robot-bin/robot-bin.service';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { getRevision, saveRevision } from '@server/features/robots/robots.service';
import { configHash } from '@shared/history/config-hash';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { robotConfig } from '../factories/robot-config';
import { makeRobot, makeTeamScenario, type TeamScenario } from './support/factories';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

type Robot = { id: string; name: string };

/** A new head revision of the robot; the configuration keeps the robot's name unless told. */
function save(s: TeamScenario, robot: Robot, change: (c: RobotConfig) => void) {
  const config = { ...robotConfig(), name: robot.name };
  change(config);
  const baseRevision = findLiveRobot(ctx.db, robot.id)!.headRevision;
  return saveRevision(ctx.appContext, s.editor, robot.id, { baseRevision, message: 'Bench change', config });
}

/** The line firmware generated from this revision prints at boot. */
function bootLineOf(robot: Robot, number: number, name = robot.name): string {
  const hash = configHash(getRevision(ctx.appContext, robot.id, number).config);
  return `12:01:07.113 -> boot robot="${name}" revision=${number} hash=${hash} generator=0.1.0 board=uno input=rc-pwm`;
}

/** A team with three robots; the second has a newer head than the revision asked about. */
async function teamOfThree() {
  const s = await makeTeamScenario(ctx);
  const second = makeRobot(ctx, s.team.id, s.owner);
  const third = makeRobot(ctx, s.team.id, s.owner);
  save(s, second, (c) => (c.safety.failsafeTimeoutMs = 150));
  return { s, robots: [s.robot, second, third] };
}

async function ask(userId: string, teamId: string, line: string) {
  return (await clientAs(ctx, userId)).post(`/api/teams/${teamId}/boot-line`).send({ line });
}

describe('the team boot-line lookup', () => {
  it('finds the robot among several by the configuration hash', async () => {
    const { s, robots } = await teamOfThree();
    const answer = await ask(s.viewer.id, s.team.id, bootLineOf(robots[1], 1));
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({
      robot: { id: robots[1].id, name: robots[1].name },
      foundBy: 'hash',
      otherRobots: [],
    });
    expect(answer.body.answer).toMatchObject({
      match: { number: 1, isHead: false },
      headRevision: 2,
      nameMatches: true,
    });
    expect(answer.body.answer.verdict).toBe('This robot runs revision 1; the head is revision 2.');
  });

  it('finds the robot by its hash even when the printed name is another', async () => {
    const { s, robots } = await teamOfThree();
    const answer = await ask(s.viewer.id, s.team.id, bootLineOf(robots[2], 1, robots[0].name));
    expect(answer.body.robot.id).toBe(robots[2].id);
    expect(answer.body.answer.nameMatches).toBe(false);
  });

  it('prefers the printed name when two robots share a configuration and names the other', async () => {
    const { s, robots } = await teamOfThree();
    // Listed before the first robot; its revision 2 copies the first robot's configuration, name and all.
    const copy = makeRobot(ctx, s.team.id, s.owner, 'A copy on the shelf');
    save(s, copy, (c) => (c.name = robots[0].name));
    const hash = configHash(getRevision(ctx.appContext, robots[0].id, 1).config);
    const answer = await ask(s.viewer.id, s.team.id, `boot robot="${robots[0].name}" revision=7 hash=${hash}`);
    expect(answer.body.robot.id).toBe(robots[0].id);
    expect(answer.body.otherRobots).toEqual([{ id: copy.id, name: copy.name }]);
  });

  it('falls back to the printed robot name when no revision has the hash', async () => {
    const { s, robots } = await teamOfThree();
    const answer = await ask(
      s.viewer.id,
      s.team.id,
      `boot robot="${robots[1].name.toUpperCase()}" revision=4 hash=0123abcd`,
    );
    expect(answer.body).toMatchObject({ robot: { id: robots[1].id }, foundBy: 'name', answer: { match: null } });
    expect(answer.body.verdict).toBe(
      `No revision in this team has the configuration hash 0123abcd; by the printed name this is ${robots[1].name}.`,
    );
  });

  it('does not find a robot of another team', async () => {
    const { s } = await teamOfThree();
    const other = await makeTeamScenario(ctx);
    const answer = await ask(s.viewer.id, s.team.id, bootLineOf(other.robot, 1));
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ robot: null, foundBy: null, answer: null });
    expect(answer.body.verdict).toMatch(/^No robot in this team matches/);
  });

  it('does not find a robot in the bin', async () => {
    const { s, robots } = await teamOfThree();
    deleteRobot(ctx.appContext, s.owner, robots[1].id);
    const answer = await ask(s.viewer.id, s.team.id, bootLineOf(robots[1], 1));
    expect(answer.body.robot).toBeNull();
  });

  it('answers a signed-in person outside the team with 404', async () => {
    const { s, robots } = await teamOfThree();
    const answer = await ask(s.outsider.id, s.team.id, bootLineOf(robots[0], 1));
    expect(answer.status).toBe(404);
  });

  it('explains a line it cannot read, naming the line field', async () => {
    const { s } = await teamOfThree();
    const answer = await ask(s.viewer.id, s.team.id, 'health good=50/s');
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields.line).toMatch(/No boot line found/);
  });

  it('asks for a line when the body has none', async () => {
    const { s } = await teamOfThree();
    const answer = await (await clientAs(ctx, s.viewer.id)).post(`/api/teams/${s.team.id}/boot-line`).send({});
    expect(answer.status).toBe(400);
    expect(answer.body.error.fields.line).toBe('Paste the boot line');
  });
});
