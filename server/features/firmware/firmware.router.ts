import { Router, type Request } from 'express';
import { z } from 'zod';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole } from '@server/middleware/team-access';
import { BODY_LIMITS, validateBody } from '@server/middleware/validate';
import { PreviewFilesInputSchema } from '@shared/schemas/firmware';
import {
  defaultVerifySettings,
  draftFiles,
  revisionFiles,
  revisionZip,
  verifyRevision,
  type VerifySettings,
} from './firmware.service';

const RevisionParamsSchema = z.object({
  revision: z.coerce
    .number({ error: 'Revision must be a number' })
    .int('Revision must be a whole number')
    .min(1, 'Revisions start at 1'),
});

const revisionOf = (req: Request) => RevisionParamsSchema.parse(req.params).revision;
const robotOf = (req: Request) => String(req.params.robotId);

/**
 * The firmware bundle of a robot. Everyone in the team, viewers included, may read, download
 * and compile-check it: none of these change anything. The compile check and the draft preview
 * are POSTs (they compute, and the draft travels in the body), so the API's origin check
 * applies to them like to every other POST.
 */
export function firmwareRoutes(ctx: AppContext, verify: VerifySettings = defaultVerifySettings): Router {
  const router = Router();
  const viewer = [requireUser, requireRobotRole(ctx, 'viewer')];

  router.get('/robots/:robotId/revisions/:revision/files', ...viewer, (req, res) => {
    res.json(revisionFiles(ctx, robotOf(req), revisionOf(req)));
  });

  router.get('/robots/:robotId/revisions/:revision/bundle', ...viewer, async (req, res) => {
    const { fileName, zip } = await revisionZip(ctx, robotOf(req), revisionOf(req));
    res.attachment(fileName).type('application/zip').set('Cache-Control', 'private, no-store').send(zip);
  });

  router.post('/robots/:robotId/revisions/:revision/verify', ...viewer, async (req, res) => {
    const requester = { userId: currentUser(req).id, teamId: grantedAccess(req).teamId };
    res.json(await verifyRevision(ctx, requester, robotOf(req), revisionOf(req), verify));
  });

  router.post(
    '/robots/:robotId/preview-files',
    ...viewer,
    validateBody(PreviewFilesInputSchema, BODY_LIMITS.configuration),
    (req, res) => {
      res.json(draftFiles(ctx, robotOf(req), req.body.config));
    },
  );

  return router;
}
