import { sql } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import type { RobotSummary } from '@shared/schemas/robots';
import { listTeamRobots } from './robots.repository';

/** The team's robots with the JSON text of each head revision's configuration. */
export function listTeamRobotsWithHeadConfig(db: Db, teamId: string): (RobotSummary & { headConfig: string | null })[] {
  const robots = listTeamRobots(db, teamId);
  if (robots.length === 0) return [];
  const rows = db.all<{ robotId: string; config: string }>(sql`
    select r.robot_id as robotId, r.config as config
    from revisions r join robots b on b.id = r.robot_id and r.number = b.head_revision
    where b.team_id = ${teamId} and b.deleted_at is null`);
  const configs = new Map(rows.map((row) => [row.robotId, row.config]));
  return robots.map((robot) => ({ ...robot, headConfig: configs.get(robot.id) ?? null }));
}
