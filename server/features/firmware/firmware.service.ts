import { getRevision } from '@server/features/robots/robots.service';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import type { AppContext } from '@server/config';
import { HttpError } from '@server/lib/http-error';
import type { FirmwareFile, FirmwareFileLanguage, FirmwareFiles, VerifyResult } from '@shared/schemas/firmware';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { formatBootLine } from '@shared/boot-line/boot-line';
import { createBundleCache } from './bundle-cache';
import { FIRMWARE_GENERATOR_VERSION } from './generator-version';
import { FirmwareConfigError } from './model/firmware-config-error';
import { configHash } from './model/config-hash';
import { renderBundle, type BundleFile } from './render-bundle';
import { remoteFolderName, sketchFolderName } from './sketch-name';
import { bundleHash, cachedVerifyResult, verifyBundle } from './verify-bundle';
import { createCompileQueue, QueueFullError, QueueShareError, type CompileQueue } from './verify-queue';
import { bundleFileName, zipBundle } from './zip-bundle';

export interface VerifySettings {
  /** Time limit for each compiler, linker or size step. */
  stepTimeoutMs: number;
  queue: CompileQueue;
}

/** One compile at a time in this process; six may wait, two per person and four per team. */
export const defaultVerifySettings: VerifySettings = {
  stepTimeoutMs: 60_000,
  queue: createCompileQueue({ maxPending: 6, perPerson: 2, perTeam: 4 }),
};

/** Who asks for a compile check: places in the queue are shared out per person and per team. */
export interface VerifyRequester {
  userId: string;
  teamId: string;
}

function languageOf(path: string): FirmwareFileLanguage {
  if (/\.(ino|h|c|cpp)$/.test(path)) return 'cpp';
  if (path.endsWith('.json')) return 'json';
  if (path.endsWith('.md')) return 'markdown';
  return 'text';
}

/** The 422 answer naming every field that stops generation, dotted and as exact paths. */
function blockedError(error: FirmwareConfigError): HttpError {
  const fields = Object.fromEntries(error.issues.map((i) => [i.path.join('.'), i.message]));
  const [first] = error.issues;
  const more = error.issues.length > 1 ? ` (and ${error.issues.length - 1} more)` : '';
  return new HttpError(422, `The firmware cannot be generated: ${first.message}${more}`, {
    code: 'firmware_blocked',
    fields,
    details: { issues: error.issues },
  });
}

function render(config: RobotConfig, revision: number): BundleFile[] {
  try {
    return renderBundle(config, { revision });
  } catch (error) {
    if (error instanceof FirmwareConfigError) throw blockedError(error);
    throw error;
  }
}

function filesView(config: RobotConfig, revision: number, draft: boolean): FirmwareFiles {
  const files = render(config, revision);
  const sketchFolder = sketchFolderName(config.name, config.firmware.sketchName);
  const remoteFolder = remoteFolderName(sketchFolder);
  return {
    robotName: config.name,
    revision,
    draft,
    hash: configHash(config),
    sketchFolder,
    remoteFolder: files.some((f) => f.path.startsWith(`${remoteFolder}/`)) ? remoteFolder : null,
    bootLine: formatBootLine(config, revision, FIRMWARE_GENERATOR_VERSION),
    files: files.map((f): FirmwareFile => ({
      ...f,
      size: Buffer.byteLength(f.content, 'utf8'),
      language: languageOf(f.path),
    })),
  };
}

/** The saved revision's bundle as files, for the preview. */
export function revisionFiles(ctx: AppContext, robotId: string, number: number): FirmwareFiles {
  return filesView(getRevision(ctx, robotId, number).config, number, false);
}

/** An unsaved draft's bundle, numbered as the revision it becomes when saved next. */
export function draftFiles(ctx: AppContext, robotId: string, config: RobotConfig): FirmwareFiles {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  return filesView(config, robot.headRevision + 1, true);
}

/** About 50 KB each: a couple of hundred bundles is a few megabytes. */
const zipCache = createBundleCache<{ fileName: string; zip: Buffer }>(200);

/**
 * The saved revision's bundle as a zip, with its download name (`greenhouse-cart-r7.zip`).
 * Rendered once per robot, revision and generator version: revisions never change.
 */
export function revisionZip(
  ctx: AppContext,
  robotId: string,
  number: number,
): Promise<{ fileName: string; zip: Buffer }> {
  const key = { robotId, revision: number, generatorVersion: FIRMWARE_GENERATOR_VERSION };
  return zipCache.get(key, async () => {
    const { config } = getRevision(ctx, robotId, number);
    const zip = await zipBundle(render(config, number));
    return { fileName: bundleFileName(config.name, number), zip };
  });
}

/**
 * Compiles the saved revision's generated sketches where this server has a compiler. A bundle
 * checked before (or being checked) answers from the cache; a new one waits its turn in the
 * queue, where an equal bundle already waiting is joined rather than queued twice.
 */
export async function verifyRevision(
  ctx: AppContext,
  requester: VerifyRequester,
  robotId: string,
  number: number,
  settings: VerifySettings = defaultVerifySettings,
): Promise<VerifyResult> {
  const files = render(getRevision(ctx, robotId, number).config, number);
  const cached = cachedVerifyResult(files);
  if (cached) return cached;
  try {
    return await settings.queue.run({
      key: bundleHash(files),
      person: requester.userId,
      team: requester.teamId,
      job: () => verifyBundle(files, { timeoutMs: settings.stepTimeoutMs }),
    });
  } catch (error) {
    if (error instanceof QueueFullError) {
      throw new HttpError(503, 'The compile check is busy with other bundles; try again in a minute', {
        code: 'verify_busy',
      });
    }
    if (error instanceof QueueShareError) {
      const whose = error.who === 'person' ? 'You already have' : 'Your team already has';
      throw new HttpError(429, `${whose} ${error.limit} compile checks waiting; try again when one has finished`, {
        code: 'verify_share_used',
      });
    }
    throw error;
  }
}
