import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { requireRobotRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { DiffQuerySchema, RestoreInputSchema, RevisionParamSchema } from '@shared/schemas/history';
import { bundleRenderer, type BundleRenderer } from './bundle-renderer';
import { restoreRevision, revisionDiff, robotHistory } from './history.service';

export function historyRoutes(ctx: AppContext, render: BundleRenderer | null = bundleRenderer): Router {
  const router = Router();
  const viewer = requireRobotRole(ctx, 'viewer');
  const editor = requireRobotRole(ctx, 'editor');

  router.get('/robots/:robotId/history', requireUser, viewer, (req, res) => {
    res.json(robotHistory(ctx, String(req.params.robotId)));
  });

  router.get('/robots/:robotId/diff', requireUser, viewer, (req, res) => {
    const { from, to } = DiffQuerySchema.parse(req.query);
    res.json(revisionDiff(ctx, String(req.params.robotId), from, to, render));
  });

  router.post(
    '/robots/:robotId/revisions/:revision/restore',
    requireUser,
    editor,
    validateBody(RestoreInputSchema),
    (req, res) => {
      const { revision } = RevisionParamSchema.parse(req.params);
      res
        .status(201)
        .json({ revision: restoreRevision(ctx, currentUser(req), String(req.params.robotId), revision, req.body) });
    },
  );

  return router;
}
