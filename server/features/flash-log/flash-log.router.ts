import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { requireRobotRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { RecordFlashInputSchema } from '@shared/schemas/flash-log';
import { flashLog, recordFlash } from './flash-log.service';

export function flashLogRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/robots/:robotId/flashes', requireUser, requireRobotRole(ctx, 'viewer'), (req, res) => {
    res.json({ flashes: flashLog(ctx, String(req.params.robotId)) });
  });

  router.post(
    '/robots/:robotId/flashes',
    requireUser,
    requireRobotRole(ctx, 'editor'),
    validateBody(RecordFlashInputSchema),
    (req, res) => {
      res.status(201).json({ flash: recordFlash(ctx, currentUser(req), String(req.params.robotId), req.body) });
    },
  );

  return router;
}
