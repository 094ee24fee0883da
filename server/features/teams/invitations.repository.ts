import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { invitations, teams, users } from '@server/db/schema';
import { newId } from '@server/lib/ids';
import type { PendingInvitation, Role } from '@shared/schemas/teams';

export function insertInvitation(
  db: Db,
  input: { teamId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
) {
  return db
    .insert(invitations)
    .values({ id: newId(), ...input })
    .returning()
    .get();
}

export function deleteInvitation(db: Db, id: string): void {
  db.delete(invitations).where(eq(invitations.id, id)).run();
}

/** Open invitations: not accepted, not revoked, not expired. */
const open = (now: Date) =>
  and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now));

export function listOpenInvitations(db: Db, teamId: string, now: Date): PendingInvitation[] {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      invitedByName: users.name,
      createdAt: invitations.createdAt,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.teamId, teamId), open(now)))
    .orderBy(asc(invitations.createdAt))
    .all()
    .map((row) => ({ ...row, createdAt: row.createdAt.toISOString(), expiresAt: row.expiresAt.toISOString() }));
}

export function revokeOpenInvitationsFor(db: Db, teamId: string, email: string, now: Date): void {
  db.update(invitations)
    .set({ revokedAt: now })
    .where(and(eq(invitations.teamId, teamId), eq(invitations.email, email), open(now)))
    .run();
}

export function findInvitationInTeam(db: Db, teamId: string, id: string) {
  return db
    .select()
    .from(invitations)
    .where(and(eq(invitations.teamId, teamId), eq(invitations.id, id)))
    .get();
}

export function markRevoked(db: Db, id: string, now: Date): void {
  db.update(invitations).set({ revokedAt: now }).where(eq(invitations.id, id)).run();
}

export function markAccepted(db: Db, id: string, userId: string, now: Date): void {
  db.update(invitations).set({ acceptedAt: now, acceptedBy: userId }).where(eq(invitations.id, id)).run();
}

export function findInvitationByTokenHash(db: Db, tokenHash: string) {
  return db
    .select({
      id: invitations.id,
      teamId: invitations.teamId,
      teamName: teams.name,
      email: invitations.email,
      role: invitations.role,
      invitedByName: users.name,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
    })
    .from(invitations)
    .innerJoin(teams, eq(teams.id, invitations.teamId))
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash))
    .get();
}
