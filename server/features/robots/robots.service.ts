import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/audit/audit.repository';
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
    insertRevision(tx, { robotId: row.id, number: 1, config, message: input.message ?? 'First revision', authorId: user.id });
    recordEvent(tx, { teamId, actorId: user.id, action: 'robot.created', target: `robot:${row.id}`, detail: { name: input.name } });
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
 * Saves a new revision on top of `baseRevision`. If someone saved after that revision, nothing
 * is written and the answer is 409 with the newer head and the unsaved draft.
 */
export function saveRevision(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  input: { baseRevision: number; message: string; config: RobotConfig },
): RevisionDetail {
  const number = ctx.db.transaction((tx) => {
    const robot = findLiveRobot(tx, robotId);
    if (!robot) throw new HttpError(404, 'Robot not found');
    if (input.baseRevision !== robot.headRevision) {
      throw revisionConflict(tx, robot, input.baseRevision, { message: input.message, config: input.config });
    }
    const next = robot.headRevision + 1;
    insertRevision(tx, { robotId, number: next, config: input.config, message: input.message, authorId: user.id });
    recordEvent(tx, {
      teamId: robot.teamId,
      actorId: user.id,
      action: 'revision.saved',
      target: `robot:${robotId}`,
      detail: { name: robot.name, number: next, message: input.message },
    });
    return next;
  });
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
