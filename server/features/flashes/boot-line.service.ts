import type { AppContext } from '@server/config';
import { listStoredRevisions, type StoredRevision } from '@server/features/history/history.repository';
import { revisionFacts } from '@server/features/history/revision-facts';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import { parseBootLine, type BootLine } from '@shared/history/boot-line';
import type { BootLineAnswer, BootLineMatch } from '@shared/schemas/history';

function asMatch(revision: StoredRevision, head: number): BootLineMatch {
  return { number: revision.number, message: revision.message, createdAt: revision.createdAt, isHead: revision.number === head };
}

function verdict(line: BootLine, match: BootLineMatch | null, printed: StoredRevision | undefined, head: number, robotName: string, nameMatches: boolean): string {
  const who = line.device === 'remote' ? 'This remote' : 'This robot';
  const parts: string[] = [];
  if (!nameMatches) parts.push(`The line names “${line.robotName}”, not “${robotName}”.`);
  if (match && match.number === line.revision) parts.push(`${who} runs revision ${match.number}${match.isHead ? ', the current head.' : `; the head is revision ${head}.`}`);
  else if (match) {
    parts.push(`The line says revision ${line.revision}, but its configuration hash ${line.hash} is that of revision ${match.number}.`);
    parts.push(match.isHead ? 'That is the current head.' : `The head is revision ${head}.`);
  } else {
    parts.push(`No revision of ${robotName} has the configuration hash ${line.hash}.`);
    parts.push(
      printed
        ? `Revision ${line.revision} exists but its configuration differs: the firmware was built from unsaved changes or from another robot.`
        : `There is no revision ${line.revision}: the firmware was built for another robot or from a configuration never saved here.`,
    );
  }
  return parts.join(' ');
}

/**
 * Which revision a pasted boot line belongs to: by the configuration hash it prints, the printed
 * revision number first (a restore gives several revisions one configuration).
 */
export function lookUpBootLine(ctx: AppContext, robotId: string, pasted: string): BootLineAnswer {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  const parsed = parseBootLine(pasted);
  if (!parsed.ok) throw new HttpError(400, parsed.reason, { fields: { line: parsed.reason } });
  const { line } = parsed;
  const revisions = listStoredRevisions(ctx.db, robotId);
  const sameHash = revisions.filter((r) => revisionFacts(r).hashes.includes(line.hash));
  const printed = revisions.find((r) => r.number === line.revision);
  const found = sameHash.find((r) => r.number === line.revision) ?? sameHash[0];
  const match = found ? asMatch(found, robot.headRevision) : null;
  const configName = found ? revisionFacts(found).config.name : undefined;
  const nameMatches = line.robotName === robot.name || line.robotName === configName;
  return {
    parsed: { device: line.device, robotName: line.robotName, revision: line.revision, hash: line.hash },
    match,
    sameConfiguration: sameHash.map((r) => r.number).filter((n) => n !== match?.number).sort((a, b) => a - b),
    headRevision: robot.headRevision,
    verdict: verdict(line, match, printed, robot.headRevision, robot.name, nameMatches),
    nameMatches,
  };
}
