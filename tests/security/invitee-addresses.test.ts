import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTeamScenario, type TeamScenario } from '../api/support/factories';
import { clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// Whom an owner invited is the owner's business: a pending invitee may never join, and their
// address should not be read by every visiting parent with the viewer role.

let ctx: TestContext;
let s: TeamScenario;
const INVITEE = 'pending.invitee@example.org';

beforeAll(async () => {
  ctx = await createTestContext();
  s = await makeTeamScenario(ctx);
  const owner = await clientAs(ctx, s.owner.id);
  const created = await owner.post(`/api/teams/${s.team.id}/invitations`).send({ email: INVITEE, role: 'viewer' });
  await owner.delete(`/api/teams/${s.team.id}/invitations/${created.body.invitation.id}`);
});
afterAll(() => ctx.close());

const activityOf = async (userId: string) =>
  (await (await clientAs(ctx, userId)).get(`/api/teams/${s.team.id}/activity`)).body.events as {
    action: string;
    detail: Record<string, unknown>;
  }[];

describe('the team activity', () => {
  it('hides invited e-mail addresses from viewers and editors', async () => {
    for (const member of [s.viewer, s.editor]) {
      const events = await activityOf(member.id);
      expect(events.map((e) => e.action)).toEqual(expect.arrayContaining(['invitation.sent', 'invitation.revoked']));
      expect(JSON.stringify(events)).not.toContain(INVITEE);
      expect(events.find((e) => e.action === 'invitation.sent')?.detail).toEqual({ role: 'viewer' });
    }
  });

  it('shows them to owners', async () => {
    const events = await activityOf(s.owner.id);
    expect(events.find((e) => e.action === 'invitation.sent')?.detail).toEqual({ email: INVITEE, role: 'viewer' });
  });
});
