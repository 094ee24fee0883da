import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import type { Db } from './client';

const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

/** Applies every migration in drizzle/ that this database has not seen yet. */
export function runMigrations(db: Db): void {
  migrate(db, { migrationsFolder });
}
