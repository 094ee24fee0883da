import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { findUserById } from '@server/features/auth/auth.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { Role, TeamDetail } from '@shared/schemas/teams';
import {
  countOwners,
  deleteMembership,
  findMembership,
  findTeam,
  insertTeamWithOwner,
  setRole,
} from './teams.repository';

export function createTeam(ctx: AppContext, user: CurrentUser, name: string): TeamDetail {
  const team = insertTeamWithOwner(ctx.db, name, user.id);
  recordEvent(ctx.db, {
    teamId: team.id,
    actorId: user.id,
    action: 'team.created',
    target: `team:${team.id}`,
    detail: { name },
  });
  return { id: team.id, name: team.name, role: 'owner', createdAt: team.createdAt.toISOString() };
}

export function teamDetail(ctx: AppContext, teamId: string, role: Role): TeamDetail {
  const team = findTeam(ctx.db, teamId);
  if (!team) throw new HttpError(404, 'Team not found');
  return { id: team.id, name: team.name, role, createdAt: team.createdAt.toISOString() };
}

const LAST_OWNER = 'A team needs at least one owner; make someone else owner first';

export function changeRole(ctx: AppContext, actor: CurrentUser, teamId: string, userId: string, role: Role): void {
  ctx.db.transaction((tx) => {
    const membership = findMembership(tx, teamId, userId);
    if (!membership) throw new HttpError(404, 'Member not found');
    if (membership.role === role) return;
    if (membership.role === 'owner' && countOwners(tx, teamId) <= 1) {
      throw new HttpError(409, LAST_OWNER, { code: 'last_owner', fields: { role: LAST_OWNER } });
    }
    setRole(tx, teamId, userId, role);
    recordEvent(tx, {
      teamId,
      actorId: actor.id,
      action: 'member.role_changed',
      target: `user:${userId}`,
      detail: { name: findUserById(tx, userId)?.name, from: membership.role, to: role },
    });
  });
}

/** Owners remove anyone; any member may remove themselves (leave). */
export function removeMember(
  ctx: AppContext,
  actor: CurrentUser,
  actorRole: Role,
  teamId: string,
  userId: string,
): void {
  if (actor.id !== userId && actorRole !== 'owner') {
    throw new HttpError(403, 'Only owners remove other members', { code: 'role_too_low' });
  }
  ctx.db.transaction((tx) => {
    const membership = findMembership(tx, teamId, userId);
    if (!membership) throw new HttpError(404, 'Member not found');
    if (membership.role === 'owner' && countOwners(tx, teamId) <= 1) {
      throw new HttpError(409, LAST_OWNER, { code: 'last_owner' });
    }
    deleteMembership(tx, teamId, userId);
    recordEvent(tx, {
      teamId,
      actorId: actor.id,
      action: actor.id === userId ? 'member.left' : 'member.removed',
      target: `user:${userId}`,
      detail: { name: findUserById(tx, userId)?.name, role: membership.role },
    });
  });
}
