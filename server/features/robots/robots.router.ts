import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole, requireTeamRole } from '@server/middleware/team-access';
import { BODY_LIMITS, validateBody } from '@server/middleware/validate';
import { CreateRobotInputSchema, RenameRobotInputSchema, SaveRevisionInputSchema } from '@shared/schemas/robots';
import { listRobotsForTeam } from './robot-list.service';
import { listRevisions, robotSummary } from './robots.repository';
import { createRobot, getRevision, renameRobotFor, robotDetail, saveRevision } from './robots.service';

const RevisionParamsSchema = z.object({
  revision: z.coerce
    .number({ error: 'Revision must be a number' })
    .int('Revision must be a whole number')
    .min(1, 'Revisions start at 1'),
});

export function robotsRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/teams/:teamId/robots', requireUser, requireTeamRole(ctx, 'viewer'), (req, res) => {
    res.json({ robots: listRobotsForTeam(ctx, grantedAccess(req).teamId) });
  });

  router.post(
    '/teams/:teamId/robots',
    requireUser,
    requireTeamRole(ctx, 'editor'),
    validateBody(CreateRobotInputSchema, BODY_LIMITS.configuration),
    (req, res) => {
      res.status(201).json({ robot: createRobot(ctx, currentUser(req), grantedAccess(req).teamId, req.body) });
    },
  );

  router.get('/robots/:robotId', requireUser, requireRobotRole(ctx, 'viewer'), (req, res) => {
    res.json(robotDetail(ctx, String(req.params.robotId), grantedAccess(req).role));
  });

  router.patch(
    '/robots/:robotId',
    requireUser,
    requireRobotRole(ctx, 'editor'),
    validateBody(RenameRobotInputSchema),
    (req, res) => {
      const robotId = String(req.params.robotId);
      renameRobotFor(ctx, currentUser(req), robotId, req.body.name);
      res.json({ robot: robotSummary(ctx.db, robotId) });
    },
  );

  router.get('/robots/:robotId/revisions', requireUser, requireRobotRole(ctx, 'viewer'), (req, res) => {
    res.json({ revisions: listRevisions(ctx.db, String(req.params.robotId)) });
  });

  router.get('/robots/:robotId/revisions/:revision', requireUser, requireRobotRole(ctx, 'viewer'), (req, res) => {
    const { revision: number } = RevisionParamsSchema.parse(req.params);
    res.json({ revision: getRevision(ctx, String(req.params.robotId), number) });
  });

  router.post(
    '/robots/:robotId/revisions',
    requireUser,
    requireRobotRole(ctx, 'editor'),
    validateBody(SaveRevisionInputSchema, BODY_LIMITS.configuration),
    (req, res) => {
      res.status(201).json({ revision: saveRevision(ctx, currentUser(req), String(req.params.robotId), req.body) });
    },
  );

  return router;
}
