import { existsSync, realpathSync } from 'node:fs';
import { basename, dirname, join, posix, resolve, sep } from 'node:path';
import type { RequestHandler } from 'express';
import { HttpError } from './lib/http-error';

/**
 * The development server (Vite) answers any path under the project folder, compiling source
 * files on request. Only the client's own folders may ever be served: never the database, the
 * photos, the server code, the tests or anything else in the project, wherever DATA_DIR points.
 */
export interface DevFileRules {
  /** The project folder (Vite's root). */
  root: string;
  /** Folders and files the client is built from, plus the installed packages it imports. */
  allowed: string[];
  /** Folders never served even when they sit inside an allowed one. */
  deniedFolders: string[];
  /** Files never served (the database and its journal files). */
  deniedFiles: string[];
}

const DATABASE_FILE = /\.(sqlite3?|db)(-wal|-shm|-journal)?$/i;

const inside = (folder: string, path: string) =>
  path === folder || path.startsWith(folder.endsWith(sep) ? folder : folder + sep);

function realOrResolved(path: string): string {
  const absolute = resolve(path);
  try {
    return realpathSync(absolute);
  } catch {
    return absolute;
  }
}

/**
 * The rules for this project: the client's folders, and the data folder and database denied.
 * A data folder that contains the whole project (DATA_DIR=.) is not denied as a whole; the
 * photos folder the app writes inside it is.
 */
export function devFileRules(options: { root: string; dataDir: string; databasePath: string }): DevFileRules {
  const root = realOrResolved(options.root);
  const allowed = ['src', 'shared', 'public', 'index.html', 'node_modules'].map((p) => join(root, p));
  if (existsSync(join(root, 'node_modules'))) allowed.push(realOrResolved(join(root, 'node_modules')));
  const dataDir = realOrResolved(options.dataDir);
  const database = realOrResolved(options.databasePath);
  return {
    root,
    allowed,
    deniedFolders: inside(dataDir, root) ? [join(dataDir, 'photos')] : [dataDir],
    deniedFiles: ['', '-wal', '-shm', '-journal'].map((suffix) => join(dirname(database), basename(database) + suffix)),
  };
}

function denied(rules: DevFileRules, path: string): boolean {
  return (
    DATABASE_FILE.test(path) ||
    rules.deniedFiles.includes(path) ||
    rules.deniedFolders.some((folder) => inside(folder, path))
  );
}

/** A decoded, normalised URL path, or null when it cannot be decoded or hides a NUL byte. */
function cleanPath(urlPath: string): string | null {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (decoded.includes('\0')) return null;
  return posix.normalize(decoded);
}

/**
 * Whether the development server may answer this URL path. Vite's own modules (`/@vite/…`,
 * `/@react-refresh`, `/@id/<package>`) and files in the allowed folders pass; files reached
 * through `/@fs/` pass only inside the allowed folders; any other path that names something in
 * the project folder is refused. Paths that name nothing there (the app's pages, `/teams/…`)
 * pass, so Vite can answer them with the page.
 */
export function devPathAllowed(rules: DevFileRules, urlPath: string): boolean {
  const path = cleanPath(urlPath);
  if (path === null) return false;
  if (path.startsWith('/@fs/')) {
    const file = path.slice('/@fs'.length);
    return rules.allowed.some((folder) => inside(folder, file)) && !denied(rules, file);
  }
  if (path.startsWith('/@id/')) {
    const id = path.slice('/@id/'.length);
    if (id.startsWith('/') || id.startsWith('.') || DATABASE_FILE.test(id)) return false;
    return namesNothingOutside(rules, id.split('/')[0]);
  }
  if (path.startsWith('/@vite/') || path === '/@react-refresh') return true;
  if (path.startsWith('/@')) return false;
  const file = join(rules.root, path);
  if (denied(rules, file)) return false;
  if (rules.allowed.some((folder) => inside(folder, file))) return true;
  return namesNothingOutside(rules, path.split('/')[1] ?? '');
}

/** True when the project folder has no entry by this name outside the allowed ones. */
function namesNothingOutside(rules: DevFileRules, first: string): boolean {
  if (!first) return true;
  const entry = join(rules.root, first);
  return rules.allowed.some((folder) => inside(folder, entry)) || !existsSync(entry);
}

/** Refuses, before Vite sees them, requests for anything outside the client's folders. */
export function devFileGuard(rules: DevFileRules): RequestHandler {
  return (req, _res, next) => {
    const urlPath = (req.originalUrl ?? req.url).split('?')[0].split('#')[0];
    if (devPathAllowed(rules, urlPath)) return next();
    next(new HttpError(404, 'Not found'));
  };
}
