import { resolve } from 'node:path';
import { Router } from 'express';
import type { AppContext } from '@server/config';
import { HttpError } from '@server/lib/http-error';
import { currentUser, requireUser } from '@server/middleware/session';
import { requireRobotRole } from '@server/middleware/team-access';
import { singleUpload, uploadedFile } from '@server/middleware/upload';
import { PHOTO_MAX_BYTES } from './photo-store';
import { photoFile, removePhoto, uploadPhoto } from './photos.service';

export function photosRoutes(ctx: AppContext): Router {
  const router = Router();
  const upload = singleUpload('photo', { maxBytes: PHOTO_MAX_BYTES, what: 'photo' });

  // Non-members get 404 from the access check, so a photo address reveals nothing.
  router.get('/robots/:robotId/photo', requireUser, requireRobotRole(ctx, 'viewer'), (req, res, next) => {
    const { path, mimeType } = photoFile(ctx, String(req.params.robotId));
    res.set('Cache-Control', 'private, max-age=300');
    res.set('Content-Security-Policy', "default-src 'none'; sandbox");
    res.type(mimeType).sendFile(resolve(path), { dotfiles: 'deny' }, (error) => {
      if (!error || res.headersSent) return;
      const missing = (error as { status?: number }).status === 404;
      next(missing ? new HttpError(404, 'The photo file is missing on the server; upload it again') : error);
    });
  });

  router.put('/robots/:robotId/photo', requireUser, requireRobotRole(ctx, 'editor'), upload, async (req, res) => {
    const file = uploadedFile(req, 'photo', 'photo');
    res.json({ robot: await uploadPhoto(ctx, currentUser(req), String(req.params.robotId), file.buffer) });
  });

  router.delete('/robots/:robotId/photo', requireUser, requireRobotRole(ctx, 'editor'), async (req, res) => {
    await removePhoto(ctx, currentUser(req), String(req.params.robotId));
    res.status(204).end();
  });

  return router;
}
