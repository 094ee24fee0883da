import { and, desc, eq, gt, isNotNull, lte } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { robotPhotos, robots, users } from '@server/db/schema';

export function markDeleted(db: Db, robotId: string, by: string, at: Date): void {
  db.update(robots).set({ deletedAt: at, deletedBy: by }).where(eq(robots.id, robotId)).run();
}

export function clearDeleted(db: Db, robotId: string): void {
  db.update(robots).set({ deletedAt: null, deletedBy: null }).where(eq(robots.id, robotId)).run();
}

export function findDeletedRobot(db: Db, teamId: string, robotId: string) {
  return db
    .select()
    .from(robots)
    .where(and(eq(robots.id, robotId), eq(robots.teamId, teamId), isNotNull(robots.deletedAt)))
    .get();
}

/** The team's robots deleted after `since`, newest deletion first. */
export function listDeletedSince(db: Db, teamId: string, since: Date) {
  return db
    .select({
      id: robots.id,
      name: robots.name,
      headRevision: robots.headRevision,
      deletedAt: robots.deletedAt,
      deletedByName: users.name,
    })
    .from(robots)
    .leftJoin(users, eq(users.id, robots.deletedBy))
    .where(and(eq(robots.teamId, teamId), gt(robots.deletedAt, since)))
    .orderBy(desc(robots.deletedAt))
    .all();
}

/** Robots deleted at or before `cutoff`, with the photo file each may still have on disk. */
export function listDeletedBefore(db: Db, cutoff: Date) {
  return db
    .select({ id: robots.id, teamId: robots.teamId, name: robots.name, photoFileName: robotPhotos.fileName })
    .from(robots)
    .leftJoin(robotPhotos, eq(robotPhotos.robotId, robots.id))
    .where(lte(robots.deletedAt, cutoff))
    .all();
}

/** Removes the robot row; its revisions, flash log and photo row go with it (ON DELETE CASCADE). */
export function removeRobot(db: Db, robotId: string): void {
  db.delete(robots).where(eq(robots.id, robotId)).run();
}
