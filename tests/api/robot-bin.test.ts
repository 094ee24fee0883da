import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { purgeExpiredRobots } from '@server/features/robot-bin/robot-bin.service';
import { pngImage } from '../factories/images';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { rowCounts } from './support/row-counts';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

const DAY = 86_400_000;

/** Moves the robot's deletion back in time, as if it had been deleted `days` ago. */
function deletedDaysAgo(s: TeamScenario, days: number) {
  ctx.database.sqlite.prepare('update robots set deleted_at = ? where id = ?').run(Date.now() - days * DAY, s.robot.id);
}

async function binAndRestore(s: TeamScenario) {
  const owner = await clientAs(ctx, s.owner.id);
  return owner.post(`/api/teams/${s.team.id}/robot-bin/${s.robot.id}/restore`);
}

describe('deleting a robot', () => {
  it('hides it from the team and keeps its revisions', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    const before = rowCounts(ctx);
    expect((await owner.delete(`/api/robots/${s.robot.id}`)).status).toBe(204);
    expect((await owner.get(`/api/teams/${s.team.id}/robots`)).body.robots).toEqual([]);
    expect((await owner.get(`/api/robots/${s.robot.id}`)).status).toBe(404);
    expect(rowCounts(ctx)).toMatchObject({ robots: before.robots, revisions: before.revisions });
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'robot.deleted',
      actorName: 'Owner',
    });
  });

  it('lists it in the bin with who deleted it and until when it can come back', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    await owner.delete(`/api/robots/${s.robot.id}`);
    const bin = await owner.get(`/api/teams/${s.team.id}/robot-bin`);
    expect(bin.body.robots).toEqual([
      {
        id: s.robot.id,
        name: s.robot.name,
        headRevision: 1,
        deletedAt: expect.any(String),
        deletedByName: 'Owner',
        restorableUntil: expect.any(String),
      },
    ]);
    const { deletedAt, restorableUntil } = bin.body.robots[0];
    expect(new Date(restorableUntil).getTime() - new Date(deletedAt).getTime()).toBe(30 * DAY);
  });

  it('is refused to an editor', async () => {
    const s = await makeTeamScenario(ctx);
    expect((await (await clientAs(ctx, s.editor.id)).delete(`/api/robots/${s.robot.id}`)).status).toBe(403);
  });
});

describe('restoring a deleted robot', () => {
  it('brings it back within 30 days, with its history', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    await owner.delete(`/api/robots/${s.robot.id}`);
    deletedDaysAgo(s, 29);
    const restored = await binAndRestore(s);
    expect(restored.status).toBe(200);
    expect(restored.body.robot).toMatchObject({ id: s.robot.id, headRevision: 1 });
    expect((await owner.get(`/api/teams/${s.team.id}/robots`)).body.robots.map((r: { id: string }) => r.id)).toEqual([
      s.robot.id,
    ]);
    expect((await owner.get(`/api/teams/${s.team.id}/robot-bin`)).body.robots).toEqual([]);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({ action: 'robot.restored' });
  });

  it('refuses after 30 days, and the bin no longer lists it', async () => {
    const s = await makeTeamScenario(ctx);
    await (await clientAs(ctx, s.owner.id)).delete(`/api/robots/${s.robot.id}`);
    deletedDaysAgo(s, 31);
    const before = rowCounts(ctx);
    const refused = await binAndRestore(s);
    expect(refused.status).toBe(410);
    expect(refused.body.error.message).toBe(
      `${s.robot.name} was deleted more than 30 days ago and can no longer be restored`,
    );
    expect(rowCounts(ctx)).toEqual(before);
    expect((await (await clientAs(ctx, s.owner.id)).get(`/api/teams/${s.team.id}/robot-bin`)).body.robots).toEqual([]);
  });

  it('answers 404 for a robot that is not in the bin', async () => {
    const s = await makeTeamScenario(ctx);
    expect((await binAndRestore(s)).status).toBe(404);
  });

  it('answers 404 for another team’s deleted robot', async () => {
    const s = await makeTeamScenario(ctx);
    const other = await makeTeamScenario(ctx);
    await (await clientAs(ctx, other.owner.id)).delete(`/api/robots/${other.robot.id}`);
    const response = await (
      await clientAs(ctx, s.owner.id)
    ).post(`/api/teams/${s.team.id}/robot-bin/${other.robot.id}/restore`);
    expect(response.status).toBe(404);
  });
});

describe('emptying the bin', () => {
  const photoFiles = () => {
    const folder = join(ctx.config.dataDir, 'photos');
    return existsSync(folder) ? readdirSync(folder) : [];
  };
  const count = (sql: string, id: string) => (ctx.database.sqlite.prepare(sql).get(id) as { n: number }).n;

  it('removes a robot deleted more than 30 days ago with its revisions, flash log and photo file', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    expect((await owner.put(`/api/robots/${s.robot.id}/photo`).attach('photo', pngImage(), 'p.png')).status).toBe(200);
    expect((await owner.post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 1, note: 'bench' })).status).toBe(
      201,
    );
    const photo = (
      ctx.database.sqlite.prepare('select file_name as f from robot_photos where robot_id = ?').get(s.robot.id) as {
        f: string;
      }
    ).f;
    await owner.delete(`/api/robots/${s.robot.id}`);
    deletedDaysAgo(s, 31);

    expect(await purgeExpiredRobots(ctx.db, ctx.config.dataDir)).toBeGreaterThanOrEqual(1);

    expect(count('select count(*) as n from robots where id = ?', s.robot.id)).toBe(0);
    expect(count('select count(*) as n from revisions where robot_id = ?', s.robot.id)).toBe(0);
    expect(count('select count(*) as n from flashes where robot_id = ?', s.robot.id)).toBe(0);
    expect(photoFiles()).not.toContain(photo);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'robot.purged',
      actorName: null,
      detail: { name: s.robot.name },
    });
  });

  it('keeps a robot still within its 30 days, and every robot not deleted', async () => {
    const binned = await makeTeamScenario(ctx);
    const live = await makeTeamScenario(ctx);
    await (await clientAs(ctx, binned.owner.id)).delete(`/api/robots/${binned.robot.id}`);
    deletedDaysAgo(binned, 29);

    await purgeExpiredRobots(ctx.db, ctx.config.dataDir);

    expect(count('select count(*) as n from robots where id = ?', binned.robot.id)).toBe(1);
    expect(count('select count(*) as n from robots where id = ?', live.robot.id)).toBe(1);
    expect((await binAndRestore(binned)).status).toBe(200);
  });
});
