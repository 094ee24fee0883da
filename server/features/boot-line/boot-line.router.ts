import { Router } from 'express';
import type { AppContext } from '@server/config';
import { requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole, requireTeamRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { BootLineInputSchema } from '@shared/schemas/boot-line';
import { lookUpBootLine, lookUpTeamBootLine } from './boot-line.service';

/** Reading a boot line changes nothing, so viewers may ask too. */
export function bootLineRoutes(ctx: AppContext): Router {
  const router = Router();

  router.post(
    '/robots/:robotId/boot-line',
    requireUser,
    requireRobotRole(ctx, 'viewer'),
    validateBody(BootLineInputSchema),
    (req, res) => {
      res.json(lookUpBootLine(ctx, String(req.params.robotId), req.body.line));
    },
  );

  // For someone plugged into one of the team's robots without knowing which.
  router.post(
    '/teams/:teamId/boot-line',
    requireUser,
    requireTeamRole(ctx, 'viewer'),
    validateBody(BootLineInputSchema),
    (req, res) => {
      res.json(lookUpTeamBootLine(ctx, grantedAccess(req).teamId, req.body.line));
    },
  );

  return router;
}
