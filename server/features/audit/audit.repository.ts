import { desc, eq } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { auditEvents, users } from '@server/db/schema';
import type { TeamActivity } from '@shared/schemas/teams';

export interface AuditEntry {
  teamId: string | null;
  actorId: string | null;
  /** Dotted verb, e.g. `user.signed_in`, `member.role_changed`, `revision.saved`. */
  action: string;
  target?: string | null;
  detail?: Record<string, unknown>;
}

export function recordEvent(db: Db, entry: AuditEntry): void {
  db.insert(auditEvents)
    .values({
      teamId: entry.teamId,
      actorId: entry.actorId,
      action: entry.action,
      target: entry.target ?? null,
      detail: JSON.stringify(entry.detail ?? {}),
    })
    .run();
}

export function listTeamEvents(db: Db, teamId: string, limit: number): TeamActivity[] {
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      actorName: users.name,
      target: auditEvents.target,
      detail: auditEvents.detail,
      createdAt: auditEvents.createdAt,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(eq(auditEvents.teamId, teamId))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit)
    .all()
    .map((row) => ({
      ...row,
      detail: JSON.parse(row.detail) as Record<string, unknown>,
      createdAt: row.createdAt.toISOString(),
    }));
}

export function listUserEvents(db: Db, actorId: string): { action: string; createdAt: Date }[] {
  return db
    .select({ action: auditEvents.action, createdAt: auditEvents.createdAt })
    .from(auditEvents)
    .where(eq(auditEvents.actorId, actorId))
    .orderBy(desc(auditEvents.id))
    .all();
}
