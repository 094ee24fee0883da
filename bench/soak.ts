// `npm run soak [-- --clients 50 --seconds 15 --kills 10]`: the production server on a temporary
// database under load, then killed with SIGKILL in the middle of saves. Prints figures; it
// passes or fails nothing. Run it on a quiet machine for figures worth comparing.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import type { AppContext } from '../server/config';
import { openDatabase } from '../server/db/client';
import { runMigrations } from '../server/db/migrate';
import { insertUser } from '../server/features/auth/auth.repository';
import { createRobot, saveRevision } from '../server/features/robots/robots.service';
import { insertTeamWithOwner } from '../server/features/teams/teams.repository';
import { createAuth } from '../server/lib/auth';
import { startFakeSmtp } from '../server/lib/mail/fake-smtp';
import type { RobotConfig } from '../shared/schemas/robot-config';
import { wiredConfig } from '../tests/factories/wired-config';
import { dropConnections, httpRequest } from './soak/http';
import { figures, runClients, saveWithRetries, type Client, type PhaseFigures } from './soak/load';
import { startServer } from './soak/server-process';

const { values } = parseArgs({
  options: {
    clients: { type: 'string', default: '50' },
    seconds: { type: 'string', default: '15' },
    kills: { type: 'string', default: '10' },
  },
});
const CLIENTS = Number(values.clients);
const SECONDS = Number(values.seconds);
const KILLS = Number(values.kills);
const BUNDLE_REVISIONS = 5;

const withFailsafe = (config: RobotConfig, n: number): RobotConfig => ({
  ...config,
  safety: { ...config.safety, failsafeTimeoutMs: 100 + (n % 1900) },
});

/** A team with one robot of a few wired revisions, and a session for each client. */
async function prepare(databasePath: string): Promise<{ robotId: string; clients: Client[]; config: RobotConfig }> {
  const database = openDatabase(databasePath);
  runMigrations(database.db);
  const ctx = { db: database.db } as unknown as AppContext;
  const user = insertUser(database.db, { name: 'Soak Editor', email: 'soak@example.org', passwordHash: 'unused' });
  const team = insertTeamWithOwner(database.db, 'Soak team', user.id);
  const config = wiredConfig({ name: 'Soak Cart' });
  const robot = createRobot(ctx, user, team.id, { name: config.name, config });
  for (let n = 2; n <= BUNDLE_REVISIONS; n += 1) {
    saveRevision(ctx, user, robot.id, { baseRevision: n - 1, message: `Setup ${n}`, config: withFailsafe(config, n) });
  }
  const auth = createAuth(database.db, { secure: false, sessionDays: 30 });
  const clients: Client[] = [];
  for (let i = 0; i < CLIENTS; i += 1) clients.push({ cookie: (await auth.startSession(user.id)).split(';')[0] });
  database.close();
  return { robotId: robot.id, clients, config };
}

const headersOf = (url: string, client: Client) => ({ Cookie: client.cookie, Origin: url, Accept: 'application/json' });

function printTable(rows: PhaseFigures[]): void {
  const line = (cells: string[]) =>
    console.log(cells.map((c, i) => (i === 0 ? c.padEnd(34) : c.padStart(10))).join(''));
  line(['phase', 'requests', 'req/s', 'p50 ms', 'p99 ms', '5xx']);
  for (const r of rows) {
    line([
      r.name,
      String(r.requests),
      (r.requests / r.seconds).toFixed(1),
      r.p50.toFixed(1),
      r.p99.toFixed(1),
      String(r.serverErrors),
    ]);
    if (r.notes) console.log(`  ${r.notes}`);
  }
}

async function loadPhases(
  dir: string,
  databasePath: string,
  smtpPort: number,
  setup: Awaited<ReturnType<typeof prepare>>,
) {
  const server = await startServer({ dir, databasePath, smtpPort });
  const { url } = server;
  const { robotId, clients, config } = setup;
  const rows: PhaseFigures[] = [];
  console.log(`${clients.length} clients, ${SECONDS} s per phase, production server at ${url}`);

  // A moment of unmeasured traffic first, so the figures are of a running server, not a cold one.
  await runClients(clients, 3, async (client, i) => {
    const path = i % 2 ? `/api/robots/${robotId}` : `/api/robots/${robotId}/revisions/1/bundle`;
    await httpRequest(url, { method: 'GET', path, headers: headersOf(url, client) });
  });

  const heads = await runClients(clients, SECONDS, async (client, _i, record) => {
    record(await httpRequest(url, { method: 'GET', path: `/api/robots/${robotId}`, headers: headersOf(url, client) }));
  });
  rows.push(figures('(a) read the robot and its head', heads.answers, heads.seconds));

  let download = 0;
  const bundles = await runClients(clients, SECONDS, async (client, _i, record) => {
    const revision = 1 + (download++ % BUNDLE_REVISIONS);
    const path = `/api/robots/${robotId}/revisions/${revision}/bundle`;
    record(await httpRequest(url, { method: 'GET', path, headers: headersOf(url, client) }));
  });
  rows.push(
    figures('(b) download a bundle zip', bundles.answers, bundles.seconds, `${BUNDLE_REVISIONS} revisions in turn`),
  );

  let saves = 0;
  let conflicts = 0;
  let failed = 0;
  const saving = await runClients(clients, SECONDS, async (client, i, record) => {
    const result = await saveWithRetries(
      url,
      headersOf(url, client),
      robotId,
      (a) => withFailsafe(config, i * 100 + a),
      record,
    );
    if (result.number === null) failed += 1;
    else saves += 1;
    conflicts += result.conflicts;
  });
  rows.push(
    figures(
      '(c) save, retrying after each 409',
      saving.answers,
      saving.seconds,
      `${saves} saves; ${conflicts} attempts answered 409 and were retried; ${failed} gave up`,
    ),
  );
  printTable(rows);
  const ratio = rows[1].p99 / rows[0].p99;
  console.log(`bundle p99 / head-read p99: ${ratio.toFixed(2)} (goal: at most 3)`);
  await server.stop();
  dropConnections();
}

/** Saves from many clients until the server is killed at a random moment; then checks the file. */
async function killRounds(
  dir: string,
  databasePath: string,
  smtpPort: number,
  setup: Awaited<ReturnType<typeof prepare>>,
) {
  const savers = setup.clients.slice(0, 20);
  let acknowledgedTotal = 0;
  let presentTotal = 0;
  console.log(`\nkill -9 during saves, ${KILLS} times (${savers.length} clients saving)`);
  for (let round = 1; round <= KILLS; round += 1) {
    const server = await startServer({ dir, databasePath, smtpPort });
    const acknowledged: number[] = [];
    let killed = false;
    const saving = savers.map(async (client, i) => {
      while (!killed) {
        try {
          const result = await saveWithRetries(
            server.url,
            headersOf(server.url, client),
            setup.robotId,
            (a) => withFailsafe(setup.config, round * 1000 + i * 10 + a),
            () => {},
          );
          if (result.number !== null && !killed) acknowledged.push(result.number);
        } catch {
          return; // the server is gone
        }
      }
    });
    await new Promise((resolve) => setTimeout(resolve, 1000 + Math.random() * 2000));
    killed = true;
    const ackedBeforeKill = [...acknowledged];
    await server.killHard();
    await Promise.all(saving);
    dropConnections();

    const database = openDatabase(databasePath);
    const present = new Set(
      (
        database.sqlite.prepare('select number from revisions where robot_id = ?').all(setup.robotId) as {
          number: number;
        }[]
      ).map((r) => r.number),
    );
    const integrity = (database.sqlite.pragma('integrity_check') as { integrity_check: string }[])
      .map((r) => r.integrity_check)
      .join(', ');
    const foreignKeys = (database.sqlite.pragma('foreign_key_check') as unknown[]).length;
    database.close();
    const found = ackedBeforeKill.filter((n) => present.has(n)).length;
    acknowledgedTotal += ackedBeforeKill.length;
    presentTotal += found;
    console.log(
      `round ${String(round).padStart(2)}: ${ackedBeforeKill.length} acknowledged, ${found} of them present; ${present.size} revisions in the file; integrity ${integrity}; foreign-key problems ${foreignKeys}`,
    );
  }
  console.log(`total: ${acknowledgedTotal} acknowledged, ${presentTotal} present`);
}

const dir = mkdtempSync(join(tmpdir(), 'mixwright-soak-'));
const databasePath = join(dir, 'soak.sqlite');
const smtp = await startFakeSmtp();
try {
  const setup = await prepare(databasePath);
  await loadPhases(dir, databasePath, smtp.port, setup);
  await killRounds(dir, databasePath, smtp.port, setup);
} finally {
  await smtp.close();
  rmSync(dir, { recursive: true, force: true });
}
