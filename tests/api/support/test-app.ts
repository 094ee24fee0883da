import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import { createApp } from '@server/app';
import type { AppConfig, AppContext } from '@server/config';
import { openDatabase, type DatabaseHandle } from '@server/db/client';
import { runMigrations } from '@server/db/migrate';
import { createAuth } from '@server/lib/auth';
import { startFakeSmtp, type FakeSmtp } from '@server/lib/mail/fake-smtp';
import { createSmtpMailer, type Mailer } from '@server/lib/mail/mailer';

export const TEST_APP_URL = 'http://mixwright.test';

/** Cheap hashing and generous limits, so tests are quick; tests of the limits set their own. */
export function testConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  return {
    nodeEnv: 'test',
    appUrl: TEST_APP_URL,
    dataDir: tmpdir(),
    outgoingMail: false,
    passwordCost: { log2N: 10, r: 8, p: 1 },
    sessionDays: 30,
    invitationDays: 7,
    passwordResetMinutes: 60,
    rateLimits: {
      signIn: { windowMs: 60_000, limit: 1000 },
      passwordReset: { windowMs: 60_000, limit: 1000 },
      signUp: { windowMs: 60_000, limit: 1000 },
    },
    jsonLimitBytes: 1024 * 1024,
    trustProxyHops: 0,
    ...overrides,
  };
}

export interface TestContext {
  app: Express;
  database: DatabaseHandle;
  db: DatabaseHandle['db'];
  config: AppConfig;
  smtp: FakeSmtp;
  mailer: Mailer;
  /** What services are handed, for factories that go through a service. */
  appContext: AppContext;
  /** A session for a user without going through the sign-in form; returns the Cookie header value. */
  sessionCookie: (userId: string) => Promise<string>;
  close: () => Promise<void>;
}

/** A fresh app on its own migrated SQLite file, with a fake SMTP receiver. */
export async function createTestContext(overrides: Partial<AppConfig> = {}): Promise<TestContext> {
  const dir = mkdtempSync(join(tmpdir(), 'mixwright-api-'));
  const database = openDatabase(join(dir, 'test.sqlite'));
  runMigrations(database.db);
  const smtp = await startFakeSmtp();
  const mailer = createSmtpMailer({ port: smtp.port, from: 'Mixwright <no-reply@mixwright.invalid>' });
  // Files the app writes (photos) go in this context's own folder, removed on close.
  const config = testConfig({ dataDir: dir, ...overrides });
  const app = createApp({ db: database.db, mailer, config, mailbox: smtp.mailbox });
  const auth = createAuth(database.db, { secure: false, sessionDays: config.sessionDays });
  return {
    app,
    database,
    db: database.db,
    config,
    smtp,
    mailer,
    appContext: { db: database.db, mailer, config, auth },
    sessionCookie: async (userId) => (await auth.startSession(userId)).split(';')[0],
    close: async () => {
      await smtp.close();
      database.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** A cookie-keeping client that sends the app's own Origin, as the web client does. */
export function client(ctx: TestContext) {
  return request.agent(ctx.app).set('Origin', TEST_APP_URL);
}

/** A client already signed in as the user. */
export async function clientAs(ctx: TestContext, userId: string) {
  return client(ctx).set('Cookie', await ctx.sessionCookie(userId));
}
