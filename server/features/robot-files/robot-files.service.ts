import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { findStoredRevision } from '@server/features/history/history.repository';
import { revisionFacts } from '@server/features/history/revision-facts';
import { findLiveRobot, insertRevision, insertRobot, robotSummary } from '@server/features/robots/robots.repository';
import { appendRevision } from '@server/features/robots/robots.service';
import { HttpError } from '@server/lib/http-error';
import { zodFields, zodMessage } from '@server/middleware/error-handler';
import { configFileName } from '@shared/history/file-names';
import type { CurrentUser } from '@shared/schemas/auth';
import type { ImportAnswer } from '@shared/schemas/robot-files';
import { ConfigVersionError, migrateConfigWithNotes } from '@shared/schemas/migrate-config';
import {
  CURRENT_SCHEMA_VERSION,
  RobotConfigSchema,
  RobotNameSchema,
  type RobotConfig,
} from '@shared/schemas/robot-config';
import type { RobotSummary } from '@shared/schemas/robots';
import { readImportFile } from './import-file';

export interface UploadedFile {
  data: Buffer;
  /** The name the browser sent; only shown in messages, never used as a path. */
  originalName: string;
}

interface ReadConfig {
  config: RobotConfig;
  fromVersion: number;
  notes: string[];
}

/** A file name fit for a message: no folders, no control characters, not endless. */
export function displayName(originalName: string): string {
  const base = originalName.split(/[\\/]/).pop() ?? '';
  return base.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 100) || 'the uploaded file';
}

/** The configuration in an uploaded JSON file or bundle zip, migrated and validated; throws 400 naming the field. */
export function readUploadedConfig(file: UploadedFile): ReadConfig {
  const { json, kind } = readImportFile(file.data);
  let migrated;
  try {
    migrated = migrateConfigWithNotes(json);
  } catch (error) {
    if (!(error instanceof ConfigVersionError)) throw error;
    throw new HttpError(400, error.message, {
      code: 'import_rejected',
      fields: { 'config.schemaVersion': error.message },
    });
  }
  const result = RobotConfigSchema.safeParse(migrated.json);
  if (!result.success) {
    const fields = zodFields(result.error, ['config']);
    throw new HttpError(400, `The file is not a valid configuration: ${zodMessage(fields)}`, {
      code: 'import_rejected',
      fields,
    });
  }
  const notes = [
    ...(kind === 'bundle' ? ['Read config.json from the firmware bundle.'] : []),
    ...(migrated.fromVersion < CURRENT_SCHEMA_VERSION
      ? [`Converted from schema version ${migrated.fromVersion} to ${CURRENT_SCHEMA_VERSION}.`]
      : []),
    ...migrated.notes,
  ];
  return { config: result.data, fromVersion: migrated.fromVersion, notes };
}

function robotName(requested: string | undefined, config: RobotConfig): string {
  if (!requested) return config.name;
  const result = RobotNameSchema.safeParse(requested);
  if (!result.success)
    throw new HttpError(400, result.error.issues[0].message, { fields: { name: result.error.issues[0].message } });
  return result.data;
}

/** A new robot whose first revision is the uploaded configuration. Nothing is written if the file is refused. */
export function importAsRobot(
  ctx: AppContext,
  user: CurrentUser,
  teamId: string,
  file: UploadedFile,
  fields: { name?: string; message?: string },
): ImportAnswer & { robot: RobotSummary } {
  const read = readUploadedConfig(file);
  const name = robotName(fields.name, read.config);
  const fileName = displayName(file.originalName);
  const message = fields.message || `Imported from ${fileName}`;
  const robotId = ctx.db.transaction((tx) => {
    const row = insertRobot(tx, { teamId, name, createdBy: user.id });
    insertRevision(tx, { robotId: row.id, number: 1, config: { ...read.config, name }, message, authorId: user.id });
    recordEvent(tx, {
      teamId,
      actorId: user.id,
      action: 'robot.imported',
      target: `robot:${row.id}`,
      detail: { name, file: fileName, fromVersion: read.fromVersion },
    });
    return row.id;
  });
  const notes =
    name === read.config.name
      ? read.notes
      : [...read.notes, `The robot is named “${name}”; the file called it “${read.config.name}”.`];
  return { robot: robotSummary(ctx.db, robotId)!, robotId, revision: 1, fromVersion: read.fromVersion, notes };
}

/** The uploaded configuration as the next revision, on top of the head the person saw (else 409). */
export function importAsRevision(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  file: UploadedFile,
  fields: { baseRevision: number; message?: string },
): ImportAnswer {
  const read = readUploadedConfig(file);
  const fileName = displayName(file.originalName);
  const message = fields.message || `Imported from ${fileName}`;
  const { number, robot } = ctx.db.transaction((tx) =>
    appendRevision(
      tx,
      user,
      robotId,
      {
        baseRevision: fields.baseRevision,
        message,
        // The revision belongs to this robot, whatever the file called it.
        config: (found) => ({ ...read.config, name: found.name }),
      },
      {
        action: 'revision.imported',
        detail: (robot, next) => ({ name: robot.name, number: next, file: fileName, fromVersion: read.fromVersion }),
      },
    ),
  );
  const notes =
    robot.name === read.config.name
      ? read.notes
      : [...read.notes, `The file's robot name “${read.config.name}” became “${robot.name}”.`];
  return { robotId, revision: number, fromVersion: read.fromVersion, notes };
}

/** A revision's configuration as a download: the same JSON a firmware bundle carries as config.json. */
export function exportRevision(ctx: AppContext, robotId: string, number: number): { fileName: string; body: string } {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  const revision = findStoredRevision(ctx.db, robotId, number);
  if (!revision) throw new HttpError(404, `Revision ${number} not found`);
  const { config } = revisionFacts(revision);
  return { fileName: configFileName(robot.name, number), body: `${JSON.stringify(config, null, 2)}\n` };
}
