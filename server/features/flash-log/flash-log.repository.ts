import { desc, eq } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { flashes, users } from '@server/db/schema';
import type { FlashEntry } from '@shared/schemas/flash-log';

export function insertFlashRow(
  db: Db,
  input: { robotId: string; revisionNumber: number; flashedAt: Date; flashedBy: string; note: string },
): { id: number } {
  return db.insert(flashes).values(input).returning({ id: flashes.id }).get();
}

/** The robot's flash log, newest first. */
export function listFlashes(db: Db, robotId: string): FlashEntry[] {
  return db
    .select({
      id: flashes.id,
      revisionNumber: flashes.revisionNumber,
      flashedAt: flashes.flashedAt,
      flashedByName: users.name,
      note: flashes.note,
      createdAt: flashes.createdAt,
    })
    .from(flashes)
    .leftJoin(users, eq(users.id, flashes.flashedBy))
    .where(eq(flashes.robotId, robotId))
    .orderBy(desc(flashes.flashedAt), desc(flashes.id))
    .all()
    .map((row) => ({ ...row, flashedAt: row.flashedAt.toISOString(), createdAt: row.createdAt.toISOString() }));
}
