import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { findUserByEmail } from '@server/features/auth/auth.repository';
import { HttpError } from '@server/lib/http-error';
import { hashToken, newToken } from '@server/lib/ids';
import type { CurrentUser } from '@shared/schemas/auth';
import type { InvitationDelivery, InvitationPreview, PendingInvitation, Role } from '@shared/schemas/teams';
import {
  deleteInvitation,
  findInvitationByTokenHash,
  findInvitationInTeam,
  insertInvitation,
  listOpenInvitations,
  markAccepted,
  markRevoked,
  revokeOpenInvitationsFor,
} from './invitations.repository';
import { findMembership, findTeam, insertMembership } from './teams.repository';

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (manages people and robots)',
  editor: 'an editor (changes robots and saves revisions)',
  viewer: 'a viewer (reads and downloads)',
};

/** E-mailed when the server has an outgoing mail server; otherwise passed on by the owner. */
export function invitationDelivery(ctx: AppContext): InvitationDelivery {
  return ctx.config.outgoingMail ? 'email' : 'by-hand';
}

export interface CreatedInvitation {
  invitation: PendingInvitation;
  delivery: InvitationDelivery;
  /** The one-time link, given to the owner only when it must be passed on by hand. */
  link: string | null;
}

/**
 * Invites by e-mail with a one-time link. A new invitation to the same address replaces the
 * open one. If the e-mail cannot be sent, the invitation is dropped and the owner is told.
 * Without an outgoing mail server the mail only reaches the local mailbox, so the owner gets
 * the link to pass on and a failed local delivery does not matter.
 */
export async function inviteMember(
  ctx: AppContext,
  actor: CurrentUser,
  teamId: string,
  input: { email: string; role: Role },
): Promise<CreatedInvitation> {
  const team = findTeam(ctx.db, teamId);
  if (!team) throw new HttpError(404, 'Team not found');
  const existing = findUserByEmail(ctx.db, input.email);
  if (existing && findMembership(ctx.db, teamId, existing.id)) {
    throw new HttpError(409, 'This person is already a member', {
      code: 'already_member',
      fields: { email: 'Already a member of this team' },
    });
  }
  const now = new Date();
  const token = newToken();
  const expiresAt = new Date(now.getTime() + ctx.config.invitationDays * 86_400_000);
  const invitation = ctx.db.transaction((tx) => {
    revokeOpenInvitationsFor(tx, teamId, input.email, now);
    return insertInvitation(tx, {
      teamId,
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      invitedBy: actor.id,
      expiresAt,
    });
  });
  const delivery = invitationDelivery(ctx);
  try {
    await ctx.mailer.send(
      invitationMail(ctx, { to: input.email, teamName: team.name, inviter: actor.name, role: input.role, token }),
    );
  } catch (error) {
    console.error('Invitation e-mail could not be sent:', error);
    if (delivery === 'email') {
      deleteInvitation(ctx.db, invitation.id);
      throw new HttpError(502, 'The invitation e-mail could not be sent; try again later', { code: 'mail_failed' });
    }
  }
  recordEvent(ctx.db, {
    teamId,
    actorId: actor.id,
    action: 'invitation.sent',
    target: `invitation:${invitation.id}`,
    detail: { email: input.email, role: input.role },
  });
  return {
    invitation: {
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      invitedByName: actor.name,
      createdAt: invitation.createdAt.toISOString(),
      expiresAt: invitation.expiresAt.toISOString(),
    },
    delivery,
    link: delivery === 'by-hand' ? invitationLink(ctx, token) : null,
  };
}

const invitationLink = (ctx: AppContext, token: string) => `${ctx.config.appUrl}/invitations/${token}`;

function invitationMail(
  ctx: AppContext,
  m: { to: string; teamName: string; inviter: string; role: Role; token: string },
) {
  return {
    to: m.to,
    subject: `${m.inviter} invited you to ${m.teamName} on Mixwright`,
    text: [
      'Hello,',
      '',
      `${m.inviter} invited you to join the team "${m.teamName}" on Mixwright as ${ROLE_WORDS[m.role]}.`,
      `Open this link within ${ctx.config.invitationDays} days to accept. Sign up or sign in with this e-mail address (${m.to}):`,
      '',
      invitationLink(ctx, m.token),
      '',
      'The link works once. If you were not expecting it, you can ignore this e-mail.',
    ].join('\n'),
  };
}

export function listInvitations(ctx: AppContext, teamId: string): PendingInvitation[] {
  return listOpenInvitations(ctx.db, teamId, new Date());
}

export function revokeInvitation(ctx: AppContext, actor: CurrentUser, teamId: string, invitationId: string): void {
  const invitation = findInvitationInTeam(ctx.db, teamId, invitationId);
  if (!invitation || invitation.acceptedAt || invitation.revokedAt) throw new HttpError(404, 'Invitation not found');
  markRevoked(ctx.db, invitation.id, new Date());
  recordEvent(ctx.db, {
    teamId,
    actorId: actor.id,
    action: 'invitation.revoked',
    target: `invitation:${invitation.id}`,
    detail: { email: invitation.email },
  });
}

function usableInvitation(ctx: AppContext, token: string) {
  const invitation = findInvitationByTokenHash(ctx.db, hashToken(token));
  if (!invitation) throw new HttpError(404, 'This invitation link is not valid');
  if (invitation.revokedAt) throw new HttpError(410, 'This invitation was withdrawn', { code: 'invitation_revoked' });
  if (invitation.acceptedAt) throw new HttpError(410, 'This invitation was already used', { code: 'invitation_used' });
  if (invitation.expiresAt.getTime() <= Date.now()) {
    throw new HttpError(410, 'This invitation has expired; ask for a new one', { code: 'invitation_expired' });
  }
  return invitation;
}

export function previewInvitation(ctx: AppContext, token: string): InvitationPreview {
  const invitation = usableInvitation(ctx, token);
  return {
    teamName: invitation.teamName,
    email: invitation.email,
    role: invitation.role,
    invitedByName: invitation.invitedByName,
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/**
 * Accepting needs the invited e-mail address: the link may be forwarded, but only the person
 * the owner named can join with it (see docs/decisions/002-invitations-bound-to-email.md).
 */
export function acceptInvitation(ctx: AppContext, user: CurrentUser, token: string): { teamId: string; role: Role } {
  const invitation = usableInvitation(ctx, token);
  if (invitation.email !== user.email.toLowerCase()) {
    throw new HttpError(403, `This invitation is for ${invitation.email}; sign in with that address to accept it`, {
      code: 'invitation_email_mismatch',
    });
  }
  return ctx.db.transaction((tx) => {
    const now = new Date();
    markAccepted(tx, invitation.id, user.id, now);
    const existing = findMembership(tx, invitation.teamId, user.id);
    if (existing) return { teamId: invitation.teamId, role: existing.role };
    insertMembership(tx, invitation.teamId, user.id, invitation.role);
    recordEvent(tx, {
      teamId: invitation.teamId,
      actorId: user.id,
      action: 'invitation.accepted',
      target: `invitation:${invitation.id}`,
      detail: { role: invitation.role },
    });
    return { teamId: invitation.teamId, role: invitation.role };
  });
}
