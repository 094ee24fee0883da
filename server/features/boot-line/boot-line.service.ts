import type { AppContext } from '@server/config';
import { listStoredRevisions, type StoredRevision } from '@server/features/history/history.repository';
import { revisionFacts } from '@server/features/history/revision-facts';
import { findLiveRobot, listTeamRobots } from '@server/features/robots/robots.repository';
import { HttpError } from '@server/lib/http-error';
import { parseBootLine, type BootLine } from '@shared/boot-line/boot-line';
import type { BootLineAnswer, BootLineMatch, TeamBootLineAnswer } from '@shared/schemas/boot-line';

function asMatch(revision: StoredRevision, head: number): BootLineMatch {
  return {
    number: revision.number,
    message: revision.message,
    createdAt: revision.createdAt,
    isHead: revision.number === head,
  };
}

function verdict(
  line: BootLine,
  match: BootLineMatch | null,
  printed: StoredRevision | undefined,
  head: number,
  robotName: string,
  nameMatches: boolean,
): string {
  const who = line.device === 'remote' ? 'This remote' : 'This robot';
  const parts: string[] = [];
  if (!nameMatches) parts.push(`The line names “${line.robotName}”, not “${robotName}”.`);
  if (match && match.number === line.revision)
    parts.push(
      `${who} runs revision ${match.number}${match.isHead ? ', the current head.' : `; the head is revision ${head}.`}`,
    );
  else if (match) {
    parts.push(
      `The line says revision ${line.revision}, but its configuration hash ${line.hash} is that of revision ${match.number}.`,
    );
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

/** The boot line in a pasted text, or a 400 naming the `line` field. */
function readBootLine(pasted: string): BootLine {
  const parsed = parseBootLine(pasted);
  if (!parsed.ok) throw new HttpError(400, parsed.reason, { fields: { line: parsed.reason } });
  return parsed.line;
}

/** The revisions firmware printing this hash may have been built from. */
function revisionsWithHash(revisions: StoredRevision[], hash: string): StoredRevision[] {
  return revisions.filter((r) => revisionFacts(r).hashes.includes(hash));
}

type LookedUpRobot = { id: string; name: string; headRevision: number };

/**
 * Which of one robot's revisions a boot line belongs to: by the configuration hash it prints,
 * the printed revision number first (a restore gives several revisions one configuration).
 */
function answerFor(robot: LookedUpRobot, line: BootLine, revisions: StoredRevision[]): BootLineAnswer {
  const sameHash = revisionsWithHash(revisions, line.hash);
  const printed = revisions.find((r) => r.number === line.revision);
  const found = sameHash.find((r) => r.number === line.revision) ?? sameHash[0];
  const match = found ? asMatch(found, robot.headRevision) : null;
  const configName = found ? revisionFacts(found).config.name : undefined;
  const nameMatches = line.robotName === robot.name || line.robotName === configName;
  return {
    parsed: { device: line.device, robotName: line.robotName, revision: line.revision, hash: line.hash },
    match,
    sameConfiguration: sameHash
      .map((r) => r.number)
      .filter((n) => n !== match?.number)
      .sort((a, b) => a - b),
    headRevision: robot.headRevision,
    verdict: verdict(line, match, printed, robot.headRevision, robot.name, nameMatches),
    nameMatches,
  };
}

/** Which revision of this robot a pasted boot line belongs to. */
export function lookUpBootLine(ctx: AppContext, robotId: string, pasted: string): BootLineAnswer {
  const robot = findLiveRobot(ctx.db, robotId);
  if (!robot) throw new HttpError(404, 'Robot not found');
  return answerFor(robot, readBootLine(pasted), listStoredRevisions(ctx.db, robotId));
}

type Candidate = { robot: LookedUpRobot; revisions: StoredRevision[] };

/**
 * Among robots holding the printed hash (a copied robot shares one configuration), the one
 * whose name is printed, then the one whose printed revision number has that hash.
 */
function bestByHash(withHash: Candidate[], line: BootLine): Candidate | undefined {
  const rank = ({ robot, revisions }: Candidate) =>
    (robot.name === line.robotName ? 2 : 0) +
    (revisionsWithHash(revisions, line.hash).some((r) => r.number === line.revision) ? 1 : 0);
  return [...withHash].sort((a, b) => rank(b) - rank(a))[0];
}

/** The printed name, exactly or else ignoring case and surrounding spaces (a renamed robot). */
function byName(candidates: Candidate[], name: string): Candidate | undefined {
  const loose = (text: string) => text.trim().toLowerCase();
  return candidates.find((c) => c.robot.name === name) ?? candidates.find((c) => loose(c.robot.name) === loose(name));
}

const robotRef = ({ id, name }: LookedUpRobot) => ({ id, name });

/**
 * Which of the team's live robots a pasted boot line belongs to: by the configuration hash
 * first, since names are often reused, then by the printed robot name.
 */
export function lookUpTeamBootLine(ctx: AppContext, teamId: string, pasted: string): TeamBootLineAnswer {
  const line = readBootLine(pasted);
  const candidates = listTeamRobots(ctx.db, teamId).map((robot) => ({
    robot,
    revisions: listStoredRevisions(ctx.db, robot.id),
  }));
  const withHash = candidates.filter((c) => revisionsWithHash(c.revisions, line.hash).length > 0);
  const hashed = bestByHash(withHash, line);
  const found = hashed ?? byName(candidates, line.robotName);
  const parsed = { device: line.device, robotName: line.robotName, revision: line.revision, hash: line.hash };
  if (!found) {
    return {
      parsed,
      robot: null,
      foundBy: null,
      answer: null,
      otherRobots: [],
      verdict: `No robot in this team matches: no revision has the configuration hash ${line.hash} and no robot is called “${line.robotName}”.`,
    };
  }
  return {
    parsed,
    robot: robotRef(found.robot),
    foundBy: hashed ? 'hash' : 'name',
    answer: answerFor(found.robot, line, found.revisions),
    otherRobots: withHash.filter((c) => c !== found).map((c) => robotRef(c.robot)),
    verdict: hashed
      ? `This is ${found.robot.name}: one of its revisions has the configuration hash ${line.hash}.`
      : `No revision in this team has the configuration hash ${line.hash}; by the printed name this is ${found.robot.name}.`,
  };
}
