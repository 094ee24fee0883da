// Screenshots of the history harness for a visual check (not a test):
//   npx tsx tests/visual/history/shoot.ts out-dir "part=history" "part=history&click=garden_hauler/mw_config.h" "part=activity"
// The page's answers come from the real services on a scratch database; FULL=1 shoots the whole page.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AppContext } from '@server/config';
import { openDatabase } from '@server/db/client';
import { runMigrations } from '@server/db/migrate';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { insertUser } from '@server/features/auth/auth.repository';
import { renderBundle } from '@server/features/firmware/render-bundle';
import { flashLog, recordFlash } from '@server/features/flash-log/flash-log.service';
import { restoreRevision, revisionDiff, robotHistory } from '@server/features/history/history.service';
import { deleteRobot, listBin } from '@server/features/robot-bin/robot-bin.service';
import { createRobot, robotDetail, saveRevision } from '@server/features/robots/robots.service';
import { insertMembership, insertTeamWithOwner } from '@server/features/teams/teams.repository';
import { pngImage } from '../../factories/images';
import { sampleConfig } from '../../factories/robot-config';
import { shootHarness } from '../shared/shoot-harness';

function fixture() {
  const dir = mkdtempSync(join(tmpdir(), 'mw-history-shots-'));
  const database = openDatabase(join(dir, 'shots.sqlite'));
  runMigrations(database.db);
  const ctx = { db: database.db, config: { dataDir: dir } } as unknown as AppContext;
  const mentor = insertUser(database.db, { name: 'Mentor Ada', email: 'mentor@larkspur.invalid', passwordHash: 'x' });
  const lead = insertUser(database.db, {
    name: 'Student Lead Ravi',
    email: 'lead@larkspur.invalid',
    passwordHash: 'x',
  });
  const team = insertTeamWithOwner(database.db, 'Larkspur Makers Club', mentor.id);
  insertMembership(database.db, team.id, lead.id, 'editor');
  const base = sampleConfig();
  const robot = createRobot(ctx, mentor, team.id, { name: base.name, config: base });
  const flipped = structuredClone(base);
  flipped.chassis.wheels[0].reversed = true;
  saveRevision(ctx, lead, robot.id, {
    baseRevision: 1,
    message: 'Left track ran backwards on the bench',
    config: flipped,
  });
  recordFlash(ctx, lead, robot.id, { revision: 2, note: 'Club night, wheels up' });
  const tuned = structuredClone(flipped);
  tuned.safety.failsafeTimeoutMs = 150;
  tuned.controls.axes.yaw.expo = 0.45;
  tuned.controls.rateSwitch.rates = [0.35, 0.65, 1];
  saveRevision(ctx, lead, robot.id, { baseRevision: 2, message: 'Quicker failsafe, softer turning', config: tuned });
  restoreRevision(ctx, mentor, robot.id, 1, { baseRevision: 3, note: 'compare with the first build' });
  const spare = createRobot(ctx, mentor, team.id, { name: 'Bench Kiwi', config: { ...base, name: 'Bench Kiwi' } });
  deleteRobot(ctx, mentor, spare.id);
  const id = robot.id;
  const detail = robotDetail(ctx, id, 'owner');
  detail.robot.photoUrl = `data:image/png;base64,${pngImage(48, [196, 120, 60]).toString('base64')}`;
  const answers: Record<string, unknown> = {
    [`GET /api/robots/${id}/history`]: robotHistory(ctx, id),
    [`GET /api/robots/${id}/flashes`]: { flashes: flashLog(ctx, id) },
    [`GET /api/teams/${team.id}/robot-bin`]: { robots: listBin(ctx, team.id) },
    [`GET /api/teams/${team.id}/activity`]: {
      events: listTeamActivity(database.db, team.id, { limit: 50, signIns: true }),
      nextBefore: null,
    },
  };
  for (const [from, to] of [
    [3, 4],
    [2, 3],
    [1, 3],
  ])
    answers[`GET /api/robots/${id}/diff?from=${from}&to=${to}`] = revisionDiff(ctx, id, from, to, renderBundle);
  database.close();
  rmSync(dir, { recursive: true, force: true });
  return { answers, detail };
}

await shootHarness({
  harness: import.meta.url,
  title: 'Mixwright history harness',
  settleMs: 1500,
  defaultQuery: 'part=history',
  define: { __HISTORY_FIXTURE__: JSON.stringify(fixture()) },
  // click=text opens a collapsed file diff (or presses any button) before the shot.
  beforeShot: async ({ page, params }) => {
    const click = params.get('click');
    if (!click) return;
    await page.getByText(click, { exact: true }).first().click();
    await page.waitForTimeout(300);
  },
});
