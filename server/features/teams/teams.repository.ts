import { and, asc, count, eq, sql } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { memberships, teams, users } from '@server/db/schema';
import { newId } from '@server/lib/ids';
import type { Role, TeamMember, TeamSummary } from '@shared/schemas/teams';

export function findMembership(db: Db, teamId: string, userId: string): { role: Role } | undefined {
  return db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)))
    .get();
}

export function insertTeamWithOwner(db: Db, name: string, ownerId: string) {
  return db.transaction((tx) => {
    const team = tx.insert(teams).values({ id: newId(), name, createdBy: ownerId }).returning().get();
    tx.insert(memberships).values({ teamId: team.id, userId: ownerId, role: 'owner' }).run();
    return team;
  });
}

export function findTeam(db: Db, teamId: string) {
  return db.select().from(teams).where(eq(teams.id, teamId)).get();
}

export function listTeamsOf(db: Db, userId: string): TeamSummary[] {
  const memberCount = sql<number>`(select count(*) from memberships m where m.team_id = teams.id)`;
  const robotCount = sql<number>`(select count(*) from robots r where r.team_id = teams.id and r.deleted_at is null)`;
  return db
    .select({
      id: teams.id,
      name: teams.name,
      role: memberships.role,
      createdAt: teams.createdAt,
      memberCount,
      robotCount,
    })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(teams.name))
    .all()
    .map((row) => ({ ...row, createdAt: row.createdAt.toISOString() }));
}

export function listMembers(db: Db, teamId: string): TeamMember[] {
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(asc(users.name))
    .all()
    .map((row) => ({ ...row, joinedAt: row.joinedAt.toISOString() }));
}

export function countOwners(db: Db, teamId: string): number {
  const row = db
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.role, 'owner')))
    .get();
  return row?.n ?? 0;
}

export function setRole(db: Db, teamId: string, userId: string, role: Role): void {
  db.update(memberships)
    .set({ role })
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)))
    .run();
}

export function deleteMembership(db: Db, teamId: string, userId: string): void {
  db.delete(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)))
    .run();
}

export function insertMembership(db: Db, teamId: string, userId: string, role: Role): void {
  db.insert(memberships).values({ teamId, userId, role }).run();
}
