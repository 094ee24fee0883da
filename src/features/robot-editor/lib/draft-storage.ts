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

function isStoredDraft(value: unknown, robotId: string): value is StoredDraft {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Partial<StoredDraft>;
  return v.version === 1 && v.robotId === robotId && Number.isInteger(v.baseRevision) && typeof v.config === 'object' && v.config !== null;
}

/** The stored draft of a robot, or null when there is none or it cannot be read. */
export function readDraft(storage: Storage, robotId: string): StoredDraft | null {
  try {
    const raw = storage.getItem(draftKey(robotId));
    if (!raw) return null;
    const parsed: unknown = JSON.parse(raw);
    return isStoredDraft(parsed, robotId) ? parsed : null;
  } catch {
    return null;
  }
}

/** Stores a draft; returns false when the browser refuses (storage full or disabled). */
export function writeDraft(storage: Storage, draft: Omit<StoredDraft, 'version' | 'updatedAt'>, now = new Date()): boolean {
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
