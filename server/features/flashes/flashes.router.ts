import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole, requireTeamRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { BootLineInputSchema, RecordFlashInputSchema } from '@shared/schemas/history';
import { lookUpBootLine, lookUpTeamBootLine } from './boot-line.service';
import { flashLog, recordFlash } from './flashes.service';

export function flashesRoutes(ctx: AppContext): Router {
  const router = Router();
  const viewer = requireRobotRole(ctx, 'viewer');
  const editor = requireRobotRole(ctx, 'editor');

  router.get('/robots/:robotId/flashes', requireUser, viewer, (req, res) => {
    res.json({ flashes: flashLog(ctx, String(req.params.robotId)) });
  });

  router.post('/robots/:robotId/flashes', requireUser, editor, validateBody(RecordFlashInputSchema), (req, res) => {
    res.status(201).json({ flash: recordFlash(ctx, currentUser(req), String(req.params.robotId), req.body) });
  });

  // Reading a boot line changes nothing, so viewers may ask too.
  router.post('/robots/:robotId/boot-line', requireUser, viewer, validateBody(BootLineInputSchema), (req, res) => {
    res.json(lookUpBootLine(ctx, String(req.params.robotId), req.body.line));
  });

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
