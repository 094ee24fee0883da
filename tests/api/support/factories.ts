import { insertUser } from '@server/features/auth/auth.repository';
import { createRobot } from '@server/features/robots/robots.service';
import { insertInvitation } from '@server/features/teams/invitations.repository';
import { insertMembership, insertTeamWithOwner } from '@server/features/teams/teams.repository';
import { hashToken, newToken } from '@server/lib/ids';
import { hashPassword } from '@server/lib/password';
import type { CurrentUser } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/teams';
import { robotConfig } from '../../factories/robot-config';
import type { TestContext } from './test-app';

let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;

export function uniqueEmail(label = 'person'): string {
  return `${label}.${unique()}@example.org`;
}

export interface TestUser extends CurrentUser {
  password: string;
}

export async function makeUser(
  ctx: TestContext,
  overrides: { name?: string; email?: string; password?: string } = {},
): Promise<TestUser> {
  const password = overrides.password ?? `pass-${unique()}-word`;
  const row = insertUser(ctx.db, {
    name: overrides.name ?? 'Test Person',
    email: overrides.email ?? uniqueEmail(),
    passwordHash: await hashPassword(password, ctx.config.passwordCost),
  });
  return { id: row.id, email: row.email, name: row.name, password };
}

export function makeTeam(ctx: TestContext, owner: CurrentUser, name = `Team ${unique()}`) {
  return insertTeamWithOwner(ctx.db, name, owner.id);
}

export function addMember(ctx: TestContext, teamId: string, user: CurrentUser, role: Role): void {
  insertMembership(ctx.db, teamId, user.id, role);
}

export function makeRobot(ctx: TestContext, teamId: string, by: CurrentUser, name = `Robot ${unique()}`) {
  return createRobot(ctx.appContext, by, teamId, { name, config: robotConfig() });
}

/** An open invitation straight in the database; returns its id and the link token. */
export function makeInvitation(
  ctx: TestContext,
  input: { teamId: string; invitedBy: CurrentUser; email?: string; role?: Role; expiresAt?: Date },
) {
  const token = newToken();
  const row = insertInvitation(ctx.db, {
    teamId: input.teamId,
    email: input.email ?? uniqueEmail('invitee'),
    role: input.role ?? 'viewer',
    tokenHash: hashToken(token),
    invitedBy: input.invitedBy.id,
    expiresAt: input.expiresAt ?? new Date(Date.now() + 7 * 86_400_000),
  });
  return { id: row.id, email: row.email, token };
}

/** A team with one member of each role, an outsider, a spare member to act on, and a robot. */
export async function makeTeamScenario(ctx: TestContext) {
  const [owner, editor, viewer, spare, outsider] = await Promise.all(
    ['Owner', 'Editor', 'Viewer', 'Spare', 'Outsider'].map((name) =>
      makeUser(ctx, { name, email: uniqueEmail(name.toLowerCase()) }),
    ),
  );
  const team = makeTeam(ctx, owner);
  addMember(ctx, team.id, editor, 'editor');
  addMember(ctx, team.id, viewer, 'viewer');
  addMember(ctx, team.id, spare, 'viewer');
  const robot = makeRobot(ctx, team.id, owner);
  const invitation = makeInvitation(ctx, { teamId: team.id, invitedBy: owner });
  return { owner, editor, viewer, spare, outsider, team, robot, invitation };
}
export type TeamScenario = Awaited<ReturnType<typeof makeTeamScenario>>;
