import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole, requireTeamRole } from '@server/middleware/team-access';
import { deleteRobot, listBin, restoreRobot } from './robot-bin.service';

/** Deleting and restoring robots: owners only, since a robot holds the whole team's history. */
export function robotBinRoutes(ctx: AppContext): Router {
  const router = Router();
  const owner = requireTeamRole(ctx, 'owner');

  router.delete('/robots/:robotId', requireUser, requireRobotRole(ctx, 'owner'), (req, res) => {
    deleteRobot(ctx, currentUser(req), String(req.params.robotId));
    res.status(204).end();
  });

  router.get('/teams/:teamId/robot-bin', requireUser, owner, (req, res) => {
    res.json({ robots: listBin(ctx, grantedAccess(req).teamId) });
  });

  router.post('/teams/:teamId/robot-bin/:robotId/restore', requireUser, owner, (req, res) => {
    const robot = restoreRobot(ctx, currentUser(req), grantedAccess(req).teamId, String(req.params.robotId));
    res.json({ robot });
  });

  return router;
}
