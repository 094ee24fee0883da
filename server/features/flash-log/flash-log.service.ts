import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { findStoredRevision } from '@server/features/history/history.repository';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { insertFlashRow, listFlashes } from './flash-log.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { FlashEntry } from '@shared/schemas/flash-log';

// Clocks on a laptop at the bench and on the server may disagree by a little.
const CLOCK_SLACK_MS = 5 * 60_000;

function flashTime(input: { flashedAt?: string }, revisionNumber: number, savedAt: string, now: Date): Date {
  if (!input.flashedAt) return now;
  const at = new Date(input.flashedAt);
  if (at.getTime() > now.getTime() + CLOCK_SLACK_MS) {
    throw new HttpError(400, 'The flash time is in the future', {
      fields: { flashedAt: 'The flash time is in the future' },
    });
  }
  if (at.getTime() < new Date(savedAt).getTime() - CLOCK_SLACK_MS) {
    const reason = `Revision ${revisionNumber} was saved after that time, so it cannot have been flashed then`;
    throw new HttpError(400, reason, { fields: { flashedAt: reason } });
  }
  return at;
}

/** A line in the flash log: this revision went onto the robot. */
export function recordFlash(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  input: { revision: number; flashedAt?: string; note: string },
): FlashEntry {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  const revision = findStoredRevision(ctx.db, robotId, input.revision);
  if (!revision) {
    const reason = `Revision ${input.revision} does not exist; the newest is ${robot.headRevision}`;
    throw new HttpError(400, reason, { fields: { revision: reason } });
  }
  const flashedAt = flashTime(input, revision.number, revision.createdAt, new Date());
  const id = ctx.db.transaction((tx) => {
    const row = insertFlashRow(tx, {
      robotId,
      revisionNumber: revision.number,
      flashedAt,
      flashedBy: user.id,
      note: input.note,
    });
    recordEvent(tx, {
      teamId: robot.teamId,
      actorId: user.id,
      action: 'flash.recorded',
      target: `robot:${robotId}`,
      detail: { name: robot.name, number: revision.number, note: input.note, flashedAt: flashedAt.toISOString() },
    });
    return row.id;
  });
  return listFlashes(ctx.db, robotId).find((f) => f.id === id)!;
}

export function flashLog(ctx: AppContext, robotId: string): FlashEntry[] {
  return listFlashes(ctx.db, robotId);
}
