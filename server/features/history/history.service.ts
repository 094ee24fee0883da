import type { AppContext } from '@server/config';
import { flashLog } from '@server/features/flash-log/flash-log.service';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { appendRevision, getRevision } from '@server/features/robots/robots.service';
import { HttpError } from '@server/lib/http-error';
import { filesDiff } from '@shared/history/file-diff';
import { settingChanges } from '@shared/history/setting-changes';
import type { CurrentUser } from '@shared/schemas/auth';
import type { RevisionDiff, RobotHistory } from '@shared/schemas/history';
import type { RevisionDetail } from '@shared/schemas/robots';
import type { BundleRenderer } from './bundle-renderer';
import { findStoredRevision, listStoredRevisions, revisionSummary, type StoredRevision } from './history.repository';
import { revisionFacts } from './revision-facts';

function liveRobot(ctx: AppContext, robotId: string) {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  return robot;
}

/** Every revision, newest first, with its problem count and the times it was flashed. */
export function robotHistory(ctx: AppContext, robotId: string): RobotHistory {
  const robot = liveRobot(ctx, robotId);
  const flashes = flashLog(ctx, robotId);
  const revisions = listStoredRevisions(ctx.db, robotId).map((revision) => ({
    ...revisionSummary(revision),
    problems: revisionFacts(revision).problems,
    flashes: flashes
      .filter((f) => f.revisionNumber === revision.number)
      .map(({ flashedAt, flashedByName }) => ({ flashedAt, flashedByName })),
  }));
  return { headRevision: robot.headRevision, revisions, lastFlash: flashes[0] ?? null };
}

function storedOrNotFound(ctx: AppContext, robotId: string, number: number): StoredRevision {
  const revision = findStoredRevision(ctx.db, robotId, number);
  if (!revision) throw new HttpError(404, `Revision ${number} not found`);
  return revision;
}

/** The first reason the generator gave (it lists every field it could not turn into firmware). */
function generationProblem(error: unknown): string {
  const issues = (error as { issues?: { path: (string | number)[]; message: string }[] }).issues;
  if (!Array.isArray(issues) || issues.length === 0) return (error as Error).message;
  const [first] = issues;
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  return `${first.path.join('.')}: ${first.message}${more}.`;
}

function generatedFiles(
  render: BundleRenderer | null,
  from: StoredRevision,
  to: StoredRevision,
): RevisionDiff['files'] {
  if (!render)
    return { available: false, reason: 'No firmware generator is available here, so only settings are compared.' };
  const rendered = [from, to].map((revision) => {
    try {
      return render(revisionFacts(revision).config, { revision: revision.number });
    } catch (error) {
      return `Revision ${revision.number} cannot be generated: ${generationProblem(error)}`;
    }
  });
  const [before, after] = rendered;
  if (typeof before === 'string' || typeof after === 'string') {
    return { available: false, reason: [before, after].filter((r) => typeof r === 'string').join(' ') };
  }
  const stamp = (revision: StoredRevision) => ({ revision: revision.number, hash: revisionFacts(revision).hashes[0] });
  return { available: true, ...filesDiff(before, after, { stamps: { from: stamp(from), to: stamp(to) } }) };
}

/** What changed from one revision to another: settings in words and, when possible, the generated files. */
export function revisionDiff(
  ctx: AppContext,
  robotId: string,
  from: number,
  to: number,
  render: BundleRenderer | null,
): RevisionDiff {
  liveRobot(ctx, robotId);
  const before = storedOrNotFound(ctx, robotId, from);
  const after = storedOrNotFound(ctx, robotId, to);
  return {
    from: revisionSummary(before),
    to: revisionSummary(after),
    settings: settingChanges(revisionFacts(before).config, revisionFacts(after).config),
    files: generatedFiles(render, before, after),
  };
}

export function restoreMessage(number: number, note?: string): string {
  return note ? `Restored revision ${number}: ${note}` : `Restored revision ${number}`;
}

/**
 * A new revision that copies an old one. Like a save, it must start from the head the person
 * saw; otherwise 409, and nothing is written.
 */
export function restoreRevision(
  ctx: AppContext,
  user: CurrentUser,
  robotId: string,
  number: number,
  input: { baseRevision: number; note?: string },
): RevisionDetail {
  const { number: next } = ctx.db.transaction((tx) =>
    appendRevision(
      tx,
      user,
      robotId,
      {
        baseRevision: input.baseRevision,
        message: restoreMessage(number, input.note),
        config: () => {
          const source = findStoredRevision(tx, robotId, number);
          if (!source) throw new HttpError(404, `Revision ${number} not found`);
          return revisionFacts(source).config;
        },
      },
      {
        action: 'revision.restored',
        detail: (robot, created) => ({ name: robot.name, number: created, from: number, note: input.note ?? '' }),
      },
    ),
  );
  return getRevision(ctx, robotId, next);
}
