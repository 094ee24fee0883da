import { Router } from 'express';
import type { AppContext } from '@server/config';
import { requireUser } from '@server/middleware/session';
import { grantedAccess, requireTeamRole } from '@server/middleware/team-access';
import { AuditQuerySchema } from '@shared/schemas/history';
import { listAuditLog } from './audit.repository';

/** The full audit log of a team, sign-ins of its members included: owners only. */
export function auditRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/teams/:teamId/audit', requireUser, requireTeamRole(ctx, 'owner'), (req, res) => {
    const query = AuditQuerySchema.parse(req.query);
    const events = listAuditLog(ctx.db, grantedAccess(req).teamId, query);
    res.json({ events, nextBefore: events.length === query.limit ? events[events.length - 1].id : null });
  });

  return router;
}
