// History figures: listing a robot's revisions (problem counts worked out once per revision,
// then kept), looking up a boot line among them, comparing two revisions with the generated
// files, and reading a bundle zip for import. Printed figures, not pass/fail.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import type { AppContext } from '../server/config';
import { openDatabase } from '../server/db/client';
import { runMigrations } from '../server/db/migrate';
import { insertUser } from '../server/features/auth/auth.repository';
import { renderBundle } from '../server/features/firmware/render-bundle';
import { zipBundle } from '../server/features/firmware/zip-bundle';
import { lookUpBootLine } from '@server/features/boot-line/boot-line.service';
import { revisionDiff, robotHistory } from '../server/features/history/history.service';
import { readUploadedConfig } from '@server/features/robot-files/robot-files.service';
import { createRobot, saveRevision } from '../server/features/robots/robots.service';
import { insertTeamWithOwner } from '../server/features/teams/teams.repository';
import { configHash } from '../shared/history/config-hash';
import { sampleConfig } from '../tests/factories/robot-config';

const REVISIONS = 200;

function time<T>(label: string, work: () => T, repeat = 1): T {
  let result!: T;
  const start = performance.now();
  for (let i = 0; i < repeat; i++) result = work();
  console.log(`${label}: ${((performance.now() - start) / repeat).toFixed(1)} ms`);
  return result;
}

export async function run(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'mixwright-bench-history-'));
  const database = openDatabase(join(dir, 'bench.sqlite'));
  runMigrations(database.db);
  const ctx = { db: database.db, config: { dataDir: dir } } as unknown as AppContext;
  const user = insertUser(database.db, { name: 'Bench', email: 'bench@example.org', passwordHash: 'x' });
  const team = insertTeamWithOwner(database.db, 'Bench team', user.id);
  const base = sampleConfig();
  const robot = createRobot(ctx, user, team.id, { name: base.name, config: base });
  for (let n = 2; n <= REVISIONS; n++) {
    const config = { ...base, safety: { ...base.safety, failsafeTimeoutMs: 100 + (n % 400) } };
    saveRevision(ctx, user, robot.id, { baseRevision: n - 1, message: `Change ${n}`, config });
  }
  console.log(`robot with ${REVISIONS} revisions`);
  time('history list, first time (every revision checked)', () => robotHistory(ctx, robot.id));
  time('history list, again (facts kept)', () => robotHistory(ctx, robot.id), 20);
  const line = `boot robot="${base.name}" revision=1 hash=${configHash(base)}`;
  time('boot-line lookup (oldest revision)', () => lookUpBootLine(ctx, robot.id, line), 20);
  time('diff of two revisions with generated files', () => revisionDiff(ctx, robot.id, 1, REVISIONS, renderBundle), 5);
  const zip = await zipBundle(renderBundle(base, { revision: 1 }));
  console.log(`bundle zip: ${zip.length} bytes`);
  time(
    'reading config.json from the bundle zip (checks, inflate, migrate, validate)',
    () => readUploadedConfig({ data: zip, originalName: 'b.zip' }),
    20,
  );
  database.close();
  rmSync(dir, { recursive: true, force: true });
}
