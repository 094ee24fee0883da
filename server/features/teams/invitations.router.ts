import { Router } from 'express';
import type { AppContext } from '@server/config';
import { currentUser, requireUser } from '@server/middleware/session';
import { grantedAccess, requireTeamRole } from '@server/middleware/team-access';
import { validateBody } from '@server/middleware/validate';
import { LinkTokenSchema } from '@shared/schemas/auth';
import { InviteMemberInputSchema } from '@shared/schemas/teams';
import {
  acceptInvitation,
  invitationDelivery,
  inviteMember,
  listInvitations,
  previewInvitation,
  revokeInvitation,
} from './invitations.service';

export function invitationsRoutes(ctx: AppContext): Router {
  const router = Router();
  const owner = requireTeamRole(ctx, 'owner');

  router.get('/teams/:teamId/invitations', requireUser, owner, (req, res) => {
    res.json({ invitations: listInvitations(ctx, grantedAccess(req).teamId), delivery: invitationDelivery(ctx) });
  });

  router.post(
    '/teams/:teamId/invitations',
    requireUser,
    owner,
    validateBody(InviteMemberInputSchema),
    async (req, res) => {
      res.status(201).json(await inviteMember(ctx, currentUser(req), grantedAccess(req).teamId, req.body));
    },
  );

  router.delete('/teams/:teamId/invitations/:invitationId', requireUser, owner, (req, res) => {
    revokeInvitation(ctx, currentUser(req), grantedAccess(req).teamId, String(req.params.invitationId));
    res.status(204).end();
  });

  // Anyone holding the link may see whom it is for, so they know which account to use.
  router.get('/invitations/:token', (req, res) => {
    const token = LinkTokenSchema.parse(req.params.token);
    res.json({ invitation: previewInvitation(ctx, token) });
  });

  router.post('/invitations/:token/accept', requireUser, (req, res) => {
    const token = LinkTokenSchema.parse(req.params.token);
    res.json(acceptInvitation(ctx, currentUser(req), token));
  });

  return router;
}
