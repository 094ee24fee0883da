import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/audit/audit.repository';
import { findLiveRobot, robotSummary } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { BinnedRobot } from '@shared/schemas/history';
import type { RobotSummary } from '@shared/schemas/robots';
import { clearDeleted, findDeletedRobot, listDeletedSince, markDeleted } from './robot-bin.repository';

/** How long a deleted robot can still be restored. */
export const BIN_DAYS = 30;
const BIN_MS = BIN_DAYS * 86_400_000;

/** Moves a robot to the bin: hidden everywhere, its revisions kept, restorable for 30 days. */
export function deleteRobot(ctx: AppContext, user: CurrentUser, robotId: string, now = new Date()): void {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  ctx.db.transaction((tx) => {
    markDeleted(tx, robotId, user.id, now);
    recordEvent(tx, { teamId: robot.teamId, actorId: user.id, action: 'robot.deleted', target: `robot:${robotId}`, detail: { name: robot.name } });
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
export function restoreRobot(ctx: AppContext, user: CurrentUser, teamId: string, robotId: string, now = new Date()): RobotSummary {
  const robot = findDeletedRobot(ctx.db, teamId, robotId);
  if (!robot) throw new HttpError(404, 'No deleted robot with that id in this team');
  if (now.getTime() - robot.deletedAt!.getTime() > BIN_MS) {
    throw new HttpError(410, `${robot.name} was deleted more than ${BIN_DAYS} days ago and can no longer be restored`, { code: 'bin_expired' });
  }
  ctx.db.transaction((tx) => {
    clearDeleted(tx, robotId);
    recordEvent(tx, { teamId, actorId: user.id, action: 'robot.restored', target: `robot:${robotId}`, detail: { name: robot.name } });
  });
  return robotSummary(ctx.db, robotId)!;
}
