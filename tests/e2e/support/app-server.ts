import { mkdtempSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp } from '@server/app';
import { staticClient, viteClient, type ClientHandlers } from '@server/client';
import type { AppConfig } from '@server/config';
import { openDatabase, type DatabaseHandle } from '@server/db/client';
import { runMigrations } from '@server/db/migrate';
import { seedDemo, type SeededAccount } from '@server/db/seed/seed-demo';
import { startFakeSmtp, type FakeSmtp } from '@server/lib/mail/fake-smtp';
import { createSmtpMailer } from '@server/lib/mail/mailer';
import { testConfig } from '../../api/support/test-app';

export interface RunningApp {
  /** Base address, e.g. http://127.0.0.1:41234 */
  url: string;
  database: DatabaseHandle;
  smtp: FakeSmtp;
  /** The demo accounts, when started with `seed: true`. */
  demoAccounts: SeededAccount[];
  close: () => Promise<void>;
}

export interface StartOptions {
  /** A built client folder (from `inject('clientDir')`), or 'vite' for Vite middleware. */
  client: string | 'vite';
  /** Seed the demo club first. */
  seed?: boolean;
  config?: Partial<AppConfig>;
}

function listen(server: Server): Promise<number> {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve((server.address() as AddressInfo).port));
  });
}

/** The whole app on a random port with its own temporary database and fake SMTP receiver. */
export async function startApp(options: StartOptions): Promise<RunningApp> {
  const dir = mkdtempSync(join(tmpdir(), 'mixwright-e2e-'));
  const database = openDatabase(join(dir, 'app.sqlite'));
  runMigrations(database.db);
  const config = testConfig(options.config);
  const demoAccounts = options.seed ? await seedDemo(database.db, { passwordCost: config.passwordCost }) : [];
  const smtp = await startFakeSmtp();
  const server = createServer();
  const port = await listen(server);
  const url = `http://127.0.0.1:${port}`;
  const vite = options.client === 'vite';
  const client: ClientHandlers = vite
    ? await viteClient(server, { dataDir: dir, databasePath: join(dir, 'app.sqlite') })
    : staticClient(options.client);
  const mailer = createSmtpMailer({ port: smtp.port, from: 'Mixwright <no-reply@mixwright.invalid>' });
  server.on(
    'request',
    createApp({
      db: database.db,
      mailer,
      config: { ...config, appUrl: url, dataDir: dir },
      mailbox: smtp.mailbox,
      client: client.handlers,
      clientHasInlineScripts: vite,
    }),
  );
  return {
    url,
    database,
    smtp,
    demoAccounts,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await client.close();
      await smtp.close();
      database.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
