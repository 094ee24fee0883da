import type { TestContext } from './test-app';

const TABLES = ['robots', 'revisions', 'flashes', 'audit_events', 'robot_photos'] as const;

/** How many rows each table holds, to show that a refused request wrote nothing. */
export function rowCounts(ctx: TestContext): Record<(typeof TABLES)[number], number> {
  return Object.fromEntries(
    TABLES.map((table) => [
      table,
      (ctx.database.sqlite.prepare(`select count(*) as n from ${table}`).get() as { n: number }).n,
    ]),
  ) as Record<(typeof TABLES)[number], number>;
}
