import { join } from 'node:path';
import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { findLiveRobot, robotSummary } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { RobotSummary } from '@shared/schemas/robots';
import { photosFolder, preparePhoto, removePhotoFile, storePhoto } from './photo-store';
import { deletePhoto, findPhoto, upsertPhoto } from './photos.repository';

function liveRobot(ctx: AppContext, robotId: string) {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  return robot;
}

/** Stores a new photo for the robot, replacing the old one: only the re-encoded picture is kept. */
export async function uploadPhoto(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  data: Buffer,
): Promise<RobotSummary> {
  const robot = liveRobot(ctx, robotId);
  const photo = await preparePhoto(data);
  const previous = findPhoto(ctx.db, robotId);
  const fileName = await storePhoto(ctx.config.dataDir, photo.data, photo.type);
  try {
    ctx.db.transaction((tx) => {
      upsertPhoto(tx, { robotId, fileName, mimeType: photo.type, bytes: photo.data.length, uploadedBy: user.id });
      recordEvent(tx, {
        teamId: robot.teamId,
        actorId: user.id,
        action: 'photo.uploaded',
        target: `robot:${robotId}`,
        detail: { name: robot.name },
      });
    });
  } catch (error) {
    await removePhotoFile(ctx.config.dataDir, fileName);
    throw error;
  }
  if (previous) await removePhotoFile(ctx.config.dataDir, previous.fileName);
  return robotSummary(ctx.db, robotId)!;
}

/** Where the robot's photo file is, for team members only (the route checks membership). */
export function photoFile(ctx: AppContext, robotId: string): { path: string; mimeType: string } {
  liveRobot(ctx, robotId);
  const photo = findPhoto(ctx.db, robotId);
  if (!photo) throw new HttpError(404, 'This robot has no photo');
  return { path: join(photosFolder(ctx.config.dataDir), photo.fileName), mimeType: photo.mimeType };
}

export async function removePhoto(ctx: AppContext, user: CurrentUser, robotId: string): Promise<void> {
  const robot = liveRobot(ctx, robotId);
  const photo = findPhoto(ctx.db, robotId);
  if (!photo) throw new HttpError(404, 'This robot has no photo');
  ctx.db.transaction((tx) => {
    deletePhoto(tx, robotId);
    recordEvent(tx, {
      teamId: robot.teamId,
      actorId: user.id,
      action: 'photo.removed',
      target: `robot:${robotId}`,
      detail: { name: robot.name },
    });
  });
  await removePhotoFile(ctx.config.dataDir, photo.fileName);
}
