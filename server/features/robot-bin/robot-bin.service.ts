import type { AppContext } from '@server/config';
import type { Db } from '@server/db/client';
import { recordEvent } from '@server/features/activity/activity.repository';
import { removePhotoFile } from '@server/features/photos/photo-store';
import { findLiveRobot, robotSummary } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { BinnedRobot } from '@shared/schemas/robot-bin';
import type { RobotSummary } from '@shared/schemas/robots';
import {
  clearDeleted,
  findDeletedRobot,
  listDeletedBefore,
  listDeletedSince,
  markDeleted,
  removeRobot,
} from './robot-bin.repository';

/** How long a deleted robot can still be restored. */
export const BIN_DAYS = 30;
const BIN_MS = BIN_DAYS * 86_400_000;

/** Moves a robot to the bin: hidden everywhere, its revisions kept, restorable for 30 days. */
export function deleteRobot(ctx: AppContext, user: CurrentUser, robotId: string, now = new Date()): void {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  ctx.db.transaction((tx) => {
    markDeleted(tx, robotId, user.id, now);
    recordEvent(tx, {
      teamId: robot.teamId,
      actorId: user.id,
      action: 'robot.deleted',
      target: `robot:${robotId}`,
      detail: { name: robot.name },
    });
  });
}

export function listBin(ctx: AppContext, teamId: string, now = new Date()): BinnedRobot[] {
  return listDeletedSince(ctx.db, teamId, new Date(now.getTime() - BIN_MS)).map((row) => ({
    id: row.id,
    name: row.name,
    headRevision: row.headRevision,
    deletedAt: row.deletedAt!.toISOString(),
    deletedByName: row.deletedByName,
    restorableUntil: new Date(row.deletedAt!.getTime() + BIN_MS).toISOString(),
  }));
}

/** Brings a deleted robot back while it is within its 30 days; after that the answer is 410. */
export function restoreRobot(
  ctx: AppContext,
  user: CurrentUser,
  teamId: string,
  robotId: string,
  now = new Date(),
): RobotSummary {
  const robot = findDeletedRobot(ctx.db, teamId, robotId);
  if (!robot) throw new HttpError(404, 'No deleted robot with that id in this team');
  if (now.getTime() - robot.deletedAt!.getTime() > BIN_MS) {
    throw new HttpError(410, `${robot.name} was deleted more than ${BIN_DAYS} days ago and can no longer be restored`, {
      code: 'bin_expired',
    });
  }
  ctx.db.transaction((tx) => {
    clearDeleted(tx, robotId);
    recordEvent(tx, {
      teamId,
      actorId: user.id,
      action: 'robot.restored',
      target: `robot:${robotId}`,
      detail: { name: robot.name },
    });
  });
  return robotSummary(ctx.db, robotId)!;
}

/**
 * Empties the bin of robots whose 30 days have passed: the robot, its revisions, flash log and
 * photo are removed for good, and the team's activity log keeps a line saying so. Returns how many.
 */
export async function purgeExpiredRobots(db: Db, dataDir: string, now = new Date()): Promise<number> {
  const expired = listDeletedBefore(db, new Date(now.getTime() - BIN_MS));
  for (const robot of expired) {
    db.transaction((tx) => {
      removeRobot(tx, robot.id);
      recordEvent(tx, {
        teamId: robot.teamId,
        actorId: null,
        action: 'robot.purged',
        target: `robot:${robot.id}`,
        detail: { name: robot.name, afterDays: BIN_DAYS },
      });
    });
    // The file goes after the row, so a failed removal leaves an orphan file, never a dangling row.
    if (robot.photoFileName) await removePhotoFile(dataDir, robot.photoFileName);
  }
  return expired.length;
}
