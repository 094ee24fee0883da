import type { AppContext } from '@server/config';
import type { Db } from '@server/db/client';
import type { RobotRow } from '@server/db/schema';
import { recordEvent } from '@server/features/activity/activity.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail, RobotDetail, RobotSummary } from '@shared/schemas/robots';
import type { Role } from '@shared/schemas/teams';
import {
  findLiveRobot,
  findRevision,
  insertRevision,
  insertRobot,
  renameRobot,
  robotSummary,
} from './robots.repository';

/** A new robot with its first revision. The configuration carries the robot's name. */
export function createRobot(
  ctx: AppContext,
  user: CurrentUser,
  teamId: string,
  input: { name: string; config: RobotConfig; message?: string },
): RobotSummary {
  const robot = ctx.db.transaction((tx) => {
    const row = insertRobot(tx, { teamId, name: input.name, createdBy: user.id });
    const config = { ...input.config, name: input.name };
    insertRevision(tx, {
      robotId: row.id,
      number: 1,
      config,
      message: input.message ?? 'First revision',
      authorId: user.id,
    });
    recordEvent(tx, {
      teamId,
      actorId: user.id,
      action: 'robot.created',
      target: `robot:${row.id}`,
      detail: { name: input.name },
    });
    return row;
  });
  return robotSummary(ctx.db, robot.id)!;
}

export function getRevision(ctx: AppContext, robotId: string, number: number): RevisionDetail {
  const revision = findRevision(ctx.db, robotId, number);
  if (!revision) throw new HttpError(404, `Revision ${number} not found`);
  return revision;
}

export function robotDetail(ctx: AppContext, robotId: string, role: Role): RobotDetail {
  const summary = robotSummary(ctx.db, robotId);
  if (!summary) throw new HttpError(404, 'Robot not found');
  return { robot: { ...summary, role }, head: getRevision(ctx, robotId, summary.headRevision) };
}

/**
 * The 409 answer when an edit started from an older revision than the head: it carries the
 * head in full (configuration included) and gives back the draft that was not saved, so the
 * person can compare both and nothing they typed is lost.
 */
export function revisionConflict(
  db: AppContext['db'],
  robot: { id: string; headRevision: number },
  baseRevision: number,
  draft: { message: string; config: RobotConfig },
): HttpError {
  const head = findRevision(db, robot.id, robot.headRevision)!;
  return new HttpError(
    409,
    `Revision ${head.number} was saved by ${head.authorName ?? 'someone'} after revision ${baseRevision}; review it before saving`,
    { code: 'revision_conflict', details: { head, draft: { baseRevision, ...draft } } },
  );
}

/**
 * Every way a revision is added on top of the head (save, restore, import), inside the caller's
 * transaction: the robot must exist, the person must have started from the head (else 409 with
 * the newer head and the unsaved draft, and nothing is written), and the activity log says what
 * happened. `config` may look at the robot (an import takes its name) or throw (a restore whose
 * source revision is missing) before the head is compared. Returns the new revision's number
 * and the robot as it was found.
 */
export function appendRevision(
  tx: Db,
  user: CurrentUser,
  robotId: string,
  draft: { baseRevision: number; message: string; config: (robot: RobotRow) => RobotConfig },
  event: { action: string; detail: (robot: RobotRow, number: number) => Record<string, unknown> },
): { number: number; robot: RobotRow } {
  const robot = findLiveRobot(tx, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  const config = draft.config(robot);
  if (draft.baseRevision !== robot.headRevision) {
    throw revisionConflict(tx, robot, draft.baseRevision, { message: draft.message, config });
  }
  const next = robot.headRevision + 1;
  insertRevision(tx, { robotId, number: next, config, message: draft.message, authorId: user.id });
  recordEvent(tx, {
    teamId: robot.teamId,
    actorId: user.id,
    action: event.action,
    target: `robot:${robotId}`,
    detail: event.detail(robot, next),
  });
  return { number: next, robot };
}

/**
 * Saves a new revision on top of `baseRevision`. If someone saved after that revision, nothing
 * is written and the answer is 409 with the newer head and the unsaved draft.
 */
export function saveRevision(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  input: { baseRevision: number; message: string; config: RobotConfig },
): RevisionDetail {
  const { number } = ctx.db.transaction((tx) =>
    appendRevision(
      tx,
      user,
      robotId,
      { baseRevision: input.baseRevision, message: input.message, config: () => input.config },
      {
        action: 'revision.saved',
        detail: (robot, next) => ({ name: robot.name, number: next, message: input.message }),
      },
    ),
  );
  return getRevision(ctx, robotId, number);
}

export function renameRobotFor(ctx: AppContext, user: CurrentUser, robotId: string, name: string): void {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  if (robot.name === name) return;
  renameRobot(ctx.db, robotId, name);
  recordEvent(ctx.db, {
    teamId: robot.teamId,
    actorId: user.id,
    action: 'robot.renamed',
    target: `robot:${robotId}`,
    detail: { from: robot.name, to: name },
  });
}
