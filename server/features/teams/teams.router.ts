import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireTeamRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { ChangeRoleInputSchema, CreateTeamInputSchema } from '@shared/schemas/teams';
import { listMembers, listTeamsOf } from './teams.repository';
import { changeRole, createTeam, removeMember, teamDetail } from './teams.service';

export function teamsRoutes(ctx: AppContext): Router {
  const router = Router();
  const viewer = requireTeamRole(ctx, 'viewer');
  const owner = requireTeamRole(ctx, 'owner');

  router.get('/teams', requireUser, (req, res) => {
    res.json({ teams: listTeamsOf(ctx.db, currentUser(req).id) });
  });

  router.post('/teams', requireUser, validateBody(CreateTeamInputSchema), (req, res) => {
    res.status(201).json({ team: createTeam(ctx, currentUser(req), req.body.name) });
  });

  router.get('/teams/:teamId', requireUser, viewer, (req, res) => {
    const { teamId, role } = grantedAccess(req);
    res.json({ team: teamDetail(ctx, teamId, role) });
  });

  router.get('/teams/:teamId/members', requireUser, viewer, (req, res) => {
    res.json({ members: listMembers(ctx.db, grantedAccess(req).teamId) });
  });

  router.patch(
    '/teams/:teamId/members/:userId',
    requireUser,
    owner,
    validateBody(ChangeRoleInputSchema),
    (req, res) => {
      changeRole(ctx, currentUser(req), grantedAccess(req).teamId, String(req.params.userId), req.body.role);
      res.json({ members: listMembers(ctx.db, grantedAccess(req).teamId) });
    },
  );

  // Any member may remove themselves (leave); removing someone else needs the owner role.
  router.delete('/teams/:teamId/members/:userId', requireUser, viewer, (req, res) => {
    const { teamId, role } = grantedAccess(req);
    removeMember(ctx, currentUser(req), role, teamId, String(req.params.userId));
    res.status(204).end();
  });

  return router;
}
