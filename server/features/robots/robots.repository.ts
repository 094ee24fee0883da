import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { flashes, revisions, robots, teams } from '@server/db/schema';
import { findStoredRevision, listStoredRevisions, revisionSummary } from '@server/features/history/history.repository';
import { newId } from '@server/lib/ids';
import { parseAnyVersion } from '@shared/schemas/migrate-config';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionSummary, RobotSummary } from '@shared/schemas/robots';

export function findLiveRobot(db: Db, robotId: string) {
  return db
    .select()
    .from(robots)
    .where(and(eq(robots.id, robotId), isNull(robots.deletedAt)))
    .get();
}

// Written with plain table names: drizzle leaves columns unqualified in one-table queries, and an
// unqualified "id" inside these subqueries would mean the inner table's id.
const updatedAt = sql<number>`(select max(v.created_at) from revisions v where v.robot_id = robots.id)`;
const lastFlash = sql<string | null>`(select json_object('revisionNumber', f.revision_number, 'flashedAt', f.flashed_at)
  from flashes f where f.robot_id = robots.id order by f.flashed_at desc, f.id desc limit 1)`;

const photoAt = sql<number | null>`(select p.created_at from robot_photos p where p.robot_id = robots.id)`;

const summaryColumns = {
  id: robots.id,
  teamId: robots.teamId,
  name: robots.name,
  createdAt: robots.createdAt,
  headRevision: robots.headRevision,
  updatedAt,
  lastFlash,
  photoAt,
};

type SummaryRow = {
  createdAt: Date;
  updatedAt: number | null;
  lastFlash: string | null;
  photoAt: number | null;
} & Omit<RobotSummary, 'createdAt' | 'updatedAt' | 'lastFlash' | 'photoUrl'>;

function toSummary({ photoAt, ...row }: SummaryRow): RobotSummary {
  const flash = row.lastFlash ? (JSON.parse(row.lastFlash) as { revisionNumber: number; flashedAt: number }) : null;
  return {
    ...row,
    // The upload time in the address makes browsers fetch a replaced photo afresh.
    photoUrl: photoAt === null ? null : `/api/robots/${row.id}/photo?v=${photoAt}`,
    createdAt: row.createdAt.toISOString(),
    updatedAt: new Date(row.updatedAt ?? row.createdAt.getTime()).toISOString(),
    lastFlash: flash
      ? { revisionNumber: flash.revisionNumber, flashedAt: new Date(flash.flashedAt).toISOString() }
      : null,
  };
}

export function listTeamRobots(db: Db, teamId: string): RobotSummary[] {
  return db
    .select(summaryColumns)
    .from(robots)
    .where(and(eq(robots.teamId, teamId), isNull(robots.deletedAt)))
    .orderBy(asc(robots.name))
    .all()
    .map(toSummary);
}

export function robotSummary(db: Db, robotId: string): (RobotSummary & { teamName: string }) | undefined {
  const row = db
    .select({ ...summaryColumns, teamName: teams.name })
    .from(robots)
    .innerJoin(teams, eq(teams.id, robots.teamId))
    .where(and(eq(robots.id, robotId), isNull(robots.deletedAt)))
    .get();
  return row ? { ...toSummary(row), teamName: row.teamName } : undefined;
}

export function insertRobot(db: Db, input: { teamId: string; name: string; createdBy: string }) {
  return db
    .insert(robots)
    .values({ id: newId(), ...input })
    .returning()
    .get();
}

export function renameRobot(db: Db, robotId: string, name: string): void {
  db.update(robots).set({ name }).where(eq(robots.id, robotId)).run();
}

export function insertRevision(
  db: Db,
  input: { robotId: string; number: number; config: RobotConfig; message: string; authorId: string },
): void {
  db.insert(revisions)
    .values({ ...input, config: JSON.stringify(input.config) })
    .run();
  db.update(robots).set({ headRevision: input.number }).where(eq(robots.id, input.robotId)).run();
}

export function listRevisions(db: Db, robotId: string): RevisionSummary[] {
  return listStoredRevisions(db, robotId).map(revisionSummary);
}

export function findRevision(db: Db, robotId: string, number: number) {
  const stored = findStoredRevision(db, robotId, number);
  return stored ? { ...revisionSummary(stored), config: parseAnyVersion(JSON.parse(stored.configText)) } : undefined;
}

export function insertFlash(
  db: Db,
  input: { robotId: string; revisionNumber: number; flashedAt: Date; flashedBy: string; note: string },
): void {
  db.insert(flashes).values(input).run();
}
