import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DEMO_TEAM_NAME,
  describeSeededAccounts,
  isDatabaseEmpty,
  seedDemo,
  type SeededAccount,
} from '@server/db/seed/seed-demo';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { client, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
let accounts: SeededAccount[];
beforeAll(async () => {
  ctx = await createTestContext();
  expect(isDatabaseEmpty(ctx.db)).toBe(true);
  accounts = await seedDemo(ctx.db, { passwordCost: ctx.config.passwordCost });
});
afterAll(() => ctx.close());

async function signInAs(role: string) {
  const account = accounts.find((a) => a.role === role)!;
  const agent = client(ctx);
  const response = await agent.post('/api/auth/sign-in').send({ email: account.email, password: account.password });
  expect(response.status).toBe(200);
  return agent;
}

describe('the demo seed', () => {
  it('creates an owner, an editor and a viewer who can sign in with the printed passwords', async () => {
    expect(accounts.map((a) => a.role)).toEqual(['owner', 'editor', 'viewer']);
    expect(new Set(accounts.map((a) => a.password)).size).toBe(3);
    for (const account of accounts) expect(account.email).toMatch(/@larkspur-makers\.example$/);
    const viewer = await signInAs('viewer');
    const teams = await viewer.get('/api/teams');
    expect(teams.body.teams).toEqual([
      expect.objectContaining({ name: DEMO_TEAM_NAME, role: 'viewer', memberCount: 3, robotCount: 4 }),
    ]);
  });

  it('gives every robot a few revisions that parse, and a flash log entry', async () => {
    const owner = await signInAs('owner');
    const teamId = (await owner.get('/api/teams')).body.teams[0].id;
    const robots = (await owner.get(`/api/teams/${teamId}/robots`)).body.robots;
    expect(robots.map((r: { name: string }) => r.name)).toEqual([
      'Aisle Scout',
      'Bench Kiwi',
      'Garden Hauler',
      'Greenhouse Cart',
    ]);
    for (const robot of robots) {
      expect(robot.headRevision).toBeGreaterThanOrEqual(2);
      expect(robot.lastFlash).not.toBeNull();
      const revisions = (await owner.get(`/api/robots/${robot.id}/revisions`)).body.revisions;
      for (const { number } of revisions) {
        const { config } = (await owner.get(`/api/robots/${robot.id}/revisions/${number}`)).body.revision;
        expect(RobotConfigSchema.safeParse(config).success).toBe(true);
      }
    }
  });

  it('leaves the database no longer empty, so a restart does not seed again', () => {
    expect(isDatabaseEmpty(ctx.db)).toBe(false);
  });

  it('prints each account once with its password and role', () => {
    const text = describeSeededAccounts(accounts, 'http://localhost:3000');
    for (const account of accounts) expect(text).toContain(`${account.password}  (${account.role}`);
    expect(text).toContain('http://localhost:3000/sign-in');
  });
});
