import { migrateConfig } from '@shared/schemas/migrate-config';

/**
 * Drafts live in the browser's localStorage, one per person and robot, so an edit survives a
 * reload or a closed tab. A club laptop is shared: a draft is keyed by who typed it, is never
 * read for anyone else, and is removed when that person signs out. Each remembers the revision
 * it started from, so saving can detect a newer one.
 */
export interface StoredDraft {
  version: 1;
  userId: string;
  robotId: string;
  baseRevision: number;
  /** The draft configuration as typed (it may not pass the schema yet). */
  config: unknown;
  updatedAt: string;
}

/** Whose draft of which robot. */
export interface DraftOwner {
  userId: string;
  robotId: string;
}

const PREFIX = 'mixwright:draft:';

/** The browser's localStorage, or null where there is none or it is turned off. */
export function browserDraftStorage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

export function draftKey(owner: DraftOwner): string {
  return `${PREFIX}${owner.userId}:${owner.robotId}`;
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

function isStoredDraft(value: unknown, owner: DraftOwner): value is StoredDraft {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Partial<StoredDraft>;
  return (
    v.version === 1 &&
    v.userId === owner.userId &&
    v.robotId === owner.robotId &&
    Number.isInteger(v.baseRevision) &&
    hasConfigShape(v.config)
  );
}

/**
 * The person's stored draft of a robot, or null when there is none or it cannot be read. A
 * draft kept by an earlier version of the app is brought forward to the current schema first.
 */
export function readDraft(storage: Storage, owner: DraftOwner): StoredDraft | null {
  try {
    const raw = storage.getItem(draftKey(owner));
    if (!raw) return null;
    const parsed = JSON.parse(raw) as Partial<StoredDraft> | null;
    const draft = parsed && typeof parsed === 'object' ? { ...parsed, config: migrateConfig(parsed.config) } : parsed;
    return isStoredDraft(draft, owner) ? draft : null;
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
    storage.setItem(draftKey(draft), JSON.stringify({ version: 1, ...draft, updatedAt: now.toISOString() }));
    return true;
  } catch {
    return false;
  }
}

export function clearDraft(storage: Storage, owner: DraftOwner): void {
  try {
    storage.removeItem(draftKey(owner));
  } catch {
    // Nothing to do: a storage that cannot be written holds no draft either.
  }
}

function draftKeys(storage: Storage): string[] {
  const keys: string[] = [];
  for (let i = 0; i < storage.length; i += 1) {
    const key = storage.key(i);
    if (key?.startsWith(PREFIX)) keys.push(key);
  }
  return keys;
}

/** What the sign-out warning lists: each unsaved draft of this person, by robot. */
export interface UnsavedDraft {
  robotId: string;
  robotName: string;
  updatedAt: string;
}

/** The person's drafts in this browser. A draft is only kept while it differs from its base. */
export function listUnsavedDrafts(storage: Storage, userId: string): UnsavedDraft[] {
  try {
    const prefix = `${PREFIX}${userId}:`;
    return draftKeys(storage)
      .filter((key) => key.startsWith(prefix))
      .map((key) => readDraft(storage, { userId, robotId: key.slice(prefix.length) }))
      .filter((draft): draft is StoredDraft => draft !== null)
      .map((draft) => ({
        robotId: draft.robotId,
        robotName: String((draft.config as { name?: unknown }).name ?? 'A robot'),
        updatedAt: draft.updatedAt,
      }));
  } catch {
    return [];
  }
}

/**
 * Removes the person's drafts on sign-out, and any draft kept under a robot id alone (as an
 * earlier version of the app did), since nobody can tell whose that one is.
 */
export function clearDraftsOnSignOut(storage: Storage, userId: string): void {
  try {
    for (const key of draftKeys(storage)) {
      const rest = key.slice(PREFIX.length);
      if (rest.startsWith(`${userId}:`) || !rest.includes(':')) storage.removeItem(key);
    }
  } catch {
    // A storage that cannot be read holds nothing to remove.
  }
}
