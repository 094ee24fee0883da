import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { deepEqual } from '@shared/history/field-path';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail } from '@shared/schemas/robots';
import { browserDraftStorage, clearDraft, readDraft, writeDraft, type DraftOwner } from '../lib/draft-storage';

/** Whose draft of which robot, and whether they may change it at all. */
export interface DraftScope extends DraftOwner {
  /** Someone who cannot edit works on the head only: no draft is read for them or kept. */
  canEdit: boolean;
}

interface DraftState {
  baseRevision: number;
  config: RobotConfig;
  /** The base revision's configuration, when known (it is unknown for a draft older than the head). */
  baseConfig: RobotConfig | null;
}

export interface RobotDraft extends DraftState {
  /** The draft differs from the revision it started from. */
  dirty: boolean;
  /** A newer revision was saved after the draft's base. */
  behindHead: boolean;
  /** The browser refused to keep the draft (storage full or disabled). */
  storageFailed: boolean;
  setConfig: (next: RobotConfig) => void;
  /** Throws the draft away and follows the head. */
  discard: () => void;
  /** The draft now starts from `revision` (after a save, or a rebase onto a newer revision). */
  rebase: (revision: Pick<RevisionDetail, 'number' | 'config'>, config?: RobotConfig) => void;
}

function initial(owner: DraftOwner, head: RevisionDetail, storage: Storage | null): DraftState {
  const stored = storage ? readDraft(storage, owner) : null;
  if (stored && stored.baseRevision <= head.number) {
    return {
      baseRevision: stored.baseRevision,
      config: stored.config as RobotConfig,
      baseConfig: stored.baseRevision === head.number ? head.config : null,
    };
  }
  return { baseRevision: head.number, config: head.config, baseConfig: head.config };
}

/**
 * The person's draft of the robot: what the editor shows and changes. It is kept in
 * localStorage under their id while it differs from its base revision; a clean draft follows
 * the head when someone else saves. Nothing is read or kept for someone who cannot edit.
 */
export function useRobotDraft(
  scope: DraftScope,
  head: RevisionDetail,
  browser: Storage | null = browserDraftStorage(),
): RobotDraft {
  const storage = scope.canEdit ? browser : null;
  const { userId, robotId } = scope;
  const [state, setState] = useState<DraftState>(() => initial({ userId, robotId }, head, storage));
  const [storageFailed, setStorageFailed] = useState(false);
  const storageRef = useRef(storage);
  storageRef.current = storage;
  const dirty = state.baseConfig === null || !deepEqual(state.config, state.baseConfig);

  // Someone saved a newer head while this draft had no changes: follow it.
  useEffect(() => {
    if (!dirty && head.number > state.baseRevision)
      setState({ baseRevision: head.number, config: head.config, baseConfig: head.config });
  }, [dirty, head, state.baseRevision]);

  const persist = useCallback(
    (next: DraftState) => {
      const s = storageRef.current;
      if (!s) return;
      if (next.baseConfig !== null && deepEqual(next.config, next.baseConfig)) {
        clearDraft(s, { userId, robotId });
        setStorageFailed(false);
      } else {
        setStorageFailed(!writeDraft(s, { userId, robotId, baseRevision: next.baseRevision, config: next.config }));
      }
    },
    [userId, robotId],
  );

  // Edits arrive one event at a time; the ref lets two edits in one event build on each other.
  const latest = useRef(state);
  latest.current = state;
  const setConfig = useCallback(
    (config: RobotConfig) => {
      const next = { ...latest.current, config };
      latest.current = next;
      setState(next);
      persist(next);
    },
    [persist],
  );

  const discard = useCallback(() => {
    if (storageRef.current) clearDraft(storageRef.current, { userId, robotId });
    setState({ baseRevision: head.number, config: head.config, baseConfig: head.config });
  }, [head, userId, robotId]);

  const rebase = useCallback(
    (revision: Pick<RevisionDetail, 'number' | 'config'>, config?: RobotConfig) => {
      const next = { baseRevision: revision.number, config: config ?? revision.config, baseConfig: revision.config };
      persist(next);
      setState(next);
    },
    [persist],
  );

  return useMemo(
    () => ({
      ...state,
      dirty,
      behindHead: head.number > state.baseRevision,
      storageFailed,
      setConfig,
      discard,
      rebase,
    }),
    [state, dirty, head.number, storageFailed, setConfig, discard, rebase],
  );
}
