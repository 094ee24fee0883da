import { and, desc, eq, like, lt, or, sql, type SQL } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { auditEvents, users } from '@server/db/schema';
import type { ActivityKind, TeamActivity } from '@shared/schemas/activity';

export interface ActivityEntry {
  teamId: string | null;
  actorId: string | null;
  /** Dotted verb, e.g. `user.signed_in`, `member.role_changed`, `revision.saved`. */
  action: string;
  target?: string | null;
  detail?: Record<string, unknown>;
}

const SIGN_IN = 'user.signed_in';

// Which actions each filter shows, by their dotted prefix.
const KIND_PREFIXES: Record<Exclude<ActivityKind, 'all' | 'sign-ins'>, string[]> = {
  people: ['team.', 'invitation.', 'member.'],
  robots: ['robot.', 'photo.'],
  revisions: ['revision.'],
  flashes: ['flash.'],
};

export function recordEvent(db: Db, entry: ActivityEntry): void {
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

/** Events with the name of whoever did them, as the team's activity lists show them. */
function selectActivity(db: Db) {
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
    .leftJoin(users, eq(users.id, auditEvents.actorId));
}

function toActivity<Row extends { detail: string; createdAt: Date }>(row: Row) {
  return { ...row, detail: JSON.parse(row.detail) as Record<string, unknown>, createdAt: row.createdAt.toISOString() };
}

function kindFilter(kind: ActivityKind): SQL | undefined {
  if (kind === 'all') return undefined;
  if (kind === 'sign-ins') return eq(auditEvents.action, SIGN_IN);
  return or(...KIND_PREFIXES[kind].map((prefix) => like(auditEvents.action, `${prefix}%`)));
}

/**
 * What was done in the team, newest first, filtered by kind and paged by id. With `signIns`
 * the members' sign-ins since they joined are included (sign-ins belong to no team, so they
 * are matched by membership); only owners see them.
 */
export function listTeamActivity(
  db: Db,
  teamId: string,
  options: { kind?: ActivityKind; before?: number; limit: number; signIns?: boolean },
): TeamActivity[] {
  const memberSignIn = and(
    sql`${auditEvents.teamId} is null`,
    eq(auditEvents.action, SIGN_IN),
    // Plain table names: drizzle may leave columns unqualified, and inside this subquery an
    // unqualified created_at would be the membership's own.
    sql`exists (select 1 from memberships m where m.team_id = ${teamId} and m.user_id = audit_events.actor_id and m.created_at <= audit_events.created_at)`,
  );
  const inTeam = options.signIns ? or(eq(auditEvents.teamId, teamId), memberSignIn) : eq(auditEvents.teamId, teamId);
  const conditions = [inTeam, kindFilter(options.kind ?? 'all')];
  if (options.before !== undefined) conditions.push(lt(auditEvents.id, options.before));
  return selectActivity(db)
    .where(and(...conditions))
    .orderBy(desc(auditEvents.id))
    .limit(options.limit)
    .all()
    .map(toActivity);
}

export function listUserEvents(db: Db, actorId: string): { action: string; createdAt: Date }[] {
  return db
    .select({ action: auditEvents.action, createdAt: auditEvents.createdAt })
    .from(auditEvents)
    .where(eq(auditEvents.actorId, actorId))
    .orderBy(desc(auditEvents.id))
    .all();
}
