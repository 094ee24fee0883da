import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { viteClient, type ClientHandlers } from '@server/client';
import { devFileRules, devPathAllowed } from '@server/dev-file-guard';
import { openDatabase, type DatabaseHandle } from '@server/db/client';
import { runMigrations } from '@server/db/migrate';
import { startFakeSmtp, type FakeSmtp } from '@server/lib/mail/fake-smtp';
import { createSmtpMailer } from '@server/lib/mail/mailer';
import { testConfig } from '../api/support/test-app';

// The development server (`npm run dev`) compiles files on request; it must never hand out the
// database, the photos, the server code or the tests, wherever DATA_DIR points.

const root = resolve('.');
const SQLITE_HEADER = 'SQLite format 3';

describe('the development server with the data folder inside the client’s own folder', () => {
  let server: Server;
  let client: ClientHandlers;
  let database: DatabaseHandle;
  let smtp: FakeSmtp;
  let dataDir: string;
  let databasePath: string;
  const relative = (path: string) => path.slice(root.length);

  beforeAll(async () => {
    // The worst case: DATA_DIR inside src/, which the development server otherwise serves.
    mkdirSync(join(root, 'src', '.cache'), { recursive: true });
    dataDir = mkdtempSync(join(root, 'src', '.cache', 'security-data-'));
    databasePath = join(dataDir, 'mixwright.sqlite');
    database = openDatabase(databasePath);
    runMigrations(database.db);
    mkdirSync(join(dataDir, 'photos'));
    writeFileSync(join(dataDir, 'photos', 'a.jpg'), 'private photo');
    smtp = await startFakeSmtp();
    server = createServer();
    client = await viteClient(server, { dataDir, databasePath });
    const mailer = createSmtpMailer({ port: smtp.port, from: 'Mixwright <no-reply@mixwright.invalid>' });
    const config = testConfig({ nodeEnv: 'development', dataDir });
    server.on('request', createApp({ db: database.db, mailer, config, client: client.handlers }));
  }, 120_000);

  afterAll(async () => {
    await client?.close();
    await smtp?.close();
    database?.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('does not serve the database or its write-ahead log', async () => {
    for (const path of [databasePath, `${databasePath}-wal`]) {
      const response = await request(server).get(relative(path));
      expect(response.status).toBe(404);
      expect(response.text).not.toContain(SQLITE_HEADER);
      expect((await request(server).get(`/@fs${path}`)).status).toBe(404);
    }
  });

  it('does not serve uploaded photos from the data folder', async () => {
    const response = await request(server).get(relative(join(dataDir, 'photos', 'a.jpg')));
    expect(response.status).toBe(404);
    expect(response.text).not.toContain('private photo');
  });

  it('does not serve server code, tests or project files, however the path is spelled', async () => {
    const paths = [
      '/server/app.ts',
      '/server/app.ts?import',
      '/tests/api/support/test-app.ts',
      '/package.json',
      '/drizzle/0000_foundation.sql',
      '/src/../server/app.ts',
      '/src/%2e%2e/server/app.ts',
      `/@fs${root}/server/app.ts`,
      `/@fs${root}/.git/HEAD`,
      '/@id/server/app.ts',
      '/@fs/etc/passwd',
    ];
    for (const path of paths) {
      const response = await request(server).get(path);
      expect({ path, status: response.status }).toEqual({ path, status: 404 });
      expect(response.text).not.toContain('createApp');
    }
  });

  it('still serves the client’s own modules and pages', async () => {
    const module = await request(server).get('/src/lib/format.ts');
    expect(module.status).toBe(200);
    expect(module.headers['content-type']).toMatch(/javascript/);
    const page = await request(server).get('/teams').set('Accept', 'text/html');
    expect(page.status).toBe(200);
    expect(page.text).toContain('/src/main.tsx');
  });
});

describe('which paths the development server may answer', () => {
  const outside = mkdtempSync(join(tmpdir(), 'mixwright-data-'));
  afterAll(() => rmSync(outside, { recursive: true, force: true }));

  it('refuses the data folder and database kept outside the project', () => {
    const rules = devFileRules({ root, dataDir: outside, databasePath: join(outside, 'db.sqlite') });
    expect(devPathAllowed(rules, `/@fs${outside}/db.sqlite`)).toBe(false);
    expect(devPathAllowed(rules, `/@fs${outside}/photos/a.jpg`)).toBe(false);
  });

  it('refuses what the app writes when the data folder is the project folder itself', () => {
    const rules = devFileRules({ root, dataDir: root, databasePath: join(root, 'mixwright.sqlite') });
    expect(devPathAllowed(rules, '/mixwright.sqlite')).toBe(false);
    expect(devPathAllowed(rules, '/mixwright.sqlite-wal')).toBe(false);
    expect(devPathAllowed(rules, '/photos/a.jpg')).toBe(false);
    expect(devPathAllowed(rules, '/src/main.tsx')).toBe(true);
  });

  it('refuses any database file even under the client’s folders', () => {
    const rules = devFileRules({ root, dataDir: outside, databasePath: join(outside, 'db.sqlite') });
    expect(devPathAllowed(rules, '/public/copy.sqlite')).toBe(false);
    expect(devPathAllowed(rules, '/src/notes.db-wal')).toBe(false);
  });

  it('refuses a path that cannot be decoded', () => {
    const rules = devFileRules({ root, dataDir: outside, databasePath: join(outside, 'db.sqlite') });
    expect(devPathAllowed(rules, '/src/%E0%A4%A')).toBe(false);
    expect(devPathAllowed(rules, '/src/main.tsx%00.png')).toBe(false);
  });
});
