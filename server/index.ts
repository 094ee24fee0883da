// Starts Mixwright: reads the environment, opens and migrates the database, seeds the demo on
// an empty database, starts the local mail receiver when there is no mail server, and listens
// on one port. `--dev` serves the client through Vite with hot reload instead of the build.
import { mkdirSync } from 'node:fs';
import { createServer } from 'node:http';
import { createApp } from './app';
import { ensureClientBuild } from './client-build';
import { staticClient, viteClient, type ClientHandlers } from './client';
import { configFromEnv } from './config';
import { openDatabase } from './db/client';
import { runMigrations } from './db/migrate';
import { describeSeededAccounts, isDatabaseEmpty, seedDemo } from './db/seed/seed-demo';
import { readEnv } from './env';
import { BIN_DAYS, purgeExpiredRobots } from './features/robot-bin/robot-bin.service';
import { startFakeSmtp, type FakeSmtp } from './lib/mail/fake-smtp';
import { createSmtpMailer } from './lib/mail/mailer';
import { isLoopbackHost } from './middleware/loopback-only';

const env = readEnv();
const config = configFromEnv(env);
const viteDevServer = process.argv.includes('--dev');
if (viteDevServer && env.NODE_ENV === 'production') {
  console.error('The development server (--dev) does not run in production; use `npm run start:prod`.');
  process.exit(1);
}
mkdirSync(env.DATA_DIR, { recursive: true });

const database = openDatabase(env.DATABASE_PATH);
runMigrations(database.db);
if (isDatabaseEmpty(database.db)) {
  const accounts = await seedDemo(database.db, { passwordCost: config.passwordCost });
  console.log(`\n${describeSeededAccounts(accounts, config.appUrl)}\n`);
}

// Robots past their days in the bin are removed at start and then every six hours.
const PURGE_EVERY_MS = 6 * 60 * 60_000;
async function purgeBin(): Promise<void> {
  try {
    const removed = await purgeExpiredRobots(database.db, env.DATA_DIR);
    if (removed > 0) console.log(`Removed ${removed} robot(s) deleted more than ${BIN_DAYS} days ago`);
  } catch (error) {
    console.error('Emptying the robot bin failed:', error);
  }
}
await purgeBin();
const purgeTimer = setInterval(() => void purgeBin(), PURGE_EVERY_MS);
purgeTimer.unref();

let fakeSmtp: FakeSmtp | null = null;
if (!env.SMTP_URL) {
  // readEnv() insists on SMTP_URL in production, so this is development or test only.
  fakeSmtp = await startFakeSmtp();
}
const mailer = createSmtpMailer({ url: env.SMTP_URL, port: fakeSmtp?.port, from: env.MAIL_FROM });

const httpServer = createServer();
let client: ClientHandlers;
if (viteDevServer) {
  client = await viteClient(httpServer, { dataDir: env.DATA_DIR, databasePath: env.DATABASE_PATH });
} else {
  await ensureClientBuild({ root: process.cwd(), outDir: 'dist/client', log: (line) => console.log(line) });
  client = staticClient('dist/client');
}
const app = createApp({
  db: database.db,
  mailer,
  config,
  mailbox: fakeSmtp?.mailbox,
  client: client.handlers,
  clientHasInlineScripts: viteDevServer,
});
httpServer.on('request', app);

httpServer.once('error', (error: NodeJS.ErrnoException) => {
  console.error(error.code === 'EADDRINUSE' ? `Port ${env.PORT} is in use; stop the other server or set PORT` : error);
  process.exit(1);
});
httpServer.listen(env.PORT, env.HOST, () => {
  const how = viteDevServer ? 'development server, client from Vite' : 'built client';
  console.log(`Mixwright (${env.NODE_ENV}, ${how}) is at ${config.appUrl}`);
  if (!isLoopbackHost(env.HOST)) {
    console.log(`Listening on ${env.HOST}: other machines on the network can reach this server.`);
  }
  if (fakeSmtp) {
    console.log(`No SMTP_URL: e-mail is caught locally; read it on this machine at ${config.appUrl}/dev/mailbox`);
  }
});

let stopping = false;
async function stop(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  console.log(`\n${signal}: stopping`);
  clearInterval(purgeTimer);
  httpServer.closeAllConnections();
  await new Promise<void>((resolve) => httpServer.close(() => resolve()));
  await client.close();
  await fakeSmtp?.close();
  database.close();
  process.exit(0);
}
process.on('SIGINT', () => void stop('SIGINT'));
process.on('SIGTERM', () => void stop('SIGTERM'));
