import { and, desc, eq } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { revisions, users } from '@server/db/schema';
import type { RevisionSummary } from '@shared/schemas/robots';

/** A stored revision as it is in the table: the configuration still as JSON text. */
export interface StoredRevision {
  id: number;
  number: number;
  message: string;
  authorName: string | null;
  createdAt: string;
  configText: string;
}

const storedColumns = {
  id: revisions.id,
  number: revisions.number,
  message: revisions.message,
  authorName: users.name,
  createdAt: revisions.createdAt,
  configText: revisions.config,
};

/** The revision as lists show it, without its configuration. */
export const revisionSummary = ({ number, message, authorName, createdAt }: StoredRevision): RevisionSummary => ({
  number,
  message,
  authorName,
  createdAt,
});

export function listStoredRevisions(db: Db, robotId: string): StoredRevision[] {
  return db
    .select(storedColumns)
    .from(revisions)
    .leftJoin(users, eq(users.id, revisions.authorId))
    .where(eq(revisions.robotId, robotId))
    .orderBy(desc(revisions.number))
    .all()
    .map((row) => ({ ...row, createdAt: row.createdAt.toISOString() }));
}

export function findStoredRevision(db: Db, robotId: string, number: number): StoredRevision | undefined {
  const row = db
    .select(storedColumns)
    .from(revisions)
    .leftJoin(users, eq(users.id, revisions.authorId))
    .where(and(eq(revisions.robotId, robotId), eq(revisions.number, number)))
    .get();
  return row ? { ...row, createdAt: row.createdAt.toISOString() } : undefined;
}
