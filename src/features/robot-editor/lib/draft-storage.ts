import { migrateConfig } from '@shared/schemas/migrate-config';

/**
 * Drafts live in the browser's localStorage, one per robot, so an edit survives a reload or a
 * closed tab. Each remembers the revision it started from, so saving can detect a newer one.
 */
export interface StoredDraft {
  version: 1;
  robotId: string;
  baseRevision: number;
  /** The draft configuration as typed (it may not pass the schema yet). */
  config: unknown;
  updatedAt: string;
}

const PREFIX = 'mixwright:draft:';

export function draftKey(robotId: string): string {
  return `${PREFIX}${robotId}`;
}

/**
 * A draft may hold invalid values (it is what was typed), but its shape must be a configuration's,
 * or the editor could not even show it: a draft from another format is dropped.
 */
function hasConfigShape(config: unknown): boolean {
  const c = config as {
    chassis?: { wheels?: unknown };
    motors?: unknown;
    controls?: { channels?: unknown; axes?: unknown };
    wiring?: { drivers?: unknown };
    safety?: unknown;
    power?: unknown;
    firmware?: unknown;
  } | null;
  return (
    typeof c === 'object' &&
    c !== null &&
    Array.isArray(c.chassis?.wheels) &&
    Array.isArray(c.motors) &&
    Array.isArray(c.controls?.channels) &&
    typeof c.controls?.axes === 'object' &&
    Array.isArray(c.wiring?.drivers) &&
    [c.safety, c.power, c.firmware].every((part) => typeof part === 'object' && part !== null)
  );
}

function isStoredDraft(value: unknown, robotId: string): value is StoredDraft {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Partial<StoredDraft>;
  return v.version === 1 && v.robotId === robotId && Number.isInteger(v.baseRevision) && hasConfigShape(v.config);
}

/**
 * The stored draft of a robot, or null when there is none or it cannot be read. A draft kept
 * by an earlier version of the app is brought forward to the current schema version first.
 */
export function readDraft(storage: Storage, robotId: string): StoredDraft | null {
  try {
    const raw = storage.getItem(draftKey(robotId));
    if (!raw) return null;
    const parsed = JSON.parse(raw) as Partial<StoredDraft> | null;
    const draft = parsed && typeof parsed === 'object' ? { ...parsed, config: migrateConfig(parsed.config) } : parsed;
    return isStoredDraft(draft, robotId) ? draft : null;
  } catch {
    return null;
  }
}

/** Stores a draft; returns false when the browser refuses (storage full or disabled). */
export function writeDraft(
  storage: Storage,
  draft: Omit<StoredDraft, 'version' | 'updatedAt'>,
  now = new Date(),
): boolean {
  try {
    storage.setItem(draftKey(draft.robotId), JSON.stringify({ version: 1, ...draft, updatedAt: now.toISOString() }));
    return true;
  } catch {
    return false;
  }
}

export function clearDraft(storage: Storage, robotId: string): void {
  try {
    storage.removeItem(draftKey(robotId));
  } catch {
    // Nothing to do: a storage that cannot be written holds no draft either.
  }
}
