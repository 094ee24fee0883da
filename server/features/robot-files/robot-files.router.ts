import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireRobotRole, requireTeamRole } from '@server/middleware/team-access';
import { singleUpload, uploadedFile } from '@server/middleware/upload';
import { ImportRevisionFieldsSchema, ImportRobotFieldsSchema } from '@shared/schemas/robot-files';
import { RevisionParamSchema } from '@shared/schemas/history';
import { IMPORT_LIMITS } from './import-file';
import { exportRevision, importAsRevision, importAsRobot } from './robot-files.service';

const upload = singleUpload('file', { maxBytes: IMPORT_LIMITS.uploadBytes, what: 'configuration file or bundle zip' });

/** A revision's configuration as a file, and a file brought in as a robot or a revision. */
export function robotFilesRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get(
    '/robots/:robotId/revisions/:revision/export',
    requireUser,
    requireRobotRole(ctx, 'viewer'),
    (req, res) => {
      const { revision } = RevisionParamSchema.parse(req.params);
      const { fileName, body } = exportRevision(ctx, String(req.params.robotId), revision);
      res.type('application/json').attachment(fileName).send(body);
    },
  );

  // The role is checked before the upload is read, so a viewer's file is never even parsed.
  router.post('/teams/:teamId/robots/import', requireUser, requireTeamRole(ctx, 'editor'), upload, (req, res) => {
    const fields = ImportRobotFieldsSchema.parse(req.body ?? {});
    const file = uploadedFile(req, 'file', 'configuration file or bundle zip');
    const answer = importAsRobot(
      ctx,
      currentUser(req),
      grantedAccess(req).teamId,
      { data: file.buffer, originalName: file.originalname },
      fields,
    );
    res.status(201).json(answer);
  });

  router.post('/robots/:robotId/revisions/import', requireUser, requireRobotRole(ctx, 'editor'), upload, (req, res) => {
    const fields = ImportRevisionFieldsSchema.parse(req.body ?? {});
    const file = uploadedFile(req, 'file', 'configuration file or bundle zip');
    const answer = importAsRevision(
      ctx,
      currentUser(req),
      String(req.params.robotId),
      { data: file.buffer, originalName: file.originalname },
      fields,
    );
    res.status(201).json(answer);
  });

  return router;
}
