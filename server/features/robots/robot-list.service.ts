import type { AppContext } from '@server/config';
import { robotProblems } from '@shared/problems/robot-problems';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import type { RobotListItem } from '@shared/schemas/robots';
import { listTeamRobotsWithHeadConfig } from './robot-list.repository';

type HeadFacts = Pick<RobotListItem, 'layout' | 'board' | 'problems'>;

// A revision never changes once saved, so its facts can be kept: keyed by robot and revision.
const factsCache = new Map<string, HeadFacts>();
const CACHE_LIMIT = 2000;

/** Layout, board and problem counts of one saved configuration (JSON text). */
export function headFacts(configJson: string | null): HeadFacts {
  if (configJson === null) return { layout: null, board: null, problems: null };
  const parsed = RobotConfigSchema.safeParse(JSON.parse(configJson));
  if (!parsed.success) return { layout: null, board: null, problems: null };
  const problems = robotProblems(parsed.data);
  const errors = problems.filter((p) => p.severity === 'error').length;
  return {
    layout: parsed.data.chassis.layout,
    board: parsed.data.wiring.board,
    problems: { errors, warnings: problems.length - errors },
  };
}

/** The team dashboard's list: every live robot with its head revision's layout, board and problems. */
export function listRobotsForTeam(ctx: AppContext, teamId: string): RobotListItem[] {
  return listTeamRobotsWithHeadConfig(ctx.db, teamId).map(({ headConfig, ...robot }) => {
    const key = `${robot.id}:${robot.headRevision}`;
    let facts = factsCache.get(key);
    if (!facts) {
      facts = headFacts(headConfig);
      if (factsCache.size >= CACHE_LIMIT) factsCache.delete(factsCache.keys().next().value as string);
      factsCache.set(key, facts);
    }
    return { ...robot, ...facts };
  });
}
