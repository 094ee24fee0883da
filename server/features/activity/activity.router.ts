import { Router } from 'express';
import type { AppContext } from '@server/config';
import { requireUser } from '@server/middleware/session';
import { grantedAccess, requireTeamRole } from '@server/middleware/team-access';
import { ActivityQuerySchema, type ActivityPage } from '@shared/schemas/activity';
import { teamActivity } from './activity.service';

/** The team's activity log, for every member; owners also see the members' sign-ins. */
export function activityRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/teams/:teamId/activity', requireUser, requireTeamRole(ctx, 'viewer'), (req, res) => {
    const { teamId, role } = grantedAccess(req);
    const page: ActivityPage = teamActivity(ctx, teamId, role, ActivityQuerySchema.parse(req.query));
    res.json(page);
  });

  return router;
}
