import type { Request, RequestHandler } from 'express';
import type { AppContext } from '@server/config';
import { findMembership } from '@server/features/teams/teams.repository';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import { roleAtLeast, type Role } from '@shared/schemas/teams';

/**
 * Access to a team's things. A signed-in person who is not a member gets 404 (as if the team
 * did not exist, so ids do not leak); a member whose role is too low gets 403.
 */
function grant(ctx: AppContext, req: Request, teamId: string, minimum: Role, notFound: string): void {
  if (!req.user) throw new HttpError(401, 'Sign in to continue');
  const membership = findMembership(ctx.db, teamId, req.user.id);
  if (!membership) throw new HttpError(404, notFound);
  if (!roleAtLeast(membership.role, minimum)) {
    throw new HttpError(403, `This needs the ${minimum} role in this team; you are ${membership.role}`, {
      code: 'role_too_low',
    });
  }
  req.access = { teamId, role: membership.role };
}

/** For routes with `:teamId`. */
export function requireTeamRole(ctx: AppContext, minimum: Role): RequestHandler {
  return (req, _res, next) => {
    grant(ctx, req, String(req.params.teamId), minimum, 'Team not found');
    next();
  };
}

/** For routes with `:robotId`: the team is the robot's team. */
export function requireRobotRole(ctx: AppContext, minimum: Role): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new HttpError(401, 'Sign in to continue');
    const robot = findLiveRobot(ctx.db, String(req.params.robotId));
    if (!robot) throw new HttpError(404, 'Robot not found');
    grant(ctx, req, robot.teamId, minimum, 'Robot not found');
    next();
  };
}

/** The team and role granted by the access check, for handlers behind it. */
export function grantedAccess(req: Request): { teamId: string; role: Role } {
  if (!req.access) throw new Error('Route is missing its team access check');
  return req.access;
}
